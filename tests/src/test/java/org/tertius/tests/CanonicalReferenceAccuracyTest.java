package org.tertius.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;

/**
 * The canonical evaluation of the engine (a function of start, settings and point alone) meets the budgets of
 * {@link IndependentReferenceAccuracyTest} on the same independent references (tests/src/test/resources/
 * reference/piii-*.csv, made by tools/reference/piii_reference.py): honest estimates, and 11 correct digits of
 * w (relative to 1 + |w|) on the principal sheet, 10 on sheets +-1. Both scenarios are integrated in the
 * Hamiltonian form, whose first component is w.
 */
class CanonicalReferenceAccuracyTest {

    @ParameterizedTest
    @ValueSource(strings = {"/reference/piii-generic-d6.csv", "/reference/piii-complex-d6.csv"})
    void canonicalValuesHaveElevenDigitsAndHonestEstimates(String resource) {
        ReferenceData ref = ReferenceData.load(resource);
        String[] p = ref.parameters();
        Painleve3 eq = Painleve3.of(ComplexText.parse("alpha", p[0]), ComplexText.parse("beta", p[1]),
                ComplexText.parse("gamma", p[2]), ComplexText.parse("delta", p[3]));
        String[] s = ref.start();
        Painleve3Solution sol = Painleve3Solution.builder(eq).start(ComplexText.parse("z0", s[0]),
                ComplexText.parse("w0", s[1]), ComplexText.parse("dw0", s[2])).build();
        Solution engine = sol.engineReading().orElseThrow().tree();
        double worst = 0;
        for (ReferenceData.Row row : ref.rows) {
            StateEstimate e = engine.evaluateCanonical(row.point.logRe(), row.point.logIm());
            double ew = new Complex(e.re(0), e.im(0)).subtract(row.w).norm();
            String where = " at " + row.point + " (" + resource + ")";
            assertTrue(ew <= e.error(0), "error of w " + ew + " above its estimate " + e.error(0) + where);
            double rel = ew / (1 + row.w.norm());
            worst = Math.max(worst, rel);
            double budget = row.point.sheet() == 0 ? 1e-11 : 1e-10;
            assertTrue(rel <= budget, "relative error of w " + rel + where);
        }
        System.out.printf("%s canonical: %d points, worst relative error of w %.2e, cache %d KB%n", resource,
                ref.rows.size(), worst, engine.canonicalFootprint() / 1024);
    }
}
