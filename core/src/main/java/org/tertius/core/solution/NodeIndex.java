package org.tertius.core.solution;

import java.util.Arrays;
import java.util.concurrent.ConcurrentHashMap;
import org.tertius.core.number.Cx;
import org.tertius.core.step.Node;

/**
 * A spatial hash of the nodes of a path tree in the integration variable: square cells of a fixed side, each
 * listing the ids of the nodes whose disks meet it. Cells are replaced whole (copy on write) under the owner's
 * lock, so readers never see a half-written cell; a reader may see ids newer than its node snapshot and must
 * ignore them.
 */
final class NodeIndex {
    /** Cell side in tau. */
    static final double CELL = 0.1;
    /** Nodes with a disk larger than this many cells across are kept in a separate list instead. */
    private static final int MAX_SPAN = 40;
    private static final int[] EMPTY = new int[0];

    private final ConcurrentHashMap<Long, int[]> cells = new ConcurrentHashMap<>();
    private volatile int[] large = EMPTY;

    /**
     * The cell (i, j) as a map key: the packed pair passed through a bijection of the longs (an odd multiplier,
     * then an xor-shift), so that Long's hash, the xor of the two halves, differs between neighbouring cells; the
     * packed pair alone hashes to i ^ j, the same along whole diagonals, which piled the cells of a disk into a
     * few bins.
     */
    private static long key(long i, long j) {
        long k = ((i << 32) ^ (j & 0xffffffffL)) * 0x9E3779B97F4A7C15L;
        return k ^ (k >>> 29);
    }

    /** Adds a node; call under the owner's lock. */
    void add(Node n) {
        double r = n.radius();
        long i0 = (long) Math.floor((n.tauRe() - r) / CELL);
        long i1 = (long) Math.floor((n.tauRe() + r) / CELL);
        long j0 = (long) Math.floor((n.tauIm() - r) / CELL);
        long j1 = (long) Math.floor((n.tauIm() + r) / CELL);
        if (i1 - i0 > MAX_SPAN || j1 - j0 > MAX_SPAN) {
            int[] l = Arrays.copyOf(large, large.length + 1);
            l[l.length - 1] = n.id();
            large = l;
            return;
        }
        for (long i = i0; i <= i1; i++) {
            for (long j = j0; j <= j1; j++) {
                // only cells that the disk really meets
                double cx = Math.max(i * CELL, Math.min(n.tauRe(), (i + 1) * CELL));
                double cy = Math.max(j * CELL, Math.min(n.tauIm(), (j + 1) * CELL));
                if (Cx.abs(cx - n.tauRe(), cy - n.tauIm()) > r) {
                    continue;
                }
                cells.merge(key(i, j), new int[] {n.id()}, (a, b) -> {
                    int[] c = Arrays.copyOf(a, a.length + 1);
                    c[a.length] = b[0];
                    return c;
                });
            }
        }
    }

    /** Ids of the nodes whose disks may contain tau (a superset). */
    int[] candidates(double tRe, double tIm) {
        int[] c = cells.getOrDefault(key((long) Math.floor(tRe / CELL), (long) Math.floor(tIm / CELL)), EMPTY);
        int[] l = large;
        if (l.length == 0) {
            return c;
        }
        int[] all = Arrays.copyOf(c, c.length + l.length);
        System.arraycopy(l, 0, all, c.length, l.length);
        return all;
    }
}
