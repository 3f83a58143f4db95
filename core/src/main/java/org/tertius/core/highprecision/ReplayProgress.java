package org.tertius.core.highprecision;

import java.util.function.DoubleConsumer;

/** Progress over the phases of a high-precision computation, reported as a fraction in [0, 1]. */
final class ReplayProgress {
    private final DoubleConsumer sink;
    private double start;
    private double width;
    private double total = 1;
    private double done;

    ReplayProgress(DoubleConsumer sink) {
        this.sink = sink;
    }

    /** Starts a phase covering [start, start + width] of the whole. */
    void phase(double start, double width) {
        this.start = start;
        this.width = width;
        this.done = 0;
        this.total = 0;
    }

    /** Adds path length to the work expected in this phase. */
    void expect(double length) {
        total += length;
    }

    /** Reports path length done. */
    void advanced(double d) {
        done += d;
        if (sink != null && total > 0) {
            sink.accept(Math.min(1, start + width * Math.min(1, done / total)));
        }
    }

    void done() {
        if (sink != null) {
            sink.accept(1.0);
        }
    }
}
