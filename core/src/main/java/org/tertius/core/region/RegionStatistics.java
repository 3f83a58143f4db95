package org.tertius.core.region;

import java.util.Locale;

/**
 * What a region computation did: nodes of the tree, steps taken, points served from stored approximants,
 * points that needed their own path, points that could not be computed, and the wall time of each phase.
 */
public final class RegionStatistics {
    private final int nodes;
    private final int newNodes;
    private final int servedFromTree;
    private final int integrated;
    private final int failed;
    private final long treeNanos;
    private final long gridNanos;
    private final long treeBytes;

    RegionStatistics(int nodes, int newNodes, int servedFromTree, int integrated, int failed, long treeNanos,
                     long gridNanos, long treeBytes) {
        this.nodes = nodes;
        this.newNodes = newNodes;
        this.servedFromTree = servedFromTree;
        this.integrated = integrated;
        this.failed = failed;
        this.treeNanos = treeNanos;
        this.gridNanos = gridNanos;
        this.treeBytes = treeBytes;
    }

    public int nodes() {
        return nodes;
    }

    /** Nodes added by this computation (steps taken). */
    public int newNodes() {
        return newNodes;
    }

    public int servedFromTree() {
        return servedFromTree;
    }

    public int integrated() {
        return integrated;
    }

    public int failed() {
        return failed;
    }

    public long treeNanos() {
        return treeNanos;
    }

    public long gridNanos() {
        return gridNanos;
    }

    /** Approximate bytes held by the path tree. */
    public long treeBytes() {
        return treeBytes;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT,
                "%d nodes (%d new), %d points from stored approximants, %d by own path, %d failed;"
                        + " tree %.3f s, grid %.3f s, tree %.1f MB",
                nodes, newNodes, servedFromTree, integrated, failed, treeNanos / 1e9, gridNanos / 1e9, treeBytes / 1e6);
    }
}
