package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tertius.core.region.Grid;

/** The command-line tool end to end: output formats, resume, the picture and bad input. */
class CommandLineToolTest {
    private static final String[] DEMO = {"--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0", "1",
        "--w0", "1/2", "--dw0", "1/3"};
    private static final String[] RATIONAL = {"--alpha", "2", "--beta", "2", "--gamma", "1", "--delta", "-1", "--z0",
        "2", "--w0", "0.6", "--dw0", "0.16"};

    static final class Run {
        final int status;
        final String out;
        final String err;

        Run(int status, String out, String err) {
            this.status = status;
            this.out = out;
            this.err = err;
        }
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(status, out.toString(), err.toString());
    }

    static String[] with(String[] base, String... more) {
        String[] all = new String[base.length + more.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return all;
    }

    @Test
    void evalPrintsTheDocumentedColumnsWithErrorEstimates() {
        Run r = run(with(new String[] {"eval"}, with(DEMO, "--at", "3+2i,-1.5,2.5e-3-4i,3i")));
        assertEquals(0, r.status, r.err);
        CsvRows rows = CsvRows.of(r.out);
        assertEquals(List.of("z_re", "z_im", "sheet", "w_re", "w_im", "dw_re", "dw_im", "err", "w_err", "dw_err"),
                rows.columns());
        assertEquals(4, rows.size());
        // w(3+2i) from the independent reference data (tests/src/test/resources/reference/piii-generic-d6.csv)
        assertEquals(-1.160068082259176, rows.number(0, "w_re"), 1e-11);
        assertTrue(rows.number(0, "err") < 1e-9);
        for (int i = 0; i < rows.size(); i++) {
            // err is the larger of the two value errors
            assertEquals(Math.max(rows.number(i, "w_err"), rows.number(i, "dw_err")), rows.number(i, "err"), 0.0);
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "--at;abc;--at",
        "--at;0;--at",
        "--w0;nan;--w0",
        "--z0;0;z",
        "--w0;0;dw0",
        "--alpha;1e999;--alpha",
    })
    void badInputGetsOneLineNamingTheArgumentAndStatus2(String option, String value, String named) {
        String[] args = with(new String[] {"eval"}, DEMO);
        boolean replaced = false;
        for (int i = 0; i < args.length - 1; i++) {
            if (args[i].equals(option)) {
                args[i + 1] = value;
                replaced = true;
            }
        }
        if (!replaced) {
            args = with(args, option, value);
        } else if (!option.equals("--at")) {
            args = with(args, "--at", "2");
        }
        Run r = run(args);
        assertEquals(2, r.status, r.out + r.err);
        assertEquals(1, r.err.lines().count(), r.err);
        assertTrue(r.err.startsWith("tertius: ") && r.err.contains(named), r.err);
        assertTrue(!r.err.contains("Exception"), r.err);
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "--bogus 3;Unknown option: '--bogus'",
        "--digits;Missing required parameter for option '--digits' (D)",
        "--digits 1e2;--digits: expected an integer in [16, 5000], got '1e2'",
        "--tol small;--tol: expected a number in [1e-16, 1e-2], got 'small'",
        "--at 4;option '--at' should be specified only once",
    })
    void parseErrorsGetOneLineNamingTheOptionAndTheHelp(String extra, String message) {
        Run r = run(with(with(new String[] {"eval"}, DEMO), with(new String[] {"--at", "2"}, extra.split(" "))));
        assertEquals(2, r.status, r.out + r.err);
        assertEquals("tertius: " + message + " (see 'tertius eval --help')", r.err.strip());
    }

    @Test
    void negativeAndAttachedValuesParseAlike() {
        Run spaced = run(with(new String[] {"eval"}, with(DEMO, "--at", "-1.5")));
        Run attached = run("eval", "--alpha=1", "--beta=-1/2", "--gamma=1", "--delta=-1", "--z0=1", "--w0=1/2",
                "--dw0=1/3", "--at=-1.5");
        assertEquals(0, spaced.status, spaced.err);
        assertEquals(spaced.out, attached.out);
        assertTrue(spaced.out.contains("\n-1.5,0.0,0,"), spaced.out);
    }

    @Test
    void helpVersionAndUnknownCommands() {
        Run help = run("describe", "--help");
        assertEquals(0, help.status);
        assertTrue(help.out.contains("Print the unknowns and equations of member N of the Painleve III hierarchy.")
                && help.out.contains("--member <N>") && help.out.contains("the member, 1..8"), help.out);
        Run tool = run();
        assertEquals(0, tool.status);
        assertTrue(tool.out.contains("Commands:") && tool.out.contains("  scan      Sweep a family"), tool.out);
        assertTrue(run("eval", "-V").out.startsWith("tertius "));
        Run missing = run("describe");
        assertEquals(2, missing.status);
        assertEquals("tertius: Missing required option: '--member=N' (see 'tertius describe --help')",
                missing.err.strip());
        Run unknown = run("evaluate", "--at", "1");
        assertEquals(2, unknown.status);
        assertEquals("tertius: Unknown command: 'evaluate' (see 'tertius --help')", unknown.err.strip());
    }

    @Test
    void badRegionsAndOutputsAreRefusedBeforeAnyWork(@TempDir Path dir) {
        String[][] cases = {
            {"--grid", "1:-1:10,0:1:10"}, {"--grid", "0:1:0,0:1:10"}, {"--grid", "0:1:100000,0:1:100000"},
            {"--grid", "-1:1:11,-1:1:11", "--out", "/nonexistent-folder/x.png"}};
        for (String[] c : cases) {
            String[] args = with(with(new String[] {"field"}, DEMO), c);
            if (!List.of(c).contains("--out")) {
                args = with(args, "--out", dir.resolve("x.png").toString());
            }
            Run r = run(args);
            assertEquals(2, r.status, String.join(" ", c) + ": " + r.err);
            assertEquals(1, r.err.lines().count(), r.err);
            assertTrue(!Files.exists(dir.resolve("x.png")));
        }
        // a folder whose permissions allow writing but whose file system takes no new files (Linux /proc): the
        // refusal says so in words, not with the name of the probe file tried
        if (Files.isDirectory(Path.of("/proc/self"))) {
            Run r = run(with(with(new String[] {"table"}, DEMO), "--line", "1:2:3", "--out", "/proc/x.csv"));
            assertEquals(2, r.status, r.err);
            assertEquals(1, r.err.lines().count(), r.err);
            assertTrue(r.err.contains("--out: cannot write /proc/x.csv: the folder /proc does not take new files"),
                    r.err);
            assertTrue(!r.err.contains(".probe"), r.err);
        }
        // pictures are PNG: a picture named otherwise is refused before any work, nothing written
        Run jpg = run(with(with(new String[] {"field"}, DEMO), "--line", "1:2:20", "--out",
                dir.resolve("x.jpg").toString()));
        assertEquals(2, jpg.status, jpg.err);
        assertEquals(1, jpg.err.lines().count(), jpg.err);
        assertTrue(jpg.err.contains("--out: pictures are written as PNG"), jpg.err);
        assertTrue(!Files.exists(dir.resolve("x.jpg")));
    }

    @Test
    void pictureHasTheRequestedSizeAndLegendColoursAtAPoleAndAZero(@TempDir Path dir) throws Exception {
        // w = (z - 1/2)/(z + 1/2) (a rational solution, see the core tests): pole at -1/2, zero at +1/2
        Path png = dir.resolve("field.png");
        Run r = run(with(with(new String[] {"field"}, RATIONAL), "--grid", "-1:1:201,-1:1:201", "--size", "640x520",
                "--out", png.toString()));
        assertEquals(0, r.status, r.err);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(640, img.getWidth());
        assertEquals(520, img.getHeight());
        Grid g = Grid.of(-1, 1, 201, -1, 1, 201, 0);
        Color pole = new Color(img.getRGB(FieldPainter.px(g, -0.5, 640), FieldPainter.py(g, 0, 520)));
        Color zero = new Color(img.getRGB(FieldPainter.px(g, 0.5, 640), FieldPainter.py(g, 0, 520)));
        // legend: poles white, zeros black
        assertTrue(pole.getRed() > 240 && pole.getGreen() > 240 && pole.getBlue() > 240, "pole pixel " + pole);
        assertTrue(zero.getRed() < 15 && zero.getGreen() < 15 && zero.getBlue() < 15, "zero pixel " + zero);
    }

    @Test
    void interruptedGridTableIsResumedToTheBytesOfAnUninterruptedOne(@TempDir Path dir) throws Exception {
        Path full = dir.resolve("full.csv");
        Path part = dir.resolve("part.csv");
        String[] table = with(with(new String[] {"table"}, DEMO), "--grid", "-4:4:41,-4:4:41");
        assertEquals(0, run(with(table, "--out", full.toString())).status);
        // interrupted in the middle of the third band (16 rows each), in the middle of a line
        List<String> lines = Files.readAllLines(full, StandardCharsets.UTF_8);
        int headerEnd = lines.indexOf("z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,err,w_err,dw_err");
        int kept = 41 * 37 + 5;
        String cut = String.join("\n", lines.subList(0, headerEnd + 1 + kept)) + "\n"
                + lines.get(headerEnd + 1 + kept).substring(0, 12);
        Files.writeString(part, cut, StandardCharsets.UTF_8);
        Run r = run(with(table, "--out", part.toString(), "--resume"));
        assertEquals(0, r.status, r.err);
        assertEquals(Files.readString(full), Files.readString(part));
    }

    @Test
    void interruptedTableIsResumedToTheSameRows(@TempDir Path dir) throws Exception {
        Path full = dir.resolve("full.csv");
        Path part = dir.resolve("part.csv");
        String[] table = with(with(new String[] {"table"}, DEMO), "--line", "0.5:4+1i:40");
        assertEquals(0, run(with(table, "--out", full.toString())).status);
        // simulate an interruption: keep the header, 17 rows and half a row
        List<String> lines = Files.readAllLines(full, StandardCharsets.UTF_8);
        int headerEnd = lines.indexOf("z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,err,w_err,dw_err");
        String cut = String.join("\n", lines.subList(0, headerEnd + 18)) + "\n" + lines.get(headerEnd + 18).substring(0, 10);
        Files.writeString(part, cut, StandardCharsets.UTF_8);
        Run r = run(with(table, "--out", part.toString(), "--resume"));
        assertEquals(0, r.status, r.err);
        // values are read from a tree grown for the whole line, also on resume: the file is the same, byte for byte
        assertEquals(Files.readString(full), Files.readString(part));
        // another problem cannot be resumed into this file
        Run other = run(with(with(new String[] {"table"}, RATIONAL), "--line", "0.5:4+1i:40", "--out", part.toString(),
                "--resume"));
        assertEquals(2, other.status);
    }

    private static List<String> data(Path p) throws Exception {
        return Files.readAllLines(p, StandardCharsets.UTF_8).stream().filter(l -> !l.startsWith("#") && !l.startsWith("z_re"))
                .collect(Collectors.toList());
    }

    @Test
    void polesAsJsonAndCsv() {
        Run csv = run(with(with(new String[] {"poles"}, RATIONAL), "--grid", "-1:1:41,-1:1:41"));
        assertEquals(0, csv.status, csv.err);
        assertTrue(csv.out.startsWith("kind,z_re,z_im,sheet,lead_re,lead_im,err"), csv.out);
        assertEquals(3, csv.out.lines().count(), csv.out);
        Run json = run(with(with(new String[] {"poles"}, RATIONAL), "--grid", "-1:1:41,-1:1:41", "--format", "json"));
        assertEquals(0, json.status, json.err);
        assertTrue(json.out.contains("\"kind\" : \"pole\"") && json.out.contains("\"kind\" : \"zero\""), json.out);
    }

    @Test
    void highPrecisionEvalGivesTheRequestedDigits() {
        Run r = run(with(with(new String[] {"eval"}, DEMO), "--at", "3+2i", "--digits", "30"));
        assertEquals(0, r.status, r.err);
        String row = r.out.lines().filter(l -> l.startsWith("3")).findFirst().orElseThrow();
        // the 100-digit value from the mpmath peer (tools/bench/README.md): -1.16006808225917596926288703089...
        assertTrue(row.contains("-1.16006808225917596926288703089"), row);
    }

    @Test
    void describePrintsTheGeneratedMember() {
        Run r = run("describe", "--member", "2");
        assertEquals(0, r.status, r.err);
        assertTrue(r.out.contains("d/dx a(0)12"), r.out);
        assertEquals(2, run("describe", "--member", "0").status);
    }
}
