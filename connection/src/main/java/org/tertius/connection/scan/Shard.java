package org.tertius.connection.scan;

import java.util.Set;
import java.util.StringJoiner;
import org.tertius.core.InvalidInputException;

/**
 * Shard {@code i} of {@code n} of a sweep: the tasks whose index k has {@code k mod n == i - 1}. Dealt out in
 * turn rather than in blocks, so that the costly parts of a parameter range are spread over all shards. The n
 * shards are disjoint and cover every task; each task is a pure function of its index, so their rows together are
 * the rows of the whole sweep. Immutable.
 */
public final class Shard {
    /** The whole sweep as one shard. */
    public static final Shard WHOLE = new Shard(1, 1);
    /** Largest number of shards. */
    public static final int MAX_COUNT = 100_000;
    private final int index;
    private final int count;

    private Shard(int index, int count) {
        this.index = index;
        this.count = count;
    }

    /**
     * Shard {@code index} of {@code count}.
     *
     * @throws InvalidInputException ("shard") unless 1 &lt;= index &lt;= count &lt;= {@link #MAX_COUNT}
     */
    public static Shard of(int index, int count) {
        if (count < 1 || count > MAX_COUNT || index < 1 || index > count) {
            throw new InvalidInputException("shard", "expected I/N with 1 <= I <= N <= " + MAX_COUNT + ", got "
                    + index + "/" + count);
        }
        return new Shard(index, count);
    }

    /**
     * Reads {@code I/N}.
     *
     * @param argument the argument name for the error message
     * @throws InvalidInputException unless the text is I/N with 1 &lt;= I &lt;= N &lt;= {@link #MAX_COUNT}
     */
    public static Shard parse(String argument, String text) {
        String t = text == null ? "" : text.trim();
        String[] p = t.split("/", -1);
        String expected = "expected I/N, shard I of N with 1 <= I <= N <= " + MAX_COUNT + " (e.g. 2/4), got '" + t + "'";
        if (p.length != 2 || !p[0].matches("[0-9]{1,6}") || !p[1].matches("[0-9]{1,6}")) {
            throw new InvalidInputException(argument, expected);
        }
        int i = Integer.parseInt(p[0]);
        int n = Integer.parseInt(p[1]);
        if (n < 1 || n > MAX_COUNT || i < 1 || i > n) {
            throw new InvalidInputException(argument, expected);
        }
        return new Shard(i, n);
    }

    /**
     * The message for a set of shard files that lacks some of the {@code count} shards: "shard 2/4 is missing (3 of
     * 4 shard files given)" or "shards 1/4, 3/4 are missing (...)".
     */
    public static String missing(Set<Integer> given, int count) {
        StringJoiner missing = new StringJoiner(", ");
        for (int i = 1; i <= count; i++) {
            if (!given.contains(i)) {
                missing.add(i + "/" + count);
            }
        }
        boolean one = count - given.size() == 1;
        return "shard" + (one ? " " : "s ") + missing + (one ? " is" : " are") + " missing (" + given.size() + " of "
                + count + " shard files given)";
    }

    /** 1-based index of this shard. */
    public int index() {
        return index;
    }

    /** Number of shards. */
    public int count() {
        return count;
    }

    public boolean isWhole() {
        return count == 1;
    }

    /** Whether task {@code task} belongs to this shard. */
    public boolean contains(int task) {
        return task % count == index - 1;
    }

    /** The tasks of this shard among {@code total}, ascending. */
    public int[] tasks(int total) {
        int first = index - 1;
        int size = first >= total ? 0 : (total - first + count - 1) / count;
        int[] out = new int[size];
        for (int k = 0; k < size; k++) {
            out[k] = first + k * count;
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Shard && ((Shard) o).index == index && ((Shard) o).count == count;
    }

    @Override
    public int hashCode() {
        return 31 * index + count;
    }

    /** {@code I/N}. */
    @Override
    public String toString() {
        return index + "/" + count;
    }
}
