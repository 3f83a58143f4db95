import java.util.Arrays;
import java.util.List;
import org.tertius.connection.special.BesselTypeSolution;
import org.tertius.connection.special.CertifiedRoot;
import org.tertius.connection.special.ExactParameters;
import org.tertius.connection.special.RationalSolution;
import org.tertius.connection.special.RootIsolation;
import org.tertius.connection.special.SpecialPolynomial;
import org.tertius.connection.special.SpecialPolynomials;
import org.tertius.connection.special.SpecialSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Wall-clock timings of the special-solution package (not a test): each task is run once cold (first use in
 * this JVM, as on the command line) and then three times warm, and the cold time and the median warm time are
 * printed. Run by tools/bench/run-special-timing.sh.
 */
public class SpecialTiming {
    interface Task {
        Object run();
    }

    static void time(String name, Task task) {
        long t0 = System.nanoTime();
        Object r = task.run();
        double cold = (System.nanoTime() - t0) / 1e6;
        double[] warm = new double[3];
        for (int k = 0; k < 3; k++) {
            long t = System.nanoTime();
            task.run();
            warm[k] = (System.nanoTime() - t) / 1e6;
        }
        Arrays.sort(warm);
        System.out.printf("%-58s cold %9.1f ms   warm %9.1f ms   (%s)%n", name, cold, warm[1], r);
    }

    public static void main(String[] args) {
        GaussianRational third = SpecialPolynomials.mu(1, 3);
        for (int n : new int[] {11, 20, 40}) {
            time("S_" + n + "(z; 1/3) generated exactly, degree " + (n * (n + 1) / 2),
                    () -> SpecialPolynomials.of(n, third).degree());
        }
        SpecialPolynomial s11 = SpecialPolynomials.of(11, third);
        SpecialPolynomial s20 = SpecialPolynomials.of(20, third);
        for (int digits : new int[] {30, 100}) {
            time("roots of S_11(z; 1/3), degree 66, " + digits + " digits, certified",
                    () -> count(RootIsolation.roots(s11.scaled(), s11.scale(), digits)));
        }
        time("roots of S_20(z; 1/3), degree 210, 30 digits, certified",
                () -> count(RootIsolation.roots(s20.scaled(), s20.scale(), 30)));
        RationalSolution r = RationalSolution.normalized(11, third, 1);
        time("rational n = 11: zeros and poles, 30 digits", () -> count(r.zeros(30)) + count(r.poles(30)));
        time("rational n = 11: 1000 values in double", () -> values(r, 1000));
        time("rational n = 11: 20 values to 50 digits", () -> precise(r, 20, 50));
        BesselTypeSolution b = BesselTypeSolution.of(ExactParameters.parse("13/10", "7/10", "1", "-1"),
                GaussianRational.ONE, GaussianRational.of(1, 1));
        time("Bessel-type seed: 1000 values in double", () -> values(b, 1000));
        time("Bessel-type seed: 20 values to 50 digits", () -> precise(b, 20, 50));
    }

    static int count(List<CertifiedRoot> roots) {
        int c = 0;
        for (CertifiedRoot x : roots) {
            c += x.multiplicity();
        }
        return c;
    }

    static String values(SpecialSolution s, int n) {
        double worst = 0;
        for (int k = 0; k < n; k++) {
            double t = 2 * Math.PI * k / n;
            SurfacePoint p = SurfacePoint.of(7.3 * Math.cos(t), 7.3 * Math.sin(t));
            worst = Math.max(worst, s.evaluate(p).relativeError());
        }
        return "largest relative error estimate " + String.format("%.1e", worst);
    }

    static String precise(SpecialSolution s, int n, int digits) {
        long least = Long.MAX_VALUE;
        for (int k = 0; k < n; k++) {
            double t = 2 * Math.PI * k / n;
            least = Math.min(least, s.evaluate(SurfacePoint.of(3.1 * Math.cos(t), 3.1 * Math.sin(t)), digits)
                    .correctDigitsW());
        }
        return "fewest digits of w " + least;
    }
}
