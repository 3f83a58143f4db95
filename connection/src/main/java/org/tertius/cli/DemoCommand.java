package org.tertius.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The built-in demo scenario: a generic D6 solution (alpha = 1, beta = -1/2, gamma = 1, delta = -1,
 * w(1) = 1/2, w'(1) = 1/3) evaluated at a few points of three sheets.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Run the built-in scenario (a generic D6 solution) and write its results into a folder.")
public final class DemoCommand implements Callable<Integer> {
    static final Painleve3 EQUATION = Painleve3.of(1, -0.5, 1, -1);
    static final Complex Z0 = Complex.ONE;
    static final Complex W0 = new Complex(0.5);
    static final Complex DW0 = new Complex(1.0 / 3.0);

    @Spec
    CommandSpec spec;
    @Option(names = "--out", paramLabel = "DIR", description = "output folder (default tertius-demo)")
    Path out = Path.of("tertius-demo");

    static Painleve3Solution solution() {
        return Painleve3Solution.builder(EQUATION).start(Z0, W0, DW0).build();
    }

    @Override
    public Integer call() throws IOException {
        PrintWriter console = spec.commandLine().getOut();
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw new InvalidInputException("--out", "cannot create folder " + out + ": " + e.getMessage());
        }
        Painleve3Solution s = solution();
        console.println("tertius demo: " + EQUATION + ", w(1) = 1/2, w'(1) = 1/3 [" + EQUATION.type().describe() + "]");
        List<SurfacePoint> pts = List.of(SurfacePoint.of(3, 2), SurfacePoint.of(1, 10), SurfacePoint.of(-8, 6),
                SurfacePoint.of(-3, 0.5, 1), SurfacePoint.of(-3, -0.5, -1), SurfacePoint.of(1e-6, 1e-6));
        Path values = out.resolve("values.csv");
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(values, StandardCharsets.UTF_8))) {
            ValueCsv.header(w, s.equation().toString(), "integrated in the " + s.formDescription());
            for (SurfacePoint p : pts) {
                Painleve3Value v = s.evaluate(p);
                w.println(ValueCsv.row(v));
                console.printf("  w(%s) = %s  (err %.1e)%n", p, org.tertius.core.number.ComplexText.format(v.w()),
                        Math.max(v.errW(), v.errDw()));
            }
        }
        console.println("wrote " + values.toAbsolutePath());
        return 0;
    }
}
