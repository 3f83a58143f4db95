package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The start data of a member solution as exact numbers, for the high-precision replay: the start point x0 and every
 * unknown there, or (member 1) a_{-2}(0) of the solution analytic at x = 0, whose series is then summed at the
 * engine's start point. Data given as doubles are kept as their binary values, vouched for to
 * {@link ExactNumber#DOUBLE_DIGITS} digits. Immutable.
 */
final class ExactStart {
    private final ExactNumber x0;
    private final List<ExactNumber> state;
    private final List<ExactNumber> origin;
    private final CarriedStart carried;

    private ExactStart(ExactNumber x0, List<ExactNumber> state, List<ExactNumber> origin, CarriedStart carried) {
        this.x0 = x0;
        this.state = state == null ? null : List.copyOf(state);
        this.origin = origin == null ? null : List.copyOf(origin);
        this.carried = carried;
    }

    /**
     * A start state that is not given but computed from exact data by another flow, at any working precision (the
     * state of a member n &gt;= 2 on x = 0 carried from x = t_n = 0 along the t_n-flow).
     */
    interface CarriedStart {
        /** Refuses data known to fewer digits than requested. */
        void requireDigits(int digits);

        /** The start state at the context's precision. */
        MpComplex[] state(MpContext ctx);
    }

    /** A start at x0 with every unknown given. */
    static ExactStart atPoint(ExactNumber x0, List<ExactNumber> state) {
        return new ExactStart(x0, state, null, null);
    }

    /** The solution analytic at x = 0 with a_{-2}(0) = [[a11, a12], [a21, -a11]]. */
    static ExactStart atOrigin(List<ExactNumber> a) {
        return new ExactStart(null, null, a, null);
    }

    /** A start at x0 whose state is carried there from exact data by another flow. */
    static ExactStart carried(ExactNumber x0, CarriedStart source) {
        return new ExactStart(x0, null, null, source);
    }

    /** The binary values of doubles. */
    static List<ExactNumber> ofDoubles(String name, List<Complex> values) {
        List<ExactNumber> out = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            out.add(ExactNumber.ofDouble(name + " " + (i + 1), values.get(i)));
        }
        return out;
    }

    /** Texts to exact numbers (decimals, p/q, complex a+bi of them). */
    static List<ExactNumber> parse(String name, List<String> texts) {
        List<ExactNumber> out = new ArrayList<>();
        for (String t : texts) {
            out.add(ExactNumber.parse(name, t));
        }
        return out;
    }

    static List<Complex> toComplex(List<ExactNumber> values) {
        List<Complex> out = new ArrayList<>();
        for (ExactNumber v : values) {
            out.add(v.toComplex());
        }
        return out;
    }

    /** The source of a carried start state (null otherwise). */
    CarriedStart carried() {
        return carried;
    }

    boolean atOrigin() {
        return origin != null;
    }

    /** The start point (null for a start at the origin, which is summed at the engine's start point). */
    ExactNumber x0() {
        return x0;
    }

    List<ExactNumber> state() {
        return state;
    }

    /** a11, a12, a21 of a_{-2}(0) (start at the origin only). */
    List<ExactNumber> origin() {
        return origin;
    }

    /** Refuses data known to fewer digits than requested. */
    void requireDigits(int digits) {
        if (carried != null) {
            require("x0", x0, digits);
            carried.requireDigits(digits);
            return;
        }
        if (origin != null) {
            String[] names = {"a(-2)11(0)", "a(-2)12(0)", "a(-2)21(0)"};
            for (int i = 0; i < 3; i++) {
                require(names[i], origin.get(i), digits);
            }
            return;
        }
        require("x0", x0, digits);
        for (int i = 0; i < state.size(); i++) {
            require("start state " + (i + 1), state.get(i), digits);
        }
    }

    static void require(String name, ExactNumber x, int digits) {
        if (x.significantDigits() < digits) {
            throw new InvalidInputException(name, "is known to about " + x.significantDigits() + " significant digits"
                    + " only (it was given as a binary double), but " + digits + " digits were requested: give it"
                    + " exactly, as a decimal string or a rational p/q such as 1/3");
        }
    }
}
