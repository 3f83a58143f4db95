package org.tertius.core.mp;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.taylor.RecurrencePlan;

/** A run from a first series expanded ahead ({@link SegmentIntegrator#start}) is the run that expands it itself. */
class SegmentIntegratorStartTest {
    /** y' = y^2, p' = y p: y = p = 1 / (1 - tau) from y(0) = p(0) = 1, a pole at tau = 1. */
    private static SegmentIntegrator integrator(int digits) {
        PolynomialSystem sys = PolynomialSystem.builder(IndependentVariable.PLAIN, "y", "p")
                .term(0, new Complex(1), 0, 2, 0).term(1, new Complex(1), 0, 1, 1).build();
        MpContext ctx = new MpContext(digits + 6);
        return new SegmentIntegrator(RecurrencePlan.compile(sys), new MpComplex[] {ctx.fromLong(1), ctx.fromLong(1)},
                ctx, digits);
    }

    private static MpComplex[] one(MpContext c) {
        return new MpComplex[] {c.fromLong(1), c.fromLong(1)};
    }

    @Test
    void aRunFromAStartExpandedAheadIsTheRunThatExpandsItsFirstSeries() {
        SegmentIntegrator it = integrator(40);
        MpContext c = it.context();
        // past the pole at tau = 1 (0.35 from the line), so that the run takes Pade steps
        List<MpComplex> target = List.of(c.fromDouble(1.5, 0.5));
        long before = it.products();
        SegmentIntegrator.Result plain = it.run(MpComplex.ZERO, one(c), target, 0.5, false, null, null);
        long plainProducts = it.products() - before;
        SegmentIntegrator.Start start = it.start(MpComplex.ZERO, one(c), 0.5);
        before = it.products();
        SegmentIntegrator.Result ahead = it.run(start, target, false, null, null);
        long aheadProducts = it.products() - before;
        for (int i = 0; i < 2; i++) {
            assertTrue(c.subtract(plain.state()[i], ahead.state()[i]).isZero(), "component " + i + " differs");
        }
        // the exact solution 1 / (1 - tau) (closed form, common practice) to the tolerance of the run
        MpComplex exact = c.divide(c.fromLong(1), c.subtract(c.fromLong(1), target.get(0)));
        double log10Err = (c.subtract(ahead.state()[0], exact).log2Abs() - exact.log2Abs()) / MpContext.LOG2_10;
        assertTrue(log10Err < -38, "relative error 1e" + log10Err);
        // the expansion ahead is counted by the run that first uses it, and by no later run
        assertEquals(plainProducts, aheadProducts);
        before = it.products();
        it.run(start, target, false, null, null);
        assertTrue(it.products() - before < aheadProducts);
    }

    @Test
    void aStartExpandedByAnotherIntegratorIsRefused() {
        SegmentIntegrator at40 = integrator(40);
        SegmentIntegrator at60 = integrator(60);
        SegmentIntegrator.Start start = at40.start(MpComplex.ZERO, one(at40.context()), 0.5);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> at60.run(start, List.of(at60.context().fromDouble(0.5, 0)), false, null, null));
        assertTrue(e.getMessage().contains("another integrator"), e.getMessage());
    }
}
