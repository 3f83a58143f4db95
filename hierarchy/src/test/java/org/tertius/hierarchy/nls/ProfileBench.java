package org.tertius.hierarchy.nls;

import com.sun.management.OperatingSystemMXBean;
import java.lang.management.ManagementFactory;
import java.util.Locale;
import org.hipparchus.complex.Complex;
import org.tertius.hierarchy.NlsCheck;
import org.tertius.hierarchy.PlaneGrid;

/**
 * Timing and accuracy figures of the near-field profile (a program, not a test; run by
 * hierarchy/tools/profile_bench.sh). Prints the time of a 1000 x 400 grid over X in [-10, 10], T in [-3, 3]
 * (wall and process CPU time, with 1 and 2 threads, repeated), then values, mass, NLS residuals and the large-X
 * comparison with their error estimates.
 */
public final class ProfileBench {
    private ProfileBench() {
    }

    public static void main(String[] args) {
        Locale.setDefault(Locale.ROOT);
        int repeats = args.length > 0 ? Integer.parseInt(args[0]) : 3;
        System.out.printf("cores %d, load %s%n", Runtime.getRuntime().availableProcessors(),
                ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        double[] x = new double[1000];
        double[] t = new double[400];
        for (int j = 0; j < x.length; j++) {
            x[j] = -10 + 20.0 * j / (x.length - 1);
        }
        for (int i = 0; i < t.length; i++) {
            t[i] = -3 + 6.0 * i / (t.length - 1);
        }
        for (int r = 0; r < repeats; r++) {
            for (int threads : new int[] {1, 2}) {
                long cpu0 = cpu();
                long w0 = System.nanoTime();
                NearFieldProfile p = NearFieldProfile.standard();
                PlaneGrid.Result g = p.grid(x, t).compute(threads, null, null);
                long w1 = System.nanoTime();
                long cpu1 = cpu();
                System.out.printf("grid 1000 x 400, %d thread(s): wall %.2f s, cpu %.2f s (profile set-up included),"
                        + " rows integrated %d, largest error estimate %.1e%n", threads, (w1 - w0) / 1e9,
                        (cpu1 - cpu0) / 1e9, g.computedRows(), g.maxError());
            }
        }
        NearFieldProfile p = NearFieldProfile.standard();
        System.out.println("values (X, T, Psi, error, route):");
        double[][] points = {{0, 0}, {1, 0}, {0, 1}, {1, 1}, {5, 0.5}, {10, 3}, {3, 1e-8}, {-2, -0.25}};
        for (double[] pt : points) {
            ProfileValue v = p.value(pt[0], pt[1]);
            System.out.printf("  %6.2f %10.3g  %s  %.1e  %s%n", pt[0], pt[1], v.psi(), v.error(), v.route());
        }
        System.out.println("NLS residual |i Psi_T + Psi_XX/2 + |Psi|^2 Psi| (h = 0.02, 0.01) / size of terms:");
        for (double[] pt : new double[][] {{1.3, 0.7}, {4, -1.1}, {0, 2}, {8, 2.5}}) {
            NlsCheck.Residual a = p.residual(pt[0], pt[1], 0.02);
            NlsCheck.Residual b = p.residual(pt[0], pt[1], 0.01);
            System.out.printf("  (%.1f, %.1f): %.2e, %.2e (ratio %.2f) / %.2e%n", pt[0], pt[1], a.value().norm(),
                    b.value().norm(), a.value().norm() / b.value().norm(), b.scale());
        }
        FarField.Constants closed = FarField.closedForm(Math.PI / 2);
        double[] xs = new double[16];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = 20 * Math.pow(15, i / 15.0);
        }
        FarField.Constants fit = FarField.fit(p, xs);
        System.out.printf("far field: A = %.12f +- %.1e (closed form %.12f), phi = %.12f +- %.1e (closed form %.12f)%n",
                fit.amplitude(), fit.amplitudeError(), closed.amplitude(), fit.phase(), fit.phaseError(),
                closed.phase());
        FarField far = new FarField(2, 0, closed);
        System.out.println("asymptotic form vs integrated, T = 0 (X, Psi, difference, estimates num/asym):");
        for (FarField.Comparison c : far.compare(p, new double[] {0.5, 1, 2, 3, 5, 8, 12, 20, 40, 80, 160})) {
            System.out.printf("  %6.1f  %+.12f  %.1e  %.1e / %.1e  %s%n", c.x(), c.integrated().getReal(),
                    c.difference(), c.integratedError(), c.asymptoticError(), c.agrees() ? "agree" : "DIFFER");
        }
        double length = 12;
        double half = NearFieldProfileTest.integrate(v -> Math.pow(p.value(v, 0).psi().norm(), 2), 0, length, 0.5);
        Complex a11 = p.solution().memberOne().evaluate(new Complex(length)).state().get(0);
        double psiL = p.value(length, 0).psi().getReal();
        double identity = a11.multiply(new Complex(0, -2)).getReal() - length * psiL * psiL;
        double zetaL = 4 * Math.sqrt(2 * length);
        double tail = NearFieldProfileTest.integrate(z -> Math.pow(far.psi(z * z / 32).getReal(), 2) * z / 16, zetaL,
                3000, 1.0) + 2 * Math.pow(closed.amplitude(), 2) / 3000;
        System.out.printf("mass at T = 0: int_0^12 Psi^2 = %.14f (identity -2i a(-2)11(12) - 12 Psi(12)^2 = %.14f),"
                + " tail from the asymptotic form %.10f, total %.10f (8 expected)%n", half, identity, tail,
                2 * (half + tail));
    }

    private static long cpu() {
        return ((OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }
}
