package org.tertius.core.solution;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicIntegerArray;
import java.util.concurrent.atomic.AtomicReferenceArray;
import java.util.concurrent.locks.LockSupport;
import java.util.function.IntConsumer;
import org.tertius.core.TertiusException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.step.Node;

/**
 * Grows a tree towards targets in a fixed order, with the tree that one thread growing it target by target would
 * build ({@link Solution#extendTo}: nothing where a stored node serves the target, else a path from the nearest
 * node, or from the root when that path fails; a target whose path fails from both adds nothing), bit for bit,
 * while other threads trace the paths of the targets just ahead, each from the tree as it stood when its tracing
 * began. A path depends on its start node and its target alone, so a path traced ahead is the path of the
 * one-thread growth exactly when its start node is still the nearest node once the targets before it have added
 * theirs and the target is still not served: it is then taken, otherwise dropped and traced again. A target found
 * served ahead stays served (nodes are only ever added). The tree therefore does not depend on the number of
 * threads; with one thread nothing is traced ahead.
 */
final class AheadGrowth {
    /** How far ahead of the target being added the other threads may work. */
    private static final int WINDOW = 12;
    /** The longest wait for a path being traced ahead (a few times the time of a typical path). */
    private static final long MAX_WAIT_NANOS = 2_000_000;
    private static final int FREE = 0;
    private static final int AHEAD = 1;
    private static final int DONE = 2;
    private static final int TAKEN = 3;

    /** What was found for a target ahead, from the tree as it stood then. */
    private static final class Ahead {
        /** Served (or inside a disk, when only points outside all disks are targets) already then. */
        boolean covered;
        /** The nearest node then, and the outcome of the path from it (a trace or a failure). */
        Node start;
        PathTracer.Trace fromStart;
        RuntimeException startFailure;
        /** The outcome of the path from the root, when the path from the start failed and the start is not it. */
        PathTracer.Trace fromRoot;
        RuntimeException rootFailure;
    }

    private final Solution owner;
    private final double[] tauRe;
    private final double[] tauIm;
    private final boolean outsideDisksOnly;
    private final AtomicIntegerArray status;
    private final AtomicReferenceArray<Ahead> found;
    private final AtomicInteger next = new AtomicInteger(1);
    private volatile int cursor;
    private volatile boolean stop;
    private volatile Thread main;

    private AheadGrowth(Solution owner, double[] tauRe, double[] tauIm, boolean outsideDisksOnly) {
        this.owner = owner;
        this.tauRe = tauRe;
        this.tauIm = tauIm;
        this.outsideDisksOnly = outsideDisksOnly;
        this.status = new AtomicIntegerArray(tauRe.length);
        this.found = new AtomicReferenceArray<>(tauRe.length);
    }

    /**
     * Grows the tree of {@code owner} towards the targets in their order.
     *
     * @param outsideDisksOnly whether a target inside the disk of a stored node is passed over as served
     * @param threads the threads to use (this one and threads - 1 others)
     * @param before called with each target's index before it is added (progress; may throw to cancel)
     */
    static void grow(Solution owner, double[] tauRe, double[] tauIm, boolean outsideDisksOnly, int threads,
                     IntConsumer before) {
        new AheadGrowth(owner, tauRe, tauIm, outsideDisksOnly).run(threads, before);
    }

    private void run(int threads, IntConsumer before) {
        main = Thread.currentThread();
        int helpers = Math.min(threads - 1, tauRe.length - 1);
        for (int h = 0; h < helpers; h++) {
            Thread t = new Thread(this::traceAhead, "tertius-tree-ahead");
            t.setDaemon(true);
            t.start();
        }
        try {
            for (int k = 0; k < tauRe.length; k++) {
                cursor = k;
                before.accept(k);
                add(k);
            }
        } finally {
            stop = true;
        }
    }

    /**
     * Adds target k as the one-thread growth does, using what was found ahead where it is still valid: the cheap
     * tests (inside a disk, served) are made here; a path traced ahead is waited for only where a path is needed.
     */
    private void add(int k) {
        boolean mine = status.compareAndSet(k, FREE, TAKEN);
        Ahead a = !mine && status.get(k) == DONE ? found.get(k) : null;
        if (a != null && a.covered) {
            return;
        }
        double re = tauRe[k];
        double im = tauIm[k];
        Node[] snapshot = owner.snapshot();
        if (outsideDisksOnly && TreeReader.inSomeDisk(snapshot, owner.index(), re, im)) {
            return;
        }
        try {
            owner.checkTarget(re, im);
        } catch (TertiusException e) {
            return;
        }
        if (TreeReader.bestCovering(snapshot, owner.index(), re, im, owner.stepper(), owner.settings().tolerance())
                != null) {
            return;
        }
        if (!mine && a == null) {
            // a path being traced ahead is waited for a while, not longer: a helper kept from its processor (a
            // busy machine) must not hold this thread up, which then traces the path itself
            long until = System.nanoTime() + MAX_WAIT_NANOS;
            while (status.get(k) == AHEAD && System.nanoTime() < until) {
                LockSupport.parkNanos(20_000);
            }
            a = status.get(k) == DONE ? found.get(k) : null;
        }
        Node start = TreeReader.nearest(snapshot, re, im);
        boolean reuse = a != null && a.start == start;
        PathTracer.Trace t;
        try {
            t = reuse ? replay(a.fromStart, a.startFailure) : trace(start, re, im);
        } catch (UnreachableTargetException fromNearest) {
            if (start == snapshot[0]) {
                return;
            }
            start = snapshot[0];
            try {
                t = reuse ? replay(a.fromRoot, a.rootFailure) : trace(start, re, im);
            } catch (TertiusException fromRoot) {
                return;
            }
        } catch (TertiusException e) {
            return;
        }
        if (t.steps() > 0) {
            owner.merge(start, t.nodes());
        }
    }

    private static PathTracer.Trace replay(PathTracer.Trace trace, RuntimeException failure) {
        if (failure != null) {
            throw failure;
        }
        return trace;
    }

    private PathTracer.Trace trace(Node start, double re, double im) {
        return PathTracer.trace(start, re, im, owner.stepper(), owner.settings(), owner.singularAtOrigin());
    }

    /** A helper thread: the targets just ahead of the one being added, each from the tree as it stands now. */
    private void traceAhead() {
        while (!stop) {
            int c = cursor;
            int i = next.get();
            if (i <= c) {
                next.compareAndSet(i, c + 1);
                continue;
            }
            if (i >= tauRe.length) {
                return;
            }
            if (i > c + WINDOW) {
                LockSupport.parkNanos(50_000);
                continue;
            }
            if (!next.compareAndSet(i, i + 1) || !status.compareAndSet(i, FREE, AHEAD)) {
                continue;
            }
            Ahead a = null;
            try {
                a = lookAhead(i);
            } finally {
                // a failure of the helper leaves the target to the thread that adds it
                found.set(i, a);
                status.set(i, DONE);
                LockSupport.unpark(main);
            }
        }
    }

    private Ahead lookAhead(int k) {
        double re = tauRe[k];
        double im = tauIm[k];
        Node[] snapshot = owner.snapshot();
        Ahead a = new Ahead();
        if (outsideDisksOnly && TreeReader.inSomeDisk(snapshot, owner.index(), re, im)) {
            a.covered = true;
            return a;
        }
        try {
            owner.checkTarget(re, im);
        } catch (TertiusException e) {
            return null;
        }
        if (TreeReader.bestCovering(snapshot, owner.index(), re, im, owner.stepper(), owner.settings().tolerance())
                != null) {
            a.covered = true;
            return a;
        }
        a.start = TreeReader.nearest(snapshot, re, im);
        try {
            a.fromStart = trace(a.start, re, im);
        } catch (RuntimeException e) {
            a.startFailure = e;
            if (e instanceof UnreachableTargetException && a.start != snapshot[0]) {
                try {
                    a.fromRoot = trace(snapshot[0], re, im);
                } catch (RuntimeException r) {
                    a.rootFailure = r;
                }
            }
        }
        return a;
    }
}
