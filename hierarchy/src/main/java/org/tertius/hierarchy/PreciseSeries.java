package org.tertius.hierarchy;

import java.util.function.IntFunction;
import org.tertius.core.TertiusException;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * A convergent series of a start state summed in arbitrary precision to the working precision: as many orders as
 * make its last term fall below the precision (estimated from the double-precision series' radius, then checked
 * on the series itself, doubling the order until it holds). Stateless.
 */
final class PreciseSeries {
    /** Orders tried at most (the point lies well inside the disk of convergence). */
    static final int MAX_ORDER = 20000;

    private PreciseSeries() {
    }

    /**
     * @param ofOrder the series with the given number of orders, in the context's arithmetic
     * @param at the point (inside the disk, |at| &lt; radius)
     * @param radius the radius of convergence estimated in double precision
     * @param scale the size of the state (at least 1)
     * @param what what the series gives, for the message if it cannot reach the precision
     */
    static MpComplex[] sum(MpContext ctx, IntFunction<FrobeniusSeries<MpComplex>> ofOrder, MpComplex at,
                           double radius, double scale, String what) {
        double x = at.abs();
        double wanted = Math.log(Math.max(scale, 1)) - ctx.bits() * Math.log(2) - 10;
        int order = x == 0 ? 1 : (int) Math.ceil(wanted / Math.log(x / radius)) + 8;
        order = Math.max(order, 8);
        while (order <= MAX_ORDER) {
            FrobeniusSeries<MpComplex> series = ofOrder.apply(order);
            if (x == 0 || Math.log(series.lastTerm(x)) <= wanted) {
                return series.value(at);
            }
            order *= 2;
        }
        throw new TertiusException("the series of the " + what + " does not reach the working precision at |"
                + "point| = " + x + " within " + MAX_ORDER + " orders");
    }
}
