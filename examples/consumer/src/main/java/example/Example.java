package example;

import java.util.Map;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.family.Families;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/** A Painleve III transcendent in double precision and in 40 digits, a family member, a hierarchy member. */
public final class Example {
    public static void main(String[] args) {
        // w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w, w(1) = 1/2, w'(1) = 1/3, given exactly
        Painleve3Solution s = Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1", "-1"))
                .start("1", "1/2", "1/3")
                .settings(SolverSettings.builder().tolerance(1e-13).order(32).build())
                .build();
        Painleve3Value v = s.evaluate(SurfacePoint.of(3, 2));      // z = 3+2i on the principal sheet
        System.out.println("w(3+2i) = " + ComplexText.format(v.w()) + " +- " + v.errW());

        HighPrecisionValue x = HighPrecisionSolution.of(s, 40).evaluate(SurfacePoint.of(3, 2));
        System.out.println("w(3+2i) = " + x.text(0) + " (" + x.correctDigits() + " correct digits)");

        // the member w ~ 1 - 2 lambda K0(2x) at +infinity of PIII(0, 0, 1, -1), lambda = 0.2; w ~ B x^sigma at 0
        Painleve3Solution d = Families.create(Painleve3.of(0, 0, 1, -1), "decaying", Map.of("lambda", "0.2"),
                SolverSettings.defaults());
        Painleve3Value atOne = d.evaluate(SurfacePoint.of(1, 0));
        System.out.println("lambda = 0.2: w(1) = " + atOne.w().getReal() + " +- " + atOne.errW()
                + ", sigma = " + McCoyTracyWu.sigma(0.2));

        // member 1 of the hierarchy analytic at x = 0 (s = 2, m = 0, a_-2(0) = (0, 2i, 2i)): q, r, q', r' with
        // errors through the same face as every solution, and the poles of q in a square
        MemberSolution m = MemberSolution.builder(MemberParameters.builder(1).s(ExactNumber.parse("s", "2")
                        .toComplex()).m(ExactNumber.parse("m", "0")).build())
                .startAtOrigin(ExactNumber.parse("a11", "0"), ExactNumber.parse("a12", "2i"),
                        ExactNumber.parse("a21", "2i")).build();
        SolutionValue q = m.valueAt(SurfacePoint.of(1, 0));
        System.out.println("q(1) = " + ComplexText.format(q.value(0)) + " +- " + q.error(0));
        Grid square = Grid.of(-3, 3, 61, -3, 3, 61, 0);
        GridResult field = RegionSolver.solve(m, square, RegionSettings.defaults());
        System.out.println("poles and zeros of q in [-3,3]^2: " + PoleFinder.find(field).size());

        // the double value lies within its error estimate of the 40-digit one
        double gap = ComplexText.parse("w", x.text(0)).subtract(v.w()).norm();
        if (!(gap <= v.errW())) {
            throw new IllegalStateException("double and 40-digit values differ by " + gap + " > " + v.errW());
        }
    }
}
