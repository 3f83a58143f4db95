package org.tertius.connection.match;

import java.util.List;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.piii.Painleve3Solution;

/**
 * The behaviour at 0 or at infinity of a solution whose start data are uncertain (computed elsewhere: the image of
 * a hierarchy member, data found by an inverse map), with that uncertainty propagated to first order by refitting:
 * the same fit is made for solutions started from the data moved by their errors (one per start value), and the
 * changes of the fitted parameters are added to their errors. A start error is a coherent change of the solution, so
 * it is carried this way rather than as independent errors of the sampled values (which the fits, solving for the
 * parameters from nearby radii, would amplify by their conditioning: a factor of about 1e3 was seen at 0).
 */
public final class StartSensitivity {
    private StartSensitivity() {
    }

    /**
     * The behaviour at 0 of {@code solution} on the ray, with the changes of sigma and B (or t0) of the moved
     * solutions added to the errors; the moved fits must decide the same kind, else the result is undecided.
     */
    public static ZeroBehaviour atZero(Painleve3Solution solution, List<Painleve3Solution> moved, double angle,
                                       int sheet) {
        ZeroBehaviour b = ZeroBehaviourFit.analyse(solution, angle, sheet);
        if (moved.isEmpty() || b.kind() == ZeroBehaviour.Kind.UNDECIDED) {
            return b;
        }
        double sigmaError = b.sigmaError();
        double secondError = b.secondParameterError();
        for (Painleve3Solution m : moved) {
            ZeroBehaviour c = ZeroBehaviourFit.analyse(m, angle, sheet);
            if (c.kind() != b.kind() || c.branch() != b.branch()) {
                return ZeroBehaviour.undecided(b.sigma(), Double.NaN, "a solution started from data moved by their"
                        + " errors behaves otherwise at 0 (" + c.kind() + " against " + b.kind() + "): the start data"
                        + " are not known well enough to decide");
            }
            sigmaError += c.sigma().subtract(b.sigma()).norm();
            secondError += c.secondParameter().subtract(b.secondParameter()).norm();
        }
        String note = b.note() + (b.note().isEmpty() ? "" : "; ") + "the start data's errors propagated by refitting "
                + moved.size() + " moved solutions";
        if (b.kind() == ZeroBehaviour.Kind.LOGARITHMIC) {
            return ZeroBehaviour.measuredLogarithmic((int) Math.round(b.sigma().getReal()), b.secondParameter(),
                    secondError, b.branch(), note);
        }
        return ZeroBehaviour.measuredPower(b.sigma(), sigmaError, b.secondParameter(), secondError, note);
    }

    /**
     * The behaviour at infinity along the ray, with the changes of p and q of the moved solutions added to their
     * errors; the moved fits must decide the same kind and background, else the result is undecided.
     */
    public static InfinityBehaviour atInfinity(Painleve3Solution solution, List<Painleve3Solution> moved,
                                               double angle, int sheet, double rMin, double rMax) {
        InfinityBehaviour b = InfinityBehaviourFit.analyse(solution, angle, sheet, rMin, rMax);
        if (moved.isEmpty() || b.kind() == InfinityBehaviour.Kind.UNDECIDED) {
            return b;
        }
        double errP = b.errP();
        double errQ = b.errQ();
        for (Painleve3Solution m : moved) {
            InfinityBehaviour c = InfinityBehaviourFit.analyse(m, angle, sheet, rMin, rMax);
            if (c.kind() != b.kind() || !c.background().equals(b.background())) {
                return InfinityBehaviour.undecided(angle, sheet, "a solution started from data moved by their errors"
                        + " behaves otherwise at infinity (" + c + "): the start data are not known well enough to"
                        + " decide");
            }
            errP += c.p().subtract(b.p()).norm();
            errQ += c.q().subtract(b.q()).norm();
        }
        return InfinityBehaviour.measured(b.kind(), angle, sheet, b.background(), b.p(), b.q(), errP, errQ,
                b.note() + (b.note().isEmpty() ? "" : "; ") + "the start data's errors propagated by refitting "
                + moved.size() + " moved solutions");
    }
}
