package org.tertius.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.RandomAccessFile;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import org.tertius.core.InvalidInputException;

/**
 * The CSV output of a table: to standard output, or to a file that is flushed as rows come and can be
 * resumed. The first line of a file carries a signature of the problem; resuming checks it, drops a partial last
 * line and reports how many rows are already there.
 */
final class TableWriter implements AutoCloseable {
    private final PrintWriter out;
    private final long existingRows;
    private final Path path;
    private long rows;

    private TableWriter(PrintWriter out, long existingRows, Path path) {
        this.out = out;
        this.existingRows = existingRows;
        this.path = path;
    }

    static TableWriter open(PrintWriter stdout, Path path, boolean resume, String signature, List<String> comments,
                            String columns) {
        return open(stdout, path, resume, signature, null, comments, columns);
    }

    /**
     * Opens the output of a table or of one shard of it ({@code shardLine} the line that follows the signature line
     * in a shard's file, null for the whole table).
     */
    static TableWriter open(PrintWriter stdout, Path path, boolean resume, String signature, String shardLine,
                            List<String> comments, String columns) {
        if (path == null) {
            if (resume) {
                throw new InvalidInputException("--resume", "needs --out FILE (standard output cannot be resumed)");
            }
            header(stdout, signature, shardLine, comments, columns);
            return new TableWriter(stdout, 0, null);
        }
        OutputFile.checkWritable("--out", path);
        try {
            if (resume && Files.exists(path) && Files.size(path) > 0) {
                List<String> lines = Files.readAllLines(path, StandardCharsets.UTF_8);
                if (lines.isEmpty() || !lines.get(0).equals("# " + signature)) {
                    throw new InvalidInputException("--resume", path + " was written for another problem (its first line"
                            + " differs); remove it or drop --resume");
                }
                String second = lines.size() > 1 ? lines.get(1) : "";
                boolean wasShard = second.startsWith(TableShard.PREFIX);
                if (shardLine != null ? !second.equals(shardLine) : wasShard) {
                    throw new InvalidInputException("--resume", path + " holds " + (wasShard ? "a shard ("
                            + second.substring(2) + ")" : "the whole table") + ", not " + (shardLine == null
                            ? "the whole table" : "this shard (" + shardLine.substring(2) + ")")
                            + "; give another file or drop --resume");
                }
                truncatePartialLine(path);
                long data = Files.readAllLines(path, StandardCharsets.UTF_8).stream()
                        .filter(l -> !l.startsWith("#") && !l.equals(columns)).count();
                BufferedWriter w = Files.newBufferedWriter(path, StandardCharsets.UTF_8, StandardOpenOption.APPEND);
                return new TableWriter(new PrintWriter(w), data, path);
            }
            BufferedWriter w = Files.newBufferedWriter(path, StandardCharsets.UTF_8);
            PrintWriter pw = new PrintWriter(w);
            header(pw, signature, shardLine, comments, columns);
            pw.flush();
            return new TableWriter(pw, 0, path);
        } catch (IOException e) {
            throw new InvalidInputException("--out", "cannot write " + path + ": " + e.getMessage());
        }
    }

    private static void header(PrintWriter w, String signature, String shardLine, List<String> comments,
                               String columns) {
        w.println("# " + signature);
        if (shardLine != null) {
            w.println(shardLine);
        }
        for (String c : comments) {
            w.println("# " + c);
        }
        w.println(columns);
    }

    private static void truncatePartialLine(Path path) throws IOException {
        try (RandomAccessFile f = new RandomAccessFile(path.toFile(), "rw")) {
            long len = f.length();
            long pos = len;
            while (pos > 0) {
                f.seek(pos - 1);
                if (f.read() == '\n') {
                    break;
                }
                pos--;
            }
            f.setLength(pos);
        }
    }

    /** Rows already present (resume). */
    long existingRows() {
        return existingRows;
    }

    void row(String line) {
        out.println(line);
        rows++;
    }

    void comment(String text) {
        out.println("# " + text);
    }

    void flush() {
        out.flush();
        if (out.checkError()) {
            throw new UncheckedIOException(new IOException("write failed" + (path == null ? "" : " on " + path)));
        }
    }

    /** Flushes without reporting errors (for shutdown hooks). */
    void flushQuietly() {
        out.flush();
    }

    long rowsWritten() {
        return rows;
    }

    @Override
    public void close() {
        out.flush();
        if (path != null) {
            out.close();
        }
    }
}
