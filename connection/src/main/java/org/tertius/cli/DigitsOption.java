package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.apache.commons.cli.Options;
import org.tertius.connection.special.PointwiseSolution;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.number.ExactPoint;

/** {@code --digits D}: values to D significant digits in arbitrary precision, for any solution that allows it. */
final class DigitsOption implements OptionGroup {
    /** What --digits accepts. */
    static final String RANGE = "an integer in [" + HighPrecisionSolution.MIN_DIGITS + ", "
            + HighPrecisionSolution.MAX_DIGITS + "]";

    private final String help;
    Integer digits;

    DigitsOption(String help) {
        this.help = help;
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--digits", "D", help));
    }

    @Override
    public void read(Arguments a) {
        digits = a.integer("--digits", RANGE);
    }

    /** Whether D digits were asked for (on the command line or in the problem file). */
    boolean given(ProblemFile f) {
        if (digits == null && f.has("digits")) {
            digits = f.intValue("digits");
        }
        return digits != null;
    }

    /**
     * The D-digit row writer of a solution: a pointwise one (a closed form, a Backlund image; {@code direct}, null
     * otherwise) evaluated at each point directly, any other by the high-precision replay.
     */
    Function<ExactPoint, String> rows(ComputedSolution solution, PointwiseSolution direct, ValueRows rows,
                                      Progress progress) {
        if (direct == null) {
            HighPrecisionSolution hp = solution(solution, progress);
            return p -> rows.row(hp.evaluate(p));
        }
        HighPrecisionSolution.checkDigits(digits);
        int d = digits;
        return p -> {
            try {
                return rows.row(p, direct.evaluate(p, d), d);
            } catch (InvalidInputException e) {
                throw new UnreachableTargetException("target " + p + " not reached: " + e.getMessage());
            }
        };
    }

    /**
     * The comment lines above D-digit rows; for a pointwise solution also the line saying what it is (the closed
     * form, or the Backlund chain with the parameters it reaches), as above double-precision rows.
     */
    List<String> comments(ValueRows rows, PointwiseSolution direct) {
        List<String> out = new ArrayList<>(rows.preciseComments(digits));
        if (direct != null) {
            out.add(direct.methodDescription());
        }
        return out;
    }

    /** The solution to D digits, reporting progress. */
    HighPrecisionSolution solution(ComputedSolution solution, Progress progress) {
        HighPrecisionSolution.checkDigits(digits);
        return HighPrecisionSolution.of(solution, digits, f -> progress.update(Math.round(f * 1000), 1000));
    }
}
