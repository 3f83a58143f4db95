package org.tertius.cli;

import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.tertius.connection.scan.Shard;
import org.tertius.core.InvalidInputException;

/**
 * The merge of the shard files of a table ({@code table --shard I/N}) into the file of the whole table: its
 * signature line, comments and column line, every row in the order of the whole table and the closing comments
 * (the poles met along a line): the same bytes as the table computed in one process. Refuses, before anything is
 * written, files that are not shards of one table (signature, comments or columns differ), shards of different
 * splits, a shard given twice, a missing shard, an unfinished one (rows missing or a row cut short) and shards whose
 * closing comments differ. Rows are streamed: the shards are read again while writing, not held in memory.
 */
final class TableMerge {
    /** The first characters of a table file (its signature line). */
    static final String SIGNATURE = "# tertius table ";
    private final List<String> header;
    private final List<String> closing;
    private final List<ShardFile> shards;
    private final TableShard split;

    private TableMerge(List<String> header, List<String> closing, List<ShardFile> shards, TableShard split) {
        this.header = header;
        this.closing = closing;
        this.shards = shards;
        this.split = split;
    }

    /** Whether a file starts like a table (rather than a sweep). */
    static boolean isTable(Path file) {
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String first = r.readLine();
            return first != null && first.startsWith(SIGNATURE);
        } catch (IOException | UncheckedIOException e) {
            return false;
        }
    }

    /** One shard file: its header without the shard line, its shard, its row count and closing comments. */
    private static final class ShardFile {
        final Path path;
        final List<String> header = new ArrayList<>();
        final List<String> closing = new ArrayList<>();
        TableShard shard;
        long rows;
        int headerLines;

        ShardFile(Path path) {
            this.path = path;
        }
    }

    /**
     * Reads and checks the shard files.
     *
     * @throws InvalidInputException naming {@code argument} and the file at fault unless the files are all shards
     *     of one split of one table, each complete
     */
    static TableMerge of(String argument, List<Path> files) {
        List<ShardFile> read = new ArrayList<>();
        for (Path f : files) {
            read.add(scan(argument, f));
        }
        ShardFile first = read.get(0);
        TreeMap<Integer, ShardFile> byIndex = new TreeMap<>();
        for (ShardFile f : read) {
            if (!f.header.get(0).equals(first.header.get(0))) {
                throw new InvalidInputException(argument, f.path + " is a shard of another table than " + first.path
                        + " (their signature lines differ)");
            }
            if (!f.header.equals(first.header)) {
                throw new InvalidInputException(argument, f.path + " has other comments or columns than " + first.path);
            }
            if (!f.shard.version().equals(first.shard.version())) {
                throw new InvalidInputException(argument, f.path + " was written by version " + f.shard.version()
                        + " of the tool, " + first.path + " by version " + first.shard.version());
            }
            if (!f.shard.sameSplit(first.shard)) {
                throw new InvalidInputException(argument, f.path + " is shard " + f.shard.shard() + " of "
                        + f.shard.blocks() + " blocks but " + first.path + " is shard " + first.shard.shard() + " of "
                        + first.shard.blocks() + ": shards of different splits of the table");
            }
            ShardFile twice = byIndex.put(f.shard.shard().index(), f);
            if (twice != null) {
                throw new InvalidInputException(argument, "shard " + f.shard.shard() + " is given twice: " + twice.path
                        + " and " + f.path);
            }
        }
        int n = first.shard.shard().count();
        if (byIndex.size() != n) {
            throw new InvalidInputException(argument, Shard.missing(byIndex.keySet(), n));
        }
        for (ShardFile f : byIndex.values()) {
            if (f.rows != f.shard.rows()) {
                throw new InvalidInputException(argument, f.path + " (shard " + f.shard.shard() + ") is incomplete: "
                        + f.rows + " of " + f.shard.rows() + " rows; run it again with --resume to complete it");
            }
            if (!f.closing.equals(first.closing)) {
                throw new InvalidInputException(argument, f.path + " ends with other comments than " + first.path
                        + " (an unfinished shard: run it again with --resume)");
            }
        }
        return new TableMerge(first.header, first.closing, new ArrayList<>(byIndex.values()), first.shard);
    }

    /** Reads one file's header, shard line, rows (counted) and closing comments. */
    private static ShardFile scan(String argument, Path path) {
        ShardFile f = new ShardFile(path);
        try (BufferedReader r = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            String signature = r.readLine();
            if (signature == null || !signature.startsWith(SIGNATURE)) {
                throw new InvalidInputException(argument, path + " is not a table file (it does not start with '"
                        + SIGNATURE + "...')");
            }
            f.header.add(signature);
            f.shard = TableShard.parse(argument, path.toString(), r.readLine());
            f.headerLines = 2;
            String line;
            boolean columns = false;
            while (!columns && (line = r.readLine()) != null) {
                f.header.add(line);
                f.headerLines++;
                columns = !line.startsWith("#");
            }
            if (!columns) {
                throw new InvalidInputException(argument, path + " has no column line (an unfinished shard: run it"
                        + " again)");
            }
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    f.closing.add(line);
                } else if (!f.closing.isEmpty()) {
                    throw new InvalidInputException(argument, path + " has a row after its closing comments");
                } else {
                    f.rows++;
                }
            }
        } catch (IOException | UncheckedIOException e) {
            throw new InvalidInputException(argument, "cannot read " + path + ": " + e.getMessage());
        }
        if (!endsWithLineBreak(path)) {
            // the last row was cut by an interruption: it does not count
            throw new InvalidInputException(argument, path + " (shard " + f.shard.shard() + ") ends in a cut row;"
                    + " run it again with --resume to complete it");
        }
        return f;
    }

    private static boolean endsWithLineBreak(Path path) {
        try (RandomAccessFile raf = new RandomAccessFile(path.toFile(), "r")) {
            if (raf.length() == 0) {
                return false;
            }
            raf.seek(raf.length() - 1);
            return raf.read() == '\n';
        } catch (IOException e) {
            return false;
        }
    }

    /** Number of rows of the whole table. */
    long rows() {
        return (long) split.blocks() * split.blockSize();
    }

    /** Writes the whole table into a file. */
    void write(Path target) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(target, StandardCharsets.UTF_8)) {
            write(w);
        }
    }

    /** Writes the whole table: header, rows block by block from their shards, closing comments. */
    void write(Writer w) throws IOException {
        List<BufferedReader> readers = new ArrayList<>();
        try {
            for (ShardFile f : shards) {
                BufferedReader r = Files.newBufferedReader(f.path, StandardCharsets.UTF_8);
                readers.add(r);
                for (int k = 0; k < f.headerLines; k++) {
                    r.readLine();
                }
            }
            copy(w, readers);
        } finally {
            for (BufferedReader r : readers) {
                r.close();
            }
        }
    }

    private void copy(Writer w, List<BufferedReader> readers) throws IOException {
        for (String h : header) {
            w.write(h);
            w.write('\n');
        }
        int n = readers.size();
        for (int block = 0; block < split.blocks(); block++) {
            BufferedReader r = readers.get(block % n);
            for (int k = 0; k < split.blockSize(); k++) {
                w.write(r.readLine());
                w.write('\n');
            }
        }
        for (String c : closing) {
            w.write(c);
            w.write('\n');
        }
    }
}
