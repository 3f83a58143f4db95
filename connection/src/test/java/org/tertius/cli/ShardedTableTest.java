package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@code table --shard I/N} and {@code merge} of table shards: the merged shards are the bytes of the table computed
 * in one process (lines with the poles met along them, grids, --digits lines), resumed shards included; bad shard
 * specifications and bad sets of shard files are refused with one line, exit status 2, nothing written.
 */
class ShardedTableTest {
    private static final String[] DEMO = {"--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0",
        "1", "--w0", "1/2", "--dw0", "1/3"};

    private static CommandLineToolTest.Run table(String region, String spec, Path out, String... more) {
        List<String> a = new ArrayList<>(List.of("table"));
        a.addAll(List.of(DEMO));
        a.addAll(List.of(region, spec, "--out", out.toString()));
        a.addAll(List.of(more));
        return CommandLineToolTest.run(a.toArray(new String[0]));
    }

    private static byte[] shardedAndMerged(Path dir, String region, String spec, int n, String... more)
            throws Exception {
        StringBuilder names = new StringBuilder();
        for (int i = 1; i <= n; i++) {
            Path part = dir.resolve("part-" + i + "-of-" + n + ".csv");
            List<String> args = new ArrayList<>(List.of(more));
            args.addAll(List.of("--shard", i + "/" + n));
            CommandLineToolTest.Run r = table(region, spec, part, args.toArray(new String[0]));
            assertEquals(0, r.status, r.err);
            names.append(i == 1 ? "" : ",").append(part);
        }
        Path merged = dir.resolve("merged.csv");
        CommandLineToolTest.Run m = CommandLineToolTest.run("merge", "--shards", names.toString(), "--out",
                merged.toString());
        assertEquals(0, m.status, m.err);
        return Files.readAllBytes(merged);
    }

    @Test
    void threeLineShardsMergeToTheBytesOfTheWholeLineWithItsPoles(@TempDir Path dir) throws Exception {
        Path whole = dir.resolve("whole.csv");
        // the real segment [0.5, 6] passes the pole of w near 5.5248 (tests/.../piii-near-poles.csv)
        assertEquals(0, table("--line", "0.5:6:50", whole).status);
        byte[] expected = Files.readAllBytes(whole);
        assertTrue(new String(expected, StandardCharsets.UTF_8).contains("\n# pole on the line"),
                "the line meets a pole");
        assertArrayEquals(expected, shardedAndMerged(dir, "--line", "0.5:6:50", 3));
    }

    @Test
    void threeGridShardsMergeToTheBytesOfTheWholeGrid(@TempDir Path dir) throws Exception {
        Path whole = dir.resolve("whole.csv");
        // 37 rows: more than a band of 16, and not a multiple of 3
        assertEquals(0, table("--grid", "-3:3:13,-3:3:37", whole).status);
        assertArrayEquals(Files.readAllBytes(whole), shardedAndMerged(dir, "--grid", "-3:3:13,-3:3:37", 3));
    }

    @Test
    void digitLineShardsMergeToTheBytesOfTheWholeLine(@TempDir Path dir) throws Exception {
        Path whole = dir.resolve("whole.csv");
        assertEquals(0, table("--line", "1:2:5", whole, "--digits", "20").status);
        assertArrayEquals(Files.readAllBytes(whole), shardedAndMerged(dir, "--line", "1:2:5", 2, "--digits", "20"));
    }

    @Test
    void anInterruptedShardResumesAndAnUnfinishedOneIsNamedByMerge(@TempDir Path dir) throws Exception {
        Path whole = dir.resolve("whole.csv");
        assertEquals(0, table("--grid", "-2:2:9,-2:2:11", whole).status);
        Path a = dir.resolve("a.csv");
        Path b = dir.resolve("b.csv");
        assertEquals(0, table("--grid", "-2:2:9,-2:2:11", a, "--shard", "1/2").status);
        assertEquals(0, table("--grid", "-2:2:9,-2:2:11", b, "--shard", "2/2").status);
        // cut shard 2 in the middle of a row, as an interruption leaves it
        String full = Files.readString(b, StandardCharsets.UTF_8);
        Files.writeString(b, full.substring(0, full.length() - 200), StandardCharsets.UTF_8);
        Path merged = dir.resolve("merged.csv");
        CommandLineToolTest.Run refused = CommandLineToolTest.run("merge", "--shards", a + "," + b, "--out",
                merged.toString());
        assertEquals(2, refused.status);
        assertEquals(1, refused.err.lines().count(), refused.err);
        assertTrue(refused.err.contains(b.toString()) && refused.err.contains("--resume"), refused.err);
        assertFalse(Files.exists(merged));
        // resuming a shard with the whole table's file, or another shard's, is refused
        CommandLineToolTest.Run other = table("--grid", "-2:2:9,-2:2:11", b, "--shard", "1/2", "--resume");
        assertEquals(2, other.status, other.err);
        assertTrue(other.err.contains("shard"), other.err);
        assertEquals(0, table("--grid", "-2:2:9,-2:2:11", b, "--shard", "2/2", "--resume").status);
        assertEquals(full, Files.readString(b, StandardCharsets.UTF_8));
        CommandLineToolTest.Run m = CommandLineToolTest.run("merge", "--shards", dir.resolve("?.csv").toString(),
                "--out", merged.toString());
        assertEquals(0, m.status, m.err);
        assertArrayEquals(Files.readAllBytes(whole), Files.readAllBytes(merged));
    }

    @Test
    void missingRepeatedAndForeignShardsAreRefused(@TempDir Path dir) throws Exception {
        Path a = dir.resolve("a.csv");
        Path b = dir.resolve("b.csv");
        Path c = dir.resolve("c.csv");
        assertEquals(0, table("--line", "1:2:7", a, "--shard", "1/3").status);
        assertEquals(0, table("--line", "1:2:7", b, "--shard", "2/3").status);
        assertEquals(0, table("--line", "1:2:8", c, "--shard", "3/3").status);
        Path d = dir.resolve("d.csv");
        String other = Files.readString(b, StandardCharsets.UTF_8)
                .replaceFirst("; version \\S+\n", "; version 0.0.1\n");
        Files.writeString(d, other, StandardCharsets.UTF_8);
        String[][] cases = {{a + "," + b, "shard 3/3 is missing"}, {a + "," + a + "," + b, "given twice"},
            {a + "," + b + "," + c, "another table"}, {a + "," + d, "by version 0.0.1"}};
        for (String[] k : cases) {
            CommandLineToolTest.Run r = CommandLineToolTest.run("merge", "--shards", k[0]);
            assertEquals(2, r.status, k[0]);
            assertEquals(1, r.err.lines().count(), r.err);
            assertTrue(r.err.contains(k[1]), r.err);
            assertEquals("", r.out);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"0/3", "4/3", "1/0", "3", "a/b", "1/3/4", "-1/2", "", "1/100001"})
    void badShardSpecificationsAreOneLineAndExitTwo(String spec, @TempDir Path dir) {
        Path out = dir.resolve("t.csv");
        CommandLineToolTest.Run r = table("--grid", "-1:1:5,-1:1:5", out, "--shard", spec);
        assertEquals(2, r.status, r.err);
        assertEquals(1, r.err.lines().count(), r.err);
        assertTrue(r.err.startsWith("tertius: --shard"), r.err);
        assertEquals("", r.out);
        assertFalse(Files.exists(out));
    }

    @Test
    void theShardOfAPlaneIsRefusedWithTheReason() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("table", "--profile", "nearfield", "--plane",
                "-1:1:3,-1:1:3", "--shard", "1/2");
        assertEquals(2, r.status, r.err);
        assertTrue(r.err.startsWith("tertius: --shard: applies to --line, --grid and --log-strip"), r.err);
    }
}
