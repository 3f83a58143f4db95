package org.tertius.connection.infinity;

import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;

/**
 * A Laurent polynomial in E with harmonics -width..width over an arithmetic of the project's family; entries never
 * set are zero (stored as null, so that products skip them). In double precision the coefficients are kept as
 * primitive real and imaginary parts ({@link DoubleLaurent}, the hot loop of the fits at infinity). Mutable; used by
 * one thread.
 *
 * @param <T> the number type
 */
class Laurent<T> {
    final AnalyticArithmetic<T> ar;
    final int width;
    private final Object[] c;
    int lo;
    int hi;

    Laurent(AnalyticArithmetic<T> ar, int width, boolean store) {
        this.ar = ar;
        this.width = width;
        this.c = store ? new Object[2 * width + 1] : null;
        this.lo = 1;
        this.hi = -1;
    }

    /** An empty polynomial of this arithmetic. */
    @SuppressWarnings("unchecked")
    static <T> Laurent<T> of(AnalyticArithmetic<T> ar, int width) {
        if (ar == ComplexArithmetic.INSTANCE) {
            return (Laurent<T>) new DoubleLaurent(width);
        }
        return new Laurent<>(ar, width, true);
    }

    /** The coefficient of E^k (zero outside the width). */
    T get(int k) {
        T v = raw(k);
        return v == null ? ar.zero() : v;
    }

    /** The coefficient of E^k, or null where it was never set. */
    @SuppressWarnings("unchecked")
    T raw(int k) {
        return Math.abs(k) > width ? null : (T) c[k + width];
    }

    /** Sets the coefficient of E^k; an exact zero where nothing was set is not stored (products skip it). */
    void set(int k, T v) {
        if (c[k + width] == null && ar.abs(v) == 0) {
            return;
        }
        c[k + width] = v;
        widen(k);
    }

    final void widen(int k) {
        if (lo > hi) {
            lo = k;
            hi = k;
        } else {
            lo = Math.min(lo, k);
            hi = Math.max(hi, k);
        }
    }

    /** s times this, s an integer. */
    Laurent<T> scaled(int s) {
        Laurent<T> r = new Laurent<>(ar, width, true);
        T factor = ar.of(s);
        for (int k = lo; k <= hi; k++) {
            T v = raw(k);
            if (v != null) {
                r.c[k + width] = ar.multiply(v, factor);
            }
        }
        r.lo = lo;
        r.hi = hi;
        return r;
    }

    /** this += s x. */
    void addInPlace(Laurent<T> x, T s) {
        for (int k = x.lo; k <= x.hi; k++) {
            T v = x.raw(k);
            if (v == null) {
                continue;
            }
            T t = ar.multiply(s, v);
            T old = raw(k);
            c[k + width] = old == null ? t : ar.add(old, t);
        }
        if (x.lo <= x.hi) {
            widen(x.lo);
            widen(x.hi);
        }
    }

    /** this += s x, s an integer. */
    void addInPlace(Laurent<T> x, int s) {
        addInPlace(x, ar.of(s));
    }

    Laurent<T> times(Laurent<T> y) {
        Laurent<T> r = new Laurent<>(ar, width, true);
        for (int i = lo; i <= hi; i++) {
            T x = raw(i);
            if (x == null) {
                continue;
            }
            for (int j = y.lo; j <= y.hi; j++) {
                int k = i + j;
                T yv = y.raw(j);
                if (Math.abs(k) > width || yv == null) {
                    continue;
                }
                T t = ar.multiply(x, yv);
                T old = r.raw(k);
                r.c[k + width] = old == null ? t : ar.add(old, t);
            }
        }
        if (lo <= hi && y.lo <= y.hi) {
            r.lo = Math.max(-width, lo + y.lo);
            r.hi = Math.min(width, hi + y.hi);
        }
        return r;
    }
}
