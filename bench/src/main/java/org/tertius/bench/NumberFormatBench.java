package org.tertius.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import org.tertius.core.number.ShortestDecimal;

/**
 * Cost of writing the numbers of a value row (not a test): a Painleve III row of the CSV tables has 7 doubles with 17
 * significant digits (before: {@code String.format("%.17g")}) and 3 errors with 4 digits (before: {@code "%.3e"});
 * the same row with {@link ShortestDecimal} (shortest round-trip decimals, errors rounded up), and
 * {@link Double#toString} for comparison. Rows of random values of the magnitudes a table holds; the best of 7 rounds
 * after a warm-up, in one JVM.
 *
 * <pre>java -cp bench/target/tertius-benchmarks.jar org.tertius.bench.NumberFormatBench [rows]</pre>
 */
public final class NumberFormatBench {
    private NumberFormatBench() {
    }

    public static void main(String[] args) {
        int rows = args.length > 0 ? Integer.parseInt(args[0]) : 200_000;
        SplittableRandom r = new SplittableRandom(1);
        double[][] data = new double[rows][10];
        for (double[] row : data) {
            for (int k = 0; k < 7; k++) {
                row[k] = (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(-3, 4));
            }
            for (int k = 7; k < 10; k++) {
                row[k] = r.nextDouble() * Math.pow(10, r.nextInt(-14, -8));
            }
        }
        System.out.printf(Locale.ROOT, "machine: %d cores, load %s; %d rows of 10 numbers%n",
                Runtime.getRuntime().availableProcessors(), load(), rows);
        long sink = 0;
        double[] best = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        for (int round = 0; round < 10; round++) {
            for (int way = 0; way < 3; way++) {
                long t0 = System.nanoTime();
                for (double[] row : data) {
                    sink += row(way, row).length();
                }
                double ns = (System.nanoTime() - t0) / (double) rows;
                if (round >= 3) {
                    best[way] = Math.min(best[way], ns);
                }
            }
        }
        System.out.printf(Locale.ROOT, "String.format %%.17g / %%.3e : %8.0f ns per row%n", best[0]);
        System.out.printf(Locale.ROOT, "Double.toString            : %8.0f ns per row%n", best[1]);
        System.out.printf(Locale.ROOT, "ShortestDecimal            : %8.0f ns per row%n", best[2]);
        System.out.printf(Locale.ROOT, "speed-up over String.format: %.1fx (check %d)%n", best[0] / best[2], sink % 10);
    }

    private static String row(int way, double[] v) {
        StringBuilder b = new StringBuilder(200);
        for (int k = 0; k < 10; k++) {
            if (k > 0) {
                b.append(',');
            }
            if (way == 0) {
                b.append(String.format(Locale.ROOT, k < 7 ? "%.17g" : "%.3e", v[k]));
            } else if (way == 1) {
                b.append(v[k]);
            } else if (k < 7) {
                ShortestDecimal.append(b, v[k]);
            } else {
                ShortestDecimal.appendRoundedUp(b, v[k], 4);
            }
        }
        return b.toString();
    }

    private static String load() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).trim();
        } catch (IOException | RuntimeException e) {
            return "unknown";
        }
    }
}
