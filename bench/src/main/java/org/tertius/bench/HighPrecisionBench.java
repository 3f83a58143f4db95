package org.tertius.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.OperatingSystemMXBean;
import java.util.Locale;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.highprecision.ReplayStatistics;
import org.tertius.core.mp.KernelCost;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/**
 * Benchmark of the high-precision layer (not a test): the generic D6 case alpha = 1, beta = -1/2, gamma = 1,
 * delta = -1, w(1) = 1/2, w'(1) = 1/3, evaluated at z = 3+2i.
 *
 * <pre>
 *   java -cp ... org.tertius.bench.HighPrecisionBench once 50        # one evaluation, as a whole process
 *   java -cp ... org.tertius.bench.HighPrecisionBench table 30 50 100 200 1000
 *   java -cp ... org.tertius.bench.HighPrecisionBench apfloat        # cost of Apfloat and BigInteger products
 * </pre>
 * The table reports, per number of digits, the wall and process CPU time of a fresh solution (in a warm JVM),
 * the steps and order of the accurate pass, the wall time per step (both passes), and the ratio of the times
 * to the multiplication-count bound: the complex products of the accurate pass (recurrence, order^2/2 per
 * convolution, and continued fractions) times the time of one complex product at that precision. The two
 * passes and the continued fractions run in parallel, so wall/bound can fall below 1 on two processors.
 */
public final class HighPrecisionBench {
    private HighPrecisionBench() {
    }

    public static void main(String[] args) {
        String mode = args.length == 0 ? "once" : args[0];
        switch (mode) {
            case "once":
                once(args.length > 1 ? Integer.parseInt(args[1]) : 50);
                break;
            case "table":
                int[] ds = new int[Math.max(0, args.length - 1)];
                for (int i = 1; i < args.length; i++) {
                    ds[i - 1] = Integer.parseInt(args[i]);
                }
                table(ds.length == 0 ? new int[] {30, 50, 100, 200} : ds);
                break;
            case "apfloat":
                apfloat();
                break;
            default:
                System.err.println("usage: HighPrecisionBench once D | table D... | apfloat");
                System.exit(2);
        }
    }

    static HighPrecisionSolution scenario(int digits) {
        return HighPrecisionSolution.of(Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1", "-1"))
                .start("1", "1/2", "1/3").build(), digits);
    }

    private static void once(int digits) {
        long t0 = System.nanoTime();
        HighPrecisionValue v = scenario(digits).evaluate(SurfacePoint.of(3, 2));
        long t1 = System.nanoTime();
        System.out.println("digits " + digits + "  correct digits " + v.correctDigits());
        System.out.println("w(3+2i)  = " + v.text(0));
        System.out.println("w'(3+2i) = " + v.text(1));
        System.out.printf(Locale.ROOT, "elapsed in main %.3f s%n", (t1 - t0) / 1e9);
    }

    private static void table(int[] digits) {
        // warm the JIT on small cases first
        for (int w = 0; w < 3; w++) {
            scenario(30).evaluate(SurfacePoint.of(3, 2));
            scenario(60).evaluate(SurfacePoint.of(3, 2));
        }
        System.out.println("digits  order  steps  wall[s]  cpu[s]  per-step[ms]  complex-product[us]  bound[s]"
                + "  wall/bound  cpu/bound");
        for (int d : digits) {
            HighPrecisionSolution s = scenario(d);
            long c0 = processCpuNanos();
            long t0 = System.nanoTime();
            HighPrecisionValue v = s.evaluate(SurfacePoint.of(3, 2));
            double t = (System.nanoTime() - t0) / 1e9;
            double cpu = (processCpuNanos() - c0) / 1e9;
            ReplayStatistics st = s.statistics();
            double mul = KernelCost.complexProductSeconds(st.fractionBits());
            double bound = st.productCount() * mul;
            System.out.printf(Locale.ROOT, "%6d  %5d  %5d  %7.3f  %6.3f  %12.2f  %19.3f  %8.3f  %10.2f  %9.2f   (%d"
                    + " correct)%n", d, st.order(), st.steps(), t, cpu, 1e3 * t / Math.max(1, st.totalSteps()),
                    mul * 1e6, bound, t / bound, cpu / bound, v.correctDigits());
        }
    }

    /** CPU time of the whole process (all threads, the JIT's included), or -1 where the JVM does not tell. */
    private static long processCpuNanos() {
        OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean) {
            return ((com.sun.management.OperatingSystemMXBean) os).getProcessCpuTime();
        }
        return -1;
    }

    private static void apfloat() {
        System.out.println("digits  apfloat-complex-multiply[us]  biginteger-3-products[us]  limb-columns[us]");
        for (int d : new int[] {20, 50, 100, 200}) {
            Apcomplex x = new Apcomplex(ApfloatMath.pi(d), ApfloatMath.sqrt(new Apfloat(2, d)));
            Apcomplex y = ApcomplexMath.exp(x);
            Apcomplex acc = x;
            int n = 20000;
            for (int i = 0; i < n; i++) {
                acc = acc.multiply(y).divide(y);
            }
            long t0 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                acc = x.multiply(y);
            }
            double t = (System.nanoTime() - t0) / 1e3 / n;
            int bits = (int) Math.ceil(d * MpContext.LOG2_10);
            System.out.printf(Locale.ROOT, "%6d  %28.2f  %25.3f  %16.3f%n", d, t, 1e6 * KernelCost.bigIntegerProductSeconds(bits),
                    1e6 * KernelCost.complexProductSeconds(bits));
            if (acc.real().signum() == 2) {
                System.out.print("");
            }
        }
    }
}
