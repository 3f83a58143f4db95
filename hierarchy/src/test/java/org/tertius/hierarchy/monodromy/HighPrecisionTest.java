package org.tertius.hierarchy.monodromy;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;

/**
 * The direct map in arbitrary precision (the same generic code as in double): from an exact member-1 state the data
 * at 30 digits agree with those at 45 digits within the 30-digit estimates (about 1e-28), the self-checks hold,
 * and the double-precision data lie within their own estimates of them.
 */
class HighPrecisionTest {

    /** Samples.member1State with a(-2)21 from det a_-2 = 1 exactly in the arithmetic. */
    private static <T> LaxMatrix<T> member1(AnalyticArithmetic<T> ar) {
        List<T> state = new ArrayList<>();
        for (Complex c : Samples.member1State()) {
            state.add(ar.of(c.getReal(), c.getImaginary()));
        }
        state.set(2, ar.negate(ar.divide(ar.add(ar.one(), ar.multiply(state.get(0), state.get(0))), state.get(1))));
        return LaxMatrix.of(ar, 1, ar.of(0.5), List.of(), ar.one(), state.get(3), state, new double[6], 0);
    }

    private static <T> List<Complex> values(MonodromyData<T> d) {
        List<Complex> v = new ArrayList<>();
        for (Estimate<T> e : d.quantities()) {
            v.add(d.arithmetic().toComplex(e.value()));
        }
        return v;
    }

    @Test
    void thirtyDigitsAgreeWithFortyFiveWithinTheirEstimates() {
        MonodromyData<MpComplex> d30 = MonodromyMap.withDigits(30).compute(member1(new MpArithmetic(30)));
        MpArithmetic ar45 = new MpArithmetic(45);
        MonodromyData<MpComplex> d45 = MonodromyMap.of(ar45).compute(member1(ar45));
        assertTrue(d30.checksHold() && d45.checksHold(), d30.checks() + "\n" + d45.checks());
        List<Estimate<MpComplex>> q30 = d30.quantities();
        List<Estimate<MpComplex>> q45 = d45.quantities();
        for (int i = 0; i < q30.size(); i++) {
            // the difference in 45-digit arithmetic (the 30-digit value converted exactly)
            MpComplex a = ar45.context().round(q30.get(i).value());
            double diff = ar45.abs(ar45.subtract(a, q45.get(i).value()));
            assertTrue(q30.get(i).error() < 1e-26 * (1 + ar45.abs(q45.get(i).value())), "estimate " + q30.get(i).error());
            assertTrue(diff <= q30.get(i).error() + q45.get(i).error(), "quantity " + i + ": " + diff + " > "
                    + q30.get(i).error());
        }
        // the double-precision data within their estimates of the accurate values
        MonodromyData<Complex> dd = MonodromyMap.doublePrecision().compute(member1(ComplexArithmetic.INSTANCE));
        List<Complex> accurate = values(d45);
        List<Estimate<Complex>> qd = dd.quantities();
        for (int i = 0; i < qd.size(); i++) {
            double diff = qd.get(i).value().subtract(accurate.get(i)).norm();
            assertTrue(diff <= qd.get(i).error(), "double quantity " + i + ": " + diff + " > " + qd.get(i).error());
        }
    }

    /**
     * At 125 digits the Taylor order is 150: the propagator's coefficients (doubles, kept for the error estimate)
     * overflowed near lambda = 0 and the steps shrank to nothing (exit 3 from the command at 125 digits and more);
     * they are now kept in powers of h over the largest step. The data agree with the 45-digit ones.
     */
    @Test
    void manyDigitsAgreeWithFortyFive() {
        MpArithmetic ar125 = new MpArithmetic(125);
        MonodromyData<MpComplex> d125 = MonodromyMap.of(ar125).compute(member1(ar125));
        MpArithmetic ar45 = new MpArithmetic(45);
        MonodromyData<MpComplex> d45 = MonodromyMap.of(ar45).compute(member1(ar45));
        assertTrue(d125.checksHold(), d125.checks().toString());
        List<Estimate<MpComplex>> q125 = d125.quantities();
        List<Estimate<MpComplex>> q45 = d45.quantities();
        for (int i = 0; i < q125.size(); i++) {
            MpComplex a = ar45.context().round(q125.get(i).value());
            double diff = ar45.abs(ar45.subtract(a, q45.get(i).value()));
            assertTrue(diff <= q125.get(i).error() + q45.get(i).error(), "quantity " + i + ": " + diff);
        }
    }

    @Test
    void member2InThirtyDigits() {
        MpArithmetic ar = new MpArithmetic(30);
        List<MpComplex> state = new ArrayList<>();
        for (Complex c : Samples.member2().startState()) {
            state.add(ar.of(c.getReal(), c.getImaginary()));
        }
        // the diagonal entries and a(-2)11 recomputed from the constraints in 30 digits
        LaxMatrix<MpComplex> rough = LaxMatrix.of(ar, 2, ar.of(0.3), List.of(ar.of(0.5)), ar.one(), ar.of(0, 0.2), state,
                new double[9], 0);
        StateChart<MpComplex> chart = new StateChart<>(ar, 2, ar.of(0.3), List.of(ar.of(0.5)), ar.one(), ar.of(0, 0.2), rough.traceIntegral(),
                false, true);
        List<MpComplex> exact = chart.state(chart.coordinates(state));
        MonodromyData<MpComplex> d = MonodromyMap.of(ar).compute(LaxMatrix.of(ar, 2, ar.of(0.3), List.of(ar.of(0.5)),
                ar.one(), ar.of(0, 0.2), exact, new double[9], 0));
        assertTrue(d.checksHold(), d.checks().toString());
        for (Estimate<MpComplex> e : d.quantities()) {
            assertTrue(e.error() < 1e-25 * (1 + ar.abs(e.value())), "estimate " + e.error());
        }
    }

    /** The same generic code in Apfloat (ApcomplexArithmetic) agrees with MpArithmetic. */
    @Test
    @Tag("slow")
    void apfloatArithmeticAgrees() {
        ApcomplexArithmetic ap = new ApcomplexArithmetic(25);
        MonodromyData<Apcomplex> a = MonodromyMap.of(ap).compute(member1(ap));
        MonodromyData<MpComplex> b = MonodromyMap.withDigits(30).compute(member1(new MpArithmetic(30)));
        List<Complex> vb = values(b);
        List<Estimate<Apcomplex>> qa = a.quantities();
        for (int i = 0; i < qa.size(); i++) {
            double diff = ap.toComplex(qa.get(i).value()).subtract(vb.get(i)).norm();
            assertTrue(diff <= qa.get(i).error() + 1e-15 * (1 + vb.get(i).norm()), i + ": " + diff);
        }
    }
}
