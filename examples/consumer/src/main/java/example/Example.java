package example;

import java.util.Map;
import org.hipparchus.complex.Complex;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.family.Families;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.HighPrecisionSolution;
import org.tertius.core.piii.HighPrecisionValue;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/** A Painleve III transcendent in double precision and in 40 digits, and a member of a family given at infinity. */
public final class Example {
    public static void main(String[] args) {
        // w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w, w(1) = 1/2, w'(1) = 1/3
        Painleve3 equation = Painleve3.of(1, -0.5, 1, -1);
        Painleve3Solution s = Painleve3Solution.builder(equation)
                .start(Complex.ONE, new Complex(0.5), new Complex(1.0 / 3))
                .settings(SolverSettings.builder().tolerance(1e-13).order(32).build())
                .build();
        Painleve3Value v = s.evaluate(SurfacePoint.of(3, 2));      // z = 3+2i on the principal sheet
        System.out.println("w(3+2i) = " + ComplexText.format(v.w()) + " +- " + v.errW());

        HighPrecisionSolution exact = HighPrecisionSolution.builder("1", "-1/2", "1", "-1")
                .start("1", "1/2", "1/3").digits(40).build();
        HighPrecisionValue x = exact.evaluate(SurfacePoint.of(3, 2));
        System.out.println("w(3+2i) = " + x.wText() + " (" + x.correctDigits() + " correct digits)");

        // the member w ~ 1 - 2 lambda K0(2x) at +infinity of PIII(0, 0, 1, -1), lambda = 0.2; w ~ B x^sigma at 0
        Painleve3Solution d = Families.create(Painleve3.of(0, 0, 1, -1), "decaying", Map.of("lambda", "0.2"),
                SolverSettings.defaults());
        Painleve3Value atOne = d.evaluate(SurfacePoint.of(1, 0));
        System.out.println("lambda = 0.2: w(1) = " + atOne.w().getReal() + " +- " + atOne.errW()
                + ", sigma = " + McCoyTracyWu.sigma(0.2));

        // the double value lies within its error estimate of the 40-digit one
        double gap = ComplexText.parse("w", x.wText()).subtract(v.w()).norm();
        if (!(gap <= v.errW())) {
            throw new IllegalStateException("double and 40-digit values differ by " + gap + " > " + v.errW());
        }
    }
}
