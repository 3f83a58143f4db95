package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;

/**
 * The constants of member n: the times t_2 .. t_n of the phase
 * {@code theta = x lambda + t_2 lambda^2 + ... + t_n lambda^n + s / lambda}, s, and the formal monodromy m at
 * lambda = infinity (the diagonal of a_{-1} for n = 1). Immutable; build with {@link #builder(int)}.
 */
public final class MemberParameters {
    private final int order;
    private final List<Complex> times;
    private final Complex s;
    private final Complex m;
    /** The times and m as given exactly, or null where given as doubles. */
    private final ExactNumber[] exactTimes;
    private final ExactNumber exactM;

    private MemberParameters(Builder b) {
        this.order = b.order;
        this.times = List.copyOf(b.times);
        this.s = b.s;
        this.m = b.m;
        this.exactTimes = b.exactTimes;
        this.exactM = b.exactM;
    }

    /** A builder for member n (1 &lt;= n &lt;= {@link HierarchyMember#MAX_ORDER}). */
    public static Builder builder(int n) {
        HierarchyMember.checkOrder(n);
        return new Builder(n);
    }

    public int order() {
        return order;
    }

    /** t_2 .. t_n (empty for n = 1). */
    public List<Complex> times() {
        return times;
    }

    /** t_j for 2 &lt;= j &lt;= n. */
    public Complex time(int j) {
        if (j < 2 || j > order) {
            throw new InvalidInputException("j", "times t_2 .. t_" + order + " exist for member " + order
                    + ", got t_" + j);
        }
        return times.get(j - 2);
    }

    public Complex s() {
        return s;
    }

    public Complex m() {
        return m;
    }

    /**
     * The times t_2 .. t_n and m as exact numbers (those given as doubles: their binary values, vouched for to
     * {@link ExactNumber#DOUBLE_DIGITS} digits), in the order of the ring: t_2 .. t_n, m.
     */
    public List<ExactNumber> exactTimesAndM() {
        List<ExactNumber> out = new ArrayList<>();
        for (int j = 0; j < times.size(); j++) {
            out.add(exactTimes != null && exactTimes[j] != null ? exactTimes[j]
                    : ExactNumber.ofDouble("t_" + (j + 2), times.get(j)));
        }
        out.add(exactM != null ? exactM : ExactNumber.ofDouble("m", m));
        return out;
    }

    /** The same parameters with t_n replaced (n &gt;= 2). */
    public MemberParameters withTopTime(Complex tn) {
        if (order < 2) {
            throw new InvalidInputException("t_n", "member 1 has no time besides x");
        }
        List<ExactNumber> exact = exactTimesAndM();
        ExactNumber[] t = exact.subList(0, order - 1).toArray(new ExactNumber[0]);
        t[order - 2] = ExactNumber.ofDouble("t_" + order, tn);
        return builder(order).times(t).s(s).m(exact.get(order - 1)).build();
    }

    /** Values of the ring parameters x, t_2 .. t_n, m, in ring order. */
    List<Complex> ringValues(Complex x) {
        List<Complex> v = new ArrayList<>();
        v.add(x);
        v.addAll(times);
        v.add(m);
        return v;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("member " + order + ": s = " + s + ", m = " + m);
        for (int j = 2; j <= order; j++) {
            sb.append(", t_").append(j).append(" = ").append(time(j));
        }
        return sb.toString();
    }

    /** Builder with validation in {@link #build()}. Not thread-safe. */
    public static final class Builder {
        private final int order;
        private List<Complex> times = List.of();
        private Complex s;
        private Complex m = Complex.ZERO;
        private ExactNumber[] exactTimes;
        private ExactNumber exactM;

        private Builder(int order) {
            this.order = order;
        }

        /** t_2 .. t_n, exactly n - 1 values (none for n = 1); t_n must be non-zero. */
        public Builder times(Complex... times) {
            this.times = Arrays.asList(times.clone());
            this.exactTimes = null;
            return this;
        }

        /** t_2 .. t_n given exactly (for high precision). */
        public Builder times(ExactNumber... times) {
            Complex[] c = new Complex[times.length];
            for (int j = 0; j < times.length; j++) {
                if (times[j] == null) {
                    throw new InvalidInputException("t_" + (j + 2), "is required");
                }
                c[j] = times[j].toComplex();
            }
            times(c);
            this.exactTimes = times.clone();
            return this;
        }

        /** m given exactly (for high precision). */
        public Builder m(ExactNumber m) {
            if (m == null) {
                throw new InvalidInputException("m", "is required");
            }
            this.m = m.toComplex();
            this.exactM = m;
            return this;
        }

        public Builder s(Complex s) {
            this.s = s;
            return this;
        }

        public Builder m(Complex m) {
            this.m = m;
            this.exactM = null;
            return this;
        }

        public MemberParameters build() {
            if (times.size() != order - 1) {
                throw new InvalidInputException("times", "member " + order + " takes " + (order - 1)
                        + " times t_2 .. t_" + order + ", got " + times.size());
            }
            for (int j = 0; j < times.size(); j++) {
                requireFinite("t_" + (j + 2), times.get(j));
            }
            if (order >= 2 && times.get(order - 2).norm() == 0) {
                throw new InvalidInputException("t_" + order, "must be non-zero: member " + order
                        + " degenerates when its top time vanishes (q = a(" + (order - 2) + ")12 / (" + order
                        + " t_" + order + "))");
            }
            requireFinite("s", s);
            requireFinite("m", m);
            return new MemberParameters(this);
        }

        private static void requireFinite(String name, Complex c) {
            if (c == null) {
                throw new InvalidInputException(name, "is required");
            }
            if (!Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
                throw new InvalidInputException(name, "must be a finite complex number, got " + c);
            }
        }
    }
}
