package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tertius.cli.Main;

/** The connect and scan commands of the tool. */
class CommandLineTest {
    private static int run(StringWriter out, StringWriter err, String... args) {
        return Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void connectPrintsNumericalAndClosedFormSigmaAndAmplitude() {
        StringWriter out = new StringWriter();
        assertEquals(0, run(out, new StringWriter(), "connect", "--lambda", "0.2", "--tol", "1e-16"));
        List<String> lines = out.toString().lines().toList();
        assertEquals("quantity,precision,numerical,numerical_err,closed_form,closed_form_err", lines.get(1));
        String[] sigma = lines.get(2).split(",");
        assertEquals("sigma", sigma[0]);
        assertEquals(Double.parseDouble(sigma[4]), Double.parseDouble(sigma[2]), 1e-12);
    }

    @Test
    void connectRejectsLambdaBeyondTheEdge() {
        StringWriter err = new StringWriter();
        assertEquals(2, run(new StringWriter(), err, "connect", "--lambda", "0.5"));
        assertTrue(err.toString().contains("lambda: must be in (-1/pi, 1/pi)"), err.toString());
    }

    /** A small sweep, then a resumed one over more points: old rows kept, only new tasks run; plot written. */
    @Test
    void scanStreamsClassifiedRowsResumesAndPlots(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("scan.csv");
        Path png = dir.resolve("scan.png");
        StringWriter err = new StringWriter();
        assertEquals(0, run(new StringWriter(), err, "scan", "--range", "0.2:0.6:3", "--output",
                csv.toString(), "--threads", "2"));
        List<String> first = Files.readAllLines(csv);
        assertEquals(6, first.size()); // title, signature, CSV header, three rows
        assertTrue(first.get(3).contains(",true,"), first.get(3));
        assertTrue(first.get(5).contains(",zero,"), first.get(5));
        Files.write(csv, first.subList(0, 5)); // as if interrupted after two rows
        StringWriter err2 = new StringWriter();
        assertEquals(0, run(new StringWriter(), err2, "scan", "--range", "0.2:0.6:3", "--output",
                csv.toString(), "--plot", png.toString()));
        assertEquals(first, Files.readAllLines(csv));
        assertEquals(1, err2.toString().lines().filter(l -> l.startsWith("scan:")).count(), err2.toString());
        assertTrue(Files.size(png) > 1000);
    }
}
