package org.tertius.core.highprecision;

import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/** The values at one point from one pass (at the pass's precision), with the number of steps on its path. */
final class Outcome {
    final MpContext ctx;
    final MpComplex[] values;
    final int steps;

    Outcome(MpContext ctx, MpComplex[] values, int steps) {
        this.ctx = ctx;
        this.values = values;
        this.steps = steps;
    }
}
