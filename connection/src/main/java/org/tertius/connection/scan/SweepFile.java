package org.tertius.connection.scan;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.SortedMap;
import java.util.TreeMap;
import org.tertius.core.InvalidInputException;

/**
 * The CSV file of a sweep or of one shard of it:
 * <pre>
 * # tertius sweep: TITLE
 * # signature: kind=...; ...; version=...
 * # shard: I/N                  (shard files only)
 * CSV header
 * rows, in task order
 * </pre>
 * The file of the whole sweep and the merge of its shards are the same bytes. Reading ignores a last line that
 * does not end with a line break (a row cut by an interruption), so such a task is simply run again. Immutable.
 */
public final class SweepFile {
    static final String TITLE = "# tertius sweep: ";
    static final String SIGNATURE = "# signature: ";
    static final String SHARD = "# shard: ";
    private final Path path;
    private final List<String> header;
    private final SortedMap<Integer, String> rows;

    private SweepFile(Path path, List<String> header, SortedMap<Integer, String> rows) {
        this.path = path;
        this.header = header;
        this.rows = rows;
    }

    /** The header lines of {@code sweep}'s file, or of one shard's file. */
    public static List<String> header(Sweep<?> sweep, Shard shard) {
        List<String> h = new ArrayList<>();
        h.add(TITLE + sweep.title());
        h.add(SIGNATURE + sweep.signature());
        if (!shard.isWhole()) {
            h.add(SHARD + shard);
        }
        h.add(sweep.csvHeader());
        return h;
    }

    /**
     * Reads a sweep file: the header (the lines up to and including the first line that is not a comment) and the
     * rows keyed by their task index (the first field).
     *
     * @param argument the option or argument that named the file, for error messages
     * @throws InvalidInputException if the file cannot be read, or a row has no task index or repeats one
     */
    public static SweepFile read(String argument, Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InvalidInputException(argument, "cannot read " + file + ": " + e.getMessage());
        } catch (RuntimeException e) {
            throw new InvalidInputException(argument, file + " is not a text file (" + e.getMessage() + ")");
        }
        int end = text.lastIndexOf('\n') + 1; // only lines ended by a line break
        List<String> header = new ArrayList<>();
        SortedMap<Integer, String> rows = new TreeMap<>();
        boolean inHeader = true;
        int lineNumber = 0;
        String[] lines = end == 0 ? new String[0] : text.substring(0, end - 1).split("\n", -1);
        for (String line : lines) {
            lineNumber++;
            if (inHeader) {
                header.add(line);
                inHeader = line.startsWith("#");
                continue;
            }
            int comma = line.indexOf(',');
            int index;
            try {
                index = Integer.parseInt(comma < 0 ? line : line.substring(0, comma));
            } catch (NumberFormatException e) {
                throw new InvalidInputException(argument, file + " line " + lineNumber + ": not a row of a sweep ('"
                        + abbreviate(line) + "')");
            }
            if (index < 0 || rows.put(index, line) != null) {
                throw new InvalidInputException(argument, file + " line " + lineNumber + ": task " + index
                        + (index < 0 ? " is negative" : " appears twice"));
            }
        }
        return new SweepFile(file, Collections.unmodifiableList(header), Collections.unmodifiableSortedMap(rows));
    }

    private static String abbreviate(String s) {
        return s.length() <= 60 ? s : s.substring(0, 57) + "...";
    }

    public Path path() {
        return path;
    }

    /** The header lines as read (possibly incomplete, for a file cut before its first row). */
    public List<String> header() {
        return header;
    }

    /** The rows by task index, each the line as read. */
    public SortedMap<Integer, String> rows() {
        return rows;
    }

    /** Whether the header has the title, signature and CSV header lines (and a shard line or not). */
    public boolean hasCompleteHeader() {
        return header.size() >= 3 && header.get(0).startsWith(TITLE) && header.get(1).startsWith(SIGNATURE)
                && !header.get(header.size() - 1).startsWith("#");
    }

    /**
     * The signature line's text.
     *
     * @throws InvalidInputException naming {@code argument} if the file has no sweep header
     */
    public String signatureText(String argument) {
        requireHeader(argument);
        return header.get(1).substring(SIGNATURE.length());
    }

    /** The shard this file holds ({@link Shard#WHOLE} without a shard line). */
    public Shard shard(String argument) {
        requireHeader(argument);
        for (String line : header) {
            if (line.startsWith(SHARD)) {
                return Shard.parse(argument + " (" + path + ")", line.substring(SHARD.length()));
            }
        }
        return Shard.WHOLE;
    }

    private void requireHeader(String argument) {
        if (!hasCompleteHeader()) {
            throw new InvalidInputException(argument, path + " is not a sweep file of this tool (its first lines"
                    + " are not '" + TITLE.trim() + " ...', '" + SIGNATURE.trim() + " ...' and a CSV header)");
        }
    }
}
