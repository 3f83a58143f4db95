package org.tertius.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.SolutionValue;

/**
 * A line or grid table as a NumPy {@code .npy} file (format version 1.0: the magic string, a little-endian header
 * length, a Python dict literal padded to a multiple of 64 bytes, then the records; the layout NumPy documents for
 * {@code numpy.lib.format}): one structured record per point with the fields of {@link ValueRows#npyDescr()}, in
 * the shape of the table (ny, nx) for grids, (n,) for lines, row-major as the CSV rows. Written into a hidden
 * temporary file in the target's folder and moved into place when complete: never half-written, not resumable.
 */
final class NpyTable implements TableSink {
    private static final byte[] MAGIC = {(byte) 0x93, 'N', 'U', 'M', 'P', 'Y', 1, 0};
    private final Path path;
    private final Path tmp;
    private final FileChannel channel;
    private final ValueRows rows;
    private final ByteBuffer buffer;
    private final long expected;
    private long written;
    private boolean finished;

    private NpyTable(Path path, Path tmp, FileChannel channel, ValueRows rows, long expected) {
        this.path = path;
        this.tmp = tmp;
        this.channel = channel;
        this.rows = rows;
        this.expected = expected;
        this.buffer = ByteBuffer.allocate(Math.max(1 << 16, 64 * rows.npyRecordSize())).order(ByteOrder.LITTLE_ENDIAN);
    }

    /**
     * Opens the file of a table of the given shape ({ny, nx} for a grid, {n} for a line) and writes its header.
     *
     * @throws InvalidInputException ("--out") if the file cannot be written
     */
    static NpyTable create(Path path, ValueRows rows, int... shape) {
        Path tmp = null;
        try {
            Path dir = path.toAbsolutePath().getParent();
            tmp = Files.createTempFile(dir, "." + path.getFileName(), ".part");
            FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
            long count = 1;
            for (int s : shape) {
                count *= s;
            }
            NpyTable t = new NpyTable(path, tmp, ch, rows, count);
            t.buffer.put(header(rows.npyDescr(), shape));
            return t;
        } catch (IOException e) {
            deleteQuietly(tmp);
            throw new InvalidInputException("--out", "cannot write " + path + ": " + e.getMessage());
        }
    }

    /** The magic string, version, header length and the header dict, padded with spaces to a multiple of 64. */
    static byte[] header(String descr, int... shape) {
        StringBuilder s = new StringBuilder("(");
        for (int i = 0; i < shape.length; i++) {
            s.append(i == 0 ? "" : ", ").append(shape[i]);
        }
        s.append(shape.length == 1 ? ",)" : ")");
        StringBuilder dict = new StringBuilder("{'descr': " + descr + ", 'fortran_order': False, 'shape': " + s + ", }");
        int total = MAGIC.length + 2 + dict.length() + 1;
        while (total % 64 != 0) {
            dict.append(' ');
            total++;
        }
        dict.append('\n');
        byte[] text = dict.toString().getBytes(StandardCharsets.US_ASCII);
        if (text.length > 65535) {
            throw new IllegalArgumentException("npy header of " + text.length + " bytes");
        }
        ByteBuffer b = ByteBuffer.allocate(MAGIC.length + 2 + text.length).order(ByteOrder.LITTLE_ENDIAN);
        b.put(MAGIC).putShort((short) text.length).put(text);
        return b.array();
    }

    @Override
    public long existingRows() {
        return 0;
    }

    @Override
    public void value(SolutionValue v) {
        room();
        rows.npyRecord(buffer, v);
        written++;
    }

    @Override
    public void unreached(double re, double im, int sheet) {
        room();
        rows.npyUnreached(buffer, re, im, sheet);
        written++;
    }

    @Override
    public void comment(String text) {
        // no comments in .npy: the notes reach standard error
    }

    private void room() {
        if (buffer.remaining() < rows.npyRecordSize()) {
            drain();
        }
    }

    private void drain() {
        buffer.flip();
        try {
            while (buffer.hasRemaining()) {
                channel.write(buffer);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("write failed on " + path, e);
        }
        buffer.clear();
    }

    @Override
    public void flush() {
        drain();
    }

    @Override
    public void flushQuietly() {
        // an interrupted npy file is not kept: nothing to flush
    }

    @Override
    public void finish() {
        if (written != expected) {
            throw new IllegalStateException(written + " records written of " + expected);
        }
        drain();
        try {
            channel.close();
            Files.move(tmp, path, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot move " + tmp + " to " + path, e);
        }
        finished = true;
    }

    @Override
    public void close() {
        if (!finished) {
            try {
                channel.close();
            } catch (IOException ignored) {
                // the temporary file is removed below
            }
            deleteQuietly(tmp);
        }
    }

    private static void deleteQuietly(Path p) {
        if (p != null) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException ignored) {
                // best effort: the temporary file is hidden and named after the target
            }
        }
    }
}
