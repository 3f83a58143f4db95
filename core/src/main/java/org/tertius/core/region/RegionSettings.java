package org.tertius.core.region;

import java.util.function.BooleanSupplier;
import org.tertius.core.InvalidInputException;

/**
 * Settings of a region computation. Immutable; build with {@link #builder()}.
 * <ul>
 *   <li>maxRelativeError: a grid point is served from a stored approximant when its local error there is below
 *   this (relative to 1 + |y|); otherwise it gets its own path (default 1e-10).</li>
 *   <li>threads: worker threads for the grid pass (default: available processors). Results do not depend on
 *   it.</li>
 *   <li>progress: called with (done, total) points from time to time.</li>
 *   <li>cancelled: polled between points; when true the computation stops with a
 *   {@link java.util.concurrent.CancellationException}.</li>
 * </ul>
 */
public final class RegionSettings {
    /** Receives progress. */
    @FunctionalInterface
    public interface Progress {
        void update(long done, long total);
    }

    private final double maxRelativeError;
    private final int threads;
    private final Progress progress;
    private final BooleanSupplier cancelled;

    private RegionSettings(Builder b) {
        this.maxRelativeError = b.maxRelativeError;
        this.threads = b.threads;
        this.progress = b.progress;
        this.cancelled = b.cancelled;
    }

    public static Builder builder() {
        return new Builder();
    }

    public static RegionSettings defaults() {
        return builder().build();
    }

    public double maxRelativeError() {
        return maxRelativeError;
    }

    public int threads() {
        return threads;
    }

    public Progress progress() {
        return progress;
    }

    public BooleanSupplier cancelled() {
        return cancelled;
    }

    /**
     * The same settings reporting progress as the part [offset, offset + width] of the whole (in thousandths),
     * for one phase of a computation of several.
     */
    RegionSettings withProgressScaled(double offset, double width) {
        Builder b = builder().threads(threads).cancelled(cancelled);
        b.maxRelativeError = maxRelativeError;
        Progress whole = progress;
        b.progress((done, total) -> whole.update(Math.round(1000 * (offset + width * done / Math.max(1.0, total))),
                1000));
        return b.build();
    }

    /** Builder with validation. */
    public static final class Builder {
        private double maxRelativeError = 1e-10;
        private int threads = Runtime.getRuntime().availableProcessors();
        private Progress progress = (d, t) -> { };
        private BooleanSupplier cancelled = () -> false;

        public Builder maxRelativeError(double e) {
            if (!(e >= 1e-15 && e <= 1e-2)) {
                throw new InvalidInputException("maxRelativeError", "must be in [1e-15, 1e-2], got " + e);
            }
            this.maxRelativeError = e;
            return this;
        }

        public Builder threads(int threads) {
            if (threads < 1 || threads > 1024) {
                throw new InvalidInputException("threads", "must be in [1, 1024], got " + threads);
            }
            this.threads = threads;
            return this;
        }

        public Builder progress(Progress progress) {
            this.progress = progress;
            return this;
        }

        public Builder cancelled(BooleanSupplier cancelled) {
            this.cancelled = cancelled;
            return this;
        }

        public RegionSettings build() {
            return new RegionSettings(this);
        }
    }
}
