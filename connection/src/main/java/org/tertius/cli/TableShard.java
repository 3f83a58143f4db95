package org.tertius.cli;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.tertius.connection.scan.Shard;
import org.tertius.connection.scan.SweepSignature;
import org.tertius.core.InvalidInputException;

/**
 * The share of a table's points that one job computes ({@code table --shard I/N}): the table's points fall into
 * blocks (the rows of a grid or strip, or the single points of a line), dealt out in turn like the tasks of a
 * sweep (block k to shard k mod N + 1, so that the costly parts of a region spread over all shards). Every value
 * of a table depends on the problem, the region and the point only, so the N shards together hold the rows of the
 * whole table; {@link TableMerge} joins them into its bytes. A shard's file carries the line {@link #line()} after
 * the signature line. Immutable.
 */
final class TableShard {
    static final String PREFIX = "# shard: ";
    private static final Pattern LINE = Pattern.compile("# shard: ([0-9]{1,6})/([0-9]{1,6}) of ([0-9]{1,9}) blocks"
            + " of ([0-9]{1,9}) points; version (\\S+)");
    private final Shard shard;
    private final int blocks;
    private final int blockSize;
    private final String version;

    private TableShard(Shard shard, int blocks, int blockSize, String version) {
        this.shard = shard;
        this.blocks = blocks;
        this.blockSize = blockSize;
        this.version = version;
    }

    /** Shard {@code shard} of a table of {@code blocks} blocks of {@code blockSize} points each. */
    static TableShard of(Shard shard, int blocks, int blockSize) {
        return new TableShard(shard, blocks, blockSize, SweepSignature.libraryVersion());
    }

    /**
     * Reads the shard line of a shard file.
     *
     * @throws InvalidInputException (argument) naming the file unless the line is a shard line
     */
    static TableShard parse(String argument, String file, String line) {
        Matcher m = LINE.matcher(line == null ? "" : line);
        if (!m.matches()) {
            throw new InvalidInputException(argument, file + " is not a shard of a table (its second line is not"
                    + " '" + PREFIX + "I/N of B blocks of S points; version V'; write shards with 'tertius table"
                    + " --shard I/N')");
        }
        Shard s;
        try {
            s = Shard.of(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)));
        } catch (InvalidInputException e) {
            throw new InvalidInputException(argument, file + ": " + e.getMessage());
        }
        return new TableShard(s, Integer.parseInt(m.group(3)), Integer.parseInt(m.group(4)), m.group(5));
    }

    Shard shard() {
        return shard;
    }

    int blocks() {
        return blocks;
    }

    int blockSize() {
        return blockSize;
    }

    /** The version of the library that wrote the shard. */
    String version() {
        return version;
    }

    boolean isWhole() {
        return shard.isWhole();
    }

    /** Whether another shard line describes a shard of the same split of the same table. */
    boolean sameSplit(TableShard other) {
        return other.shard.count() == shard.count() && other.blocks == blocks && other.blockSize == blockSize;
    }

    /** The blocks of this shard, ascending. */
    int[] ownBlocks() {
        return shard.tasks(blocks);
    }

    /** The number of table rows (points) of this shard. */
    long rows() {
        int first = shard.index() - 1;
        long size = first >= blocks ? 0 : (blocks - first + shard.count() - 1) / shard.count();
        return size * blockSize;
    }

    /** The line written after the signature line of a shard's file; null for the whole table. */
    String line() {
        return shard.isWhole() ? null : PREFIX + shard + " of " + blocks + " blocks of " + blockSize + " points; version "
                + version;
    }
}
