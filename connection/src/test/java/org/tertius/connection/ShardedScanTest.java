package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tertius.cli.Main;

/**
 * scan --shard and merge: the shards of a sweep joined give the bytes of the sweep run in one process; resumed
 * files too; bad input, foreign, missing, repeated and unfinished shards are refused with one line and status 2
 * before anything is written.
 */
class ShardedScanTest {
    private static final String[] MAP = {"scan", "--rectangle", "-0.6:0.6:3,0.5:2:2"};
    @TempDir
    static Path dir;
    private static Path whole;
    private static List<Path> shards;

    private static final class Run {
        final int status;
        final String out;
        final String err;

        Run(String... args) {
            StringWriter o = new StringWriter();
            StringWriter e = new StringWriter();
            status = Main.execute(args, new PrintWriter(o, true), new PrintWriter(e, true));
            out = o.toString();
            err = e.toString();
        }
    }

    private static String[] with(String[] base, String... more) {
        List<String> all = new ArrayList<>(List.of(base));
        all.addAll(List.of(more));
        return all.toArray(new String[0]);
    }

    /** The sweep in one process (two threads) and in three shards (one thread each). */
    @BeforeAll
    static void runWholeAndShards() {
        whole = dir.resolve("whole.csv");
        assertEquals(0, new Run(with(MAP, "--out", whole.toString(), "--threads", "2")).status);
        shards = new ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            Path s = dir.resolve("part-" + i + ".csv");
            Run r = new Run(with(MAP, "--shard", i + "/3", "--out", s.toString(), "--threads", "1"));
            assertEquals(0, r.status, r.err);
            assertEquals(2, r.err.lines().filter(l -> l.startsWith("scan: ")).count(), r.err);
            shards.add(s);
        }
    }

    private static String list(Path... files) {
        List<String> names = new ArrayList<>();
        for (Path f : files) {
            names.add(f.toString());
        }
        return String.join(",", names);
    }

    @Test
    void theMergedShardsAreTheBytesOfTheWholeSweep() throws IOException {
        Path merged = dir.resolve("merged.csv");
        Path png = dir.resolve("merged.png");
        Run r = new Run("merge", "--shards", dir.resolve("part-*.csv").toString(), "--out", merged.toString(),
                "--plot", png.toString());
        assertEquals(0, r.status, r.err);
        assertArrayEquals(Files.readAllBytes(whole), Files.readAllBytes(merged));
        assertTrue(Files.size(png) > 5000);
        List<String> lines = Files.readAllLines(whole);
        assertEquals(3 + 6, lines.size());
        assertTrue(lines.get(1).startsWith("# signature: kind=power-map; sigma=-0.6:0.6:3; b=0.5:2.0:2;"), lines.get(1));
        assertTrue(Files.readAllLines(shards.get(1)).get(2).equals("# shard: 2/3"));
    }

    @Test
    void aDecayingSweepMergesToo() throws IOException {
        String[] scan = {"scan", "--range", "0.2:0.4:3"};
        Path one = dir.resolve("decaying.csv");
        assertEquals(0, new Run(with(scan, "--out", one.toString())).status);
        Path a = dir.resolve("decaying-1.csv");
        Path b = dir.resolve("decaying-2.csv");
        assertEquals(0, new Run(with(scan, "--shard", "1/2", "--out", a.toString())).status);
        assertEquals(0, new Run(with(scan, "--shard", "2/2", "--out", b.toString())).status);
        Run m = new Run("merge", "--shards", list(b, a));
        assertEquals(0, m.status, m.err);
        assertEquals(Files.readString(one), m.out);
    }

    @Test
    void aRunCutInTheMiddleOfARowResumesToTheSameBytes() throws IOException {
        byte[] full = Files.readAllBytes(whole);
        String text = new String(full, StandardCharsets.UTF_8);
        int cut = text.indexOf('\n', text.indexOf("\n2,") + 1) - 10; // in the middle of the row of task 2
        Path f = dir.resolve("cut.csv");
        Files.write(f, text.substring(0, cut).getBytes(StandardCharsets.UTF_8));
        Run r = new Run(with(MAP, "--out", f.toString()));
        assertEquals(0, r.status, r.err);
        assertArrayEquals(full, Files.readAllBytes(f));
        assertEquals(4, r.err.lines().filter(l -> l.startsWith("scan: ")).count(), r.err); // tasks 2..5 run
    }

    @Test
    void incompleteRepeatedMissingAndForeignShardsAreRefused() throws IOException {
        Path out = dir.resolve("refused.csv");
        Path first = shards.get(0);
        Path second = shards.get(1);
        Path third = shards.get(2);
        List<String> lines = Files.readAllLines(third);
        Path unfinished = dir.resolve("unfinished.csv");
        Files.write(unfinished, lines.subList(0, lines.size() - 1));
        Path foreign = dir.resolve("foreign.csv");
        assertEquals(0, new Run(with(MAP, "--shard", "3/3", "--tol", "1e-12", "--out", foreign.toString())).status);
        Path otherSplit = dir.resolve("other-split.csv");
        assertEquals(0, new Run(with(MAP, "--shard", "2/2", "--out", otherSplit.toString())).status);
        String[][] cases = {
            {list(first, second), "shard 3/3 is missing (2 of 3 shard files given)"},
            {list(first, second, second, third), "shard 2/3 is given twice"},
            {list(first, second, unfinished), "(shard 3/3) is incomplete: 1 of 2 rows, task 5 missing"},
            {list(first, second, foreign), "is a shard of another sweep than " + first + " (tolerance=1.0E-12"
                    + " instead of 1.0E-13)"},
            {list(first, second, otherSplit), "is shard 2/2 but " + first + " is shard 1/3"},
            {list(first, second, dir.resolve("nothing.csv")), "cannot read"},
            {dir.resolve("nomatch-*.csv").toString(), "no file matches"}};
        for (String[] c : cases) {
            Run r = new Run("merge", "--shards", c[0], "--out", out.toString());
            assertEquals(2, r.status, c[0]);
            assertEquals(1, r.err.lines().count(), r.err);
            assertTrue(r.err.startsWith("tertius: --shards: ") && r.err.contains(c[1]), r.err);
            assertFalse(Files.exists(out), c[0]);
        }
    }

    @Test
    void badValuesAndMismatchedFilesAreRefusedBeforeAnythingIsWritten() throws IOException {
        Path out = dir.resolve("never.csv");
        String[][] cases = {
            {"--shard", "0/3", "--shard: expected I/N"},
            {"--shard", "4/3", "--shard: expected I/N"},
            {"--shard", "1-3", "--shard: expected I/N"},
            {"--plot", dir.resolve("p.png").toString(), "--plot: a shard holds part of the sweep"}};
        for (String[] c : cases) {
            String[] args = c[0].equals("--plot") ? with(MAP, "--shard", "1/2", c[0], c[1], "--out", out.toString())
                    : with(MAP, c[0], c[1], "--out", out.toString());
            Run r = new Run(args);
            assertEquals(2, r.status, r.err);
            assertTrue(r.err.startsWith("tertius: " + c[2]) && r.err.lines().count() == 1, r.err);
        }
        String[][] rectangles = {{"-1:0.5:3,0.5:2:2", "sigma must lie in (-1, 1)"}, {"-0.5:0.5:3,0:2:2", "B must be > 0"},
            {"-0.5:0.5:1,0.5:2:2", "the count must be an integer in [2,"}, {"-0.5:0.5:3", "expected S0:S1:NS,B0:B1:NB"}};
        for (String[] c : rectangles) {
            Run r = new Run("scan", "--rectangle", c[0], "--out", out.toString());
            assertEquals(2, r.status, r.err);
            assertTrue(r.err.startsWith("tertius: --rectangle: ") && r.err.contains(c[1]), r.err);
        }
        Run both = new Run("scan", "--rectangle", "-0.5:0.5:3,0.5:2:2", "--range", "0.1:0.2:2");
        assertEquals(2, both.status);
        assertTrue(both.err.contains("give either --range (decaying family) or --rectangle (power family)"), both.err);
        assertFalse(Files.exists(out));
        // an existing file of another sweep or shard is left as it is
        Path part = shards.get(0);
        byte[] before = Files.readAllBytes(part);
        Run otherShard = new Run(with(MAP, "--shard", "2/3", "--out", part.toString()));
        assertEquals(2, otherShard.status);
        assertTrue(otherShard.err.contains("holds shard 1/3, not shard 2/3"), otherShard.err);
        Run otherSweep = new Run("scan", "--range", "0.1:0.2:2", "--out", part.toString());
        assertEquals(2, otherSweep.status);
        assertTrue(otherSweep.err.contains("holds rows of another sweep (kind=power-map instead of decaying-lambda)"),
                otherSweep.err);
        assertArrayEquals(before, Files.readAllBytes(part));
    }
}
