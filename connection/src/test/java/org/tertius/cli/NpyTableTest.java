package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code table --format npy}: the file follows the .npy format 1.0 (magic string, version, little-endian header
 * length, a dict with descr, fortran_order and shape, padded to a multiple of 64 bytes; the layout documented with
 * NumPy's numpy.lib.format) and holds, record by record, the same doubles as the CSV table of the same command
 * (which prints each double as a decimal that reads back exactly). Refusals name the option and the reason.
 */
class NpyTableTest {
    private static final String[] DEMO = {"--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0",
        "1", "--w0", "1/2", "--dw0", "1/3"};
    private static final String[] MEMBER1 = {"--member", "1", "--s", "1", "--m", "0.3", "--origin", "0,i,i"};

    private static CommandLineToolTest.Run table(String[] problem, String... more) {
        List<String> a = new ArrayList<>(List.of("table"));
        a.addAll(List.of(problem));
        a.addAll(List.of(more));
        return CommandLineToolTest.run(a.toArray(new String[0]));
    }

    /** The header dict of a .npy file and its records, checked against the format. */
    private static final class Npy {
        final String header;
        final ByteBuffer data;

        Npy(Path file) throws IOException {
            ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(file)).order(ByteOrder.LITTLE_ENDIAN);
            byte[] magic = new byte[6];
            b.get(magic);
            assertEquals("\u0093NUMPY", new String(magic, StandardCharsets.ISO_8859_1));
            assertEquals(1, b.get());
            assertEquals(0, b.get());
            int length = Short.toUnsignedInt(b.getShort());
            assertEquals(0, (10 + length) % 64, "header padded to a multiple of 64");
            byte[] text = new byte[length];
            b.get(text);
            header = new String(text, StandardCharsets.US_ASCII);
            assertTrue(header.endsWith("\n"), header);
            data = b.slice().order(ByteOrder.LITTLE_ENDIAN);
        }
    }

    @Test
    void aGridHoldsTheDoublesOfTheCsvTableInItsShape(@TempDir Path dir) throws Exception {
        Path npy = dir.resolve("g.npy");
        String[] grid = {"--grid", "-3:3:7,-2:2:5"};
        CommandLineToolTest.Run r = table(DEMO, grid[0], grid[1], "--format", "npy", "--out", npy.toString());
        assertEquals(0, r.status, r.err);
        CommandLineToolTest.Run csv = table(DEMO, grid);
        assertEquals(0, csv.status, csv.err);
        CsvRows rows = CsvRows.of(csv.out);
        Npy f = new Npy(npy);
        assertTrue(f.header.startsWith("{'descr': [('z_re', '<f8'), ('z_im', '<f8'), ('sheet', '<i4'), ('w', '<c16'),"
                + " ('dw', '<c16'), ('err', '<f8'), ('w_err', '<f8'), ('dw_err', '<f8')], 'fortran_order': False,"
                + " 'shape': (5, 7), }"), f.header);
        int record = 8 + 8 + 4 + 16 * 2 + 8 * 3;
        assertEquals(35L * record, f.data.remaining());
        for (int k = 0; k < 35; k++) {
            ByteBuffer b = f.data;
            assertEquals(rows.number(k, "z_re"), b.getDouble(), 0.0);
            assertEquals(rows.number(k, "z_im"), b.getDouble(), 0.0);
            assertEquals(0, b.getInt());
            for (String name : List.of("w_re", "w_im", "dw_re", "dw_im")) {
                assertEquals(rows.number(k, name), b.getDouble(), 0.0, name + " at " + k);
            }
            for (String name : List.of("err", "w_err", "dw_err")) {
                // the CSV error has 4 digits rounded up
                double e = b.getDouble();
                assertTrue(e <= rows.number(k, name) && rows.number(k, name) <= e * (1 + 1e-3), name + " at " + k);
            }
        }
        assertFalse(Files.list(dir).anyMatch(p -> p.getFileName().toString().endsWith(".part")));
    }

    @Test
    void aMemberLineHasItsFourComplexValuesAndTheIntegralsFlag(@TempDir Path dir) throws Exception {
        Path npy = dir.resolve("m.npy");
        CommandLineToolTest.Run r = table(MEMBER1, "--line", "0.5:1.5:4", "--format", "npy", "--out", npy.toString());
        assertEquals(0, r.status, r.err);
        Npy f = new Npy(npy);
        assertTrue(f.header.contains("('x_re', '<f8')") && f.header.contains("('dr', '<c16')")
                && f.header.contains("('dr_err', '<f8'), ('integrals_ok', '|b1')]") && f.header.contains("'shape': (4,)"),
                f.header);
        int record = 8 + 8 + 4 + 16 * 4 + 8 * 5 + 1;
        assertEquals(4L * record, f.data.remaining());
        assertEquals(0.5, f.data.getDouble(0), 0.0);
        assertEquals(1, f.data.get(record - 1), "first integrals within their estimates");
    }

    @Test
    void numpyReadsTheFileWhenItIsInstalled(@TempDir Path dir) throws Exception {
        Path npy = dir.resolve("g.npy");
        assertEquals(0, table(DEMO, "--grid", "-3:3:7,-2:2:5", "--format", "npy", "--out", npy.toString()).status);
        String script = "import numpy, sys\n"
                + "a = numpy.load(sys.argv[1])\n"
                + "print(a.shape, a.dtype.names, repr(a['w'][2, 4]), repr(a['z_re'][2, 4]))\n";
        Process p;
        try {
            p = new ProcessBuilder("python3", "-c", script, npy.toString()).redirectErrorStream(true).start();
        } catch (IOException e) {
            Assumptions.abort("python3 not available");
            return;
        }
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        Assumptions.assumeFalse(out.contains("No module named"), "numpy not installed");
        assertEquals(0, p.exitValue(), out);
        assertTrue(out.startsWith("(5, 7) ('z_re', 'z_im', 'sheet', 'w', 'dw', 'err', 'w_err', 'dw_err')"), out);
        // row 2, column 4 is z = 1, the start point of the demo solution: w(1) = 1/2 (numpy 1 and 2 print alike
        // but for the type name)
        assertTrue(out.contains("(0.5+0j)") && (out.strip().endsWith("1.0)") || out.strip().endsWith(" 1.0")), out);
    }

    @Test
    void optionsThatANumpyFileCannotServeAreRefusedWithTheReason(@TempDir Path dir) {
        String f = dir.resolve("t.npy").toString();
        String[][] cases = {
            {"--format: npy is binary", "--grid", "-1:1:3,-1:1:3", "--format", "npy"},
            {"--resume: npy files are written whole", "--grid", "-1:1:3,-1:1:3", "--format", "npy", "--out", f,
                "--resume"},
            {"--shard: shards are CSV", "--grid", "-1:1:3,-1:1:3", "--format", "npy", "--out", f, "--shard", "1/2"},
            {"--format: npy holds doubles", "--line", "1:2:3", "--format", "npy", "--out", f, "--digits", "20"},
            {"--format: must be csv or npy", "--line", "1:2:3", "--format", "json"},
        };
        for (String[] c : cases) {
            String[] more = new String[c.length - 1];
            System.arraycopy(c, 1, more, 0, more.length);
            CommandLineToolTest.Run r = table(DEMO, more);
            assertEquals(2, r.status, r.err);
            assertEquals(1, r.err.lines().count(), r.err);
            assertTrue(r.err.startsWith("tertius: " + c[0]), r.err);
            assertFalse(Files.exists(Path.of(f)));
        }
    }
}
