package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Random and boundary command lines run in-process (a fixed seed, so that a failure repeats): every run ends with
 * status 0, 2, 3 or 130, never prints a stack trace, and leaves no partial file behind when it fails. Values are
 * drawn from small sets of good, boundary and hostile arguments for every option, so that the runs stay short.
 */
class CommandLineFuzzTest {
    private static final Set<Integer> ALLOWED = Set.of(0, Main.EXIT_BAD_INPUT, Main.EXIT_UNREACHED,
            Main.EXIT_INTERRUPTED);
    private static final String[] COMMANDS = {"eval", "table", "field", "poles", "describe", "merge", "nonsense"};
    private static final String[] NUMBERS = {"1", "-1/2", "0", "1/3", "3+2i", "-i", "1e400", "nan", "inf", "", "x",
        "1/0", "0.5", "-1", "2.5e-3-4i", "1e-320", "1e308", " ", "--", "-", "1:2", "0,i,i"};
    private static final String[] OPTIONS = {"--alpha", "--beta", "--gamma", "--delta", "--z0", "--w0", "--dw0", "--d3w0",
        "--at", "--sheet", "--digits", "--line", "--grid", "--log-strip", "--out", "--resume", "--format", "--member",
        "--times", "--s", "--m", "--x0", "--state", "--origin", "--family", "--lambda", "--sigma", "--tol", "--order",
        "--max-steps", "--size", "--problem", "--shards", "--help", "--bogus", "--no-marks", "--shard"};
    private static final String[] LINES = {"0.5:2:5", "0:1:3", "1:1:3", "1:2:0", "1:2:-5", "a:b:c", "1:2", "1:2:3:4",
        "1:2:1000000000", "0.5:1e9:3"};
    private static final String[] GRIDS = {"-1:1:5,-1:1:5", "0:1:3,0:1:3", "1:1:1,1:1:1", "a:b:c,1:2:3", "-1e400:1:3,0:1:2",
        "1e5:2e5:3,0:1:2", "-1:1:100000,-1:1:100000", "-1:1:5", "1:-1:5,1:-1:5"};
    private static final String[] INTEGERS = {"0", "1", "2", "-1", "9", "16", "20", "15", "5001", "x", "99999999999"};

    @Test
    void randomCommandLinesEndCleanly(@TempDir Path dir) throws IOException {
        Random random = new Random(20261204L);
        int[] byStatus = new int[256];
        for (int run = 0; run < 250; run++) {
            Path out = Files.createDirectories(dir.resolve("run" + run));
            String command = COMMANDS[random.nextInt(COMMANDS.length)];
            List<String> args = new ArrayList<>(valid(command, out));
            // a valid command line, then one argument replaced by a hostile value and/or a random option added
            if (random.nextBoolean() && args.size() > 2) {
                int k = 1 + 2 * random.nextInt((args.size() - 1) / 2);
                args.set(k + 1, value(args.get(k), random, out));
            }
            if (random.nextInt(3) == 0) {
                String option = OPTIONS[random.nextInt(OPTIONS.length)];
                args.add(option);
                args.add(value(option, random, out));
            }
            String[] line = args.toArray(new String[0]);
            CommandLineToolTest.Run r = CommandLineToolTest.run(line);
            String shown = String.join(" ", line);
            byStatus[r.status & 255]++;
            assertTrue(ALLOWED.contains(r.status), "status " + r.status + " for: " + shown + "\n" + r.err);
            assertFalse(r.err.contains("Exception in") || r.err.contains("\tat ") || r.err.contains("internal error"),
                    "stack trace or internal error for: " + shown + "\n" + r.err);
            if (r.status == Main.EXIT_BAD_INPUT && !args.contains("--help")) {
                assertEquals(1, r.err.lines().count(), "one line for: " + shown + "\n" + r.err);
                try (Stream<Path> files = Files.list(out)) {
                    List<Path> left = files.collect(Collectors.toList());
                    assertTrue(left.isEmpty(), "files left by a refused run: " + left + " for: " + shown);
                }
            }
        }
        // the draw reaches the computations too, not only the refusals
        assertTrue(byStatus[0] >= 40 && byStatus[Main.EXIT_BAD_INPUT] >= 40, "statuses: 0 x" + byStatus[0] + ", 2 x"
                + byStatus[Main.EXIT_BAD_INPUT] + ", 3 x" + byStatus[Main.EXIT_UNREACHED]);
    }

    /** A valid command line of each command, small enough to run in a fraction of a second. */
    private static List<String> valid(String command, Path out) {
        List<String> demo = List.of("--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0", "1",
                "--w0", "1/2", "--dw0", "1/3");
        List<String> args = new ArrayList<>();
        args.add(command);
        switch (command) {
            case "describe":
                args.addAll(List.of("--member", "2"));
                return args;
            case "merge":
                args.addAll(List.of("--shards", out.resolve("s-*.csv").toString()));
                return args;
            case "nonsense":
                return args;
            default:
                args.addAll(demo);
        }
        switch (command) {
            case "eval":
                args.addAll(List.of("--at", "2+i"));
                break;
            case "table":
                args.addAll(List.of("--line", "0.5:2:5", "--out", out.resolve("t.csv").toString()));
                break;
            case "field":
                args.addAll(List.of("--grid", "-1:1:5,-1:1:5", "--out", out.resolve("p.png").toString(), "--size",
                        "400x300"));
                break;
            default:
                args.addAll(List.of("--grid", "-1:1:5,-1:1:5"));
        }
        return args;
    }

    private static String value(String option, Random random, Path out) {
        switch (option) {
            case "--line":
            case "--at":
                return random.nextBoolean() ? LINES[random.nextInt(LINES.length)] : NUMBERS[random.nextInt(NUMBERS.length)];
            case "--grid":
            case "--log-strip":
                return GRIDS[random.nextInt(GRIDS.length)];
            case "--sheet":
            case "--digits":
            case "--member":
            case "--order":
            case "--max-steps":
                return INTEGERS[random.nextInt(INTEGERS.length)];
            case "--out":
            case "--problem":
            case "--shards":
                String[] paths = {out.resolve("f.csv").toString(), out.resolve("no/such/f.csv").toString(), "/proc/x.png",
                    out.toString(), out.resolve("p.png").toString()};
                return paths[random.nextInt(paths.length)];
            case "--format":
                String[] formats = {"json", "xml", "npy", "csv"};
                return formats[random.nextInt(formats.length)];
            case "--shard":
                String[] shards = {"1/2", "2/2", "3/2", "0/1", "1/0", "x", "1/100000", "2/3/4"};
                return shards[random.nextInt(shards.length)];
            case "--size":
                return random.nextBoolean() ? "400x300" : "1x1";
            default:
                return NUMBERS[random.nextInt(NUMBERS.length)];
        }
    }
}
