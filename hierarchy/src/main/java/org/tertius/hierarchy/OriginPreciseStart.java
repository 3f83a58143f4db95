package org.tertius.hierarchy;

import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.hipparchus.complex.Complex;
import org.tertius.core.TertiusException;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The state on x = 0 at an exact t_n of a member n &gt;= 2 started at x = t_n = 0, at any working precision: within
 * the disk where the double-precision solution uses the t_n-series, that series summed to the precision; beyond,
 * the t_n-flow along the ray from the series' hand-over point replayed in arbitrary precision
 * ({@link TimeRayForm}) to as many digits as the context carries. A run at two precisions (as the replay of the
 * x-flow does) recomputes this stage at each, so that its error enters the digit estimate. Thread-safe.
 */
final class OriginPreciseStart implements ExactStart.CarriedStart {
    private static final String[] NAMES = {"a(-2)11(0)", "a(-2)12(0)", "a(-2)21(0)"};

    private final OriginSolution origin;
    private final List<ExactNumber> data;
    private final ExactNumber m;
    private final ExactNumber tn;
    private final Map<Integer, MpComplex[]> byPrecision = new ConcurrentHashMap<>();

    /**
     * @param data a11, a12, a21 of a_-2(0), exactly
     * @param m the exact m
     * @param tn the exact t_n (non-zero)
     */
    OriginPreciseStart(OriginSolution origin, List<ExactNumber> data, ExactNumber m, ExactNumber tn) {
        this.origin = origin;
        this.data = List.copyOf(data);
        this.m = m;
        this.tn = tn;
    }

    @Override
    public void requireDigits(int digits) {
        for (int i = 0; i < 3; i++) {
            ExactStart.require(NAMES[i], data.get(i), digits);
        }
    }

    @Override
    public MpComplex[] state(MpContext ctx) {
        return byPrecision.computeIfAbsent(ctx.bits(), b -> compute(ctx)).clone();
    }

    private MpComplex[] compute(MpContext ctx) {
        Complex t = tn.toComplex();
        TimeRayForm stage = new TimeRayForm(origin, origin.ray(t), origin.rayStart(t), data, m);
        if (t.norm() <= origin.handover()) {
            return stage.seriesState(ctx, ctx.fromExact(tn));
        }
        int digits = Math.max(HighPrecisionSolution.MIN_DIGITS, ctx.digits());
        HighPrecisionValue v = HighPrecisionSolution.ofForm(stage, digits).evaluate(ExactPoint.of(tn, 0));
        if (v.correctDigits() < digits) {
            throw new TertiusException("the t_" + origin.member().order() + "-flow on x = 0 reaches t_"
                    + origin.member().order() + " = " + t + " with " + v.correctDigits() + " correct digits only, "
                    + digits + " were needed");
        }
        MpComplex[] state = new MpComplex[v.size()];
        for (int i = 0; i < state.length; i++) {
            state[i] = ctx.round(ctx.fromApcomplex(v.value(i)));
        }
        return state;
    }
}
