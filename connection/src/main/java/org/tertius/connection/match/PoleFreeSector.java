package org.tertius.connection.match;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * The sector of the universal cover, around a given ray, in which a D6 solution (or D7 with gamma = 0, with x^(2/3)
 * for x in the exponentials) approaches one background c at
 * infinity (pole-free for large |z|; tronquee-type when it is wider than one half-plane of the exponential). Derived
 * here from the structure of {@link TransseriesAtInfinity}: with psi = arg(mu z), the deviation from c carries
 * e^(-mu z) (decaying for cos psi &gt; 0) and e^(mu z) (decaying for cos psi &lt; 0); the coefficient of each changes only
 * across the Stokes rays (psi = 0 mod pi) where it is the smaller one, so approach to c can only end at an anti-Stokes
 * ray (psi = pi/2 mod pi), where the exponential that starts to grow must be absent beyond it. The scan tests the
 * middle ray of each quarter (psi = pi/4 mod pi/2) outward from the given ray, on both sides, and reports the sector
 * between the quarter boundaries beyond which a test fails (anti-Stokes rays, else flagged inconsistent). A test passes if |log(w/c)| plus the relative error of the computed w
 * stays below 0.3 at |z| = rMin, sqrt(rMin rMax), rMax and does not grow outward (beyond the errors). The edges are exact rays (the anti-Stokes rays of c); what is
 * numerical is which quarters pass, and the result says so. Immutable.
 */
public final class PoleFreeSector {
    /** At most this many quarters are tested on each side (2 pi of the cover). */
    private static final int MAX_QUARTERS = 8;

    private final Complex background;
    private final double lower;
    private final double upper;
    private final boolean lowerOpen;
    private final boolean upperOpen;
    private final boolean consistent;
    private final List<String> tests;

    private PoleFreeSector(Complex background, double lower, double upper, boolean lowerOpen, boolean upperOpen,
                           boolean consistent, List<String> tests) {
        this.background = background;
        this.lower = lower;
        this.upper = upper;
        this.lowerOpen = lowerOpen;
        this.upperOpen = upperOpen;
        this.consistent = consistent;
        this.tests = List.copyOf(tests);
    }

    /**
     * The sector around the ray (angle, sheet) in which {@code solution} approaches the background it approaches on
     * that ray, tested on |z| in [rMin, rMax].
     *
     * @throws InvalidInputException for an equation that is not D6, or if the solution approaches no background on
     *     the given ray
     */
    public static PoleFreeSector around(Painleve3Solution solution, double angle, int sheet, double rMin,
                                        double rMax) {
        Painleve3 eq = solution.equation();
        List<Complex> backgrounds = TransseriesAtInfinity.backgrounds(eq); // refuses the other types
        InvalidInputException.requireFinite("angle", angle);
        double phase = angle + 2 * Math.PI * sheet;
        Complex c = null;
        for (Complex candidate : backgrounds) {
            if (approaches(solution, TransseriesAtInfinity.create(eq, candidate, Complex.ZERO, Complex.ZERO, 2), phase,
                    rMin, rMax)) {
                c = candidate;
            }
        }
        if (c == null) {
            throw new InvalidInputException("ray", "the solution approaches no background along arg z = " + angle
                    + (sheet == 0 ? "" : " on sheet " + sheet) + " (|z| up to " + rMax + "); there is no pole-free sector"
                    + " around this ray");
        }
        TransseriesAtInfinity t = TransseriesAtInfinity.create(eq, c, Complex.ZERO, Complex.ZERO, 2);
        double argMu = t.mu().getArgument();
        double factor = t.phaseFactor();
        // psi = argMu + factor phase; quarter index j: psi in [j pi/2, (j+1) pi/2)
        double psi = t.direction(phase);
        int j0 = (int) Math.floor(psi / (Math.PI / 2));
        List<String> tests = new ArrayList<>();
        int hi = j0;
        boolean upperOpen = false;
        while (hi - j0 < MAX_QUARTERS) {
            double mid = ((hi + 1.5) * Math.PI / 2 - argMu) / factor;
            boolean ok = approaches(solution, t, mid, rMin, rMax);
            tests.add("phase " + mid + ": " + (ok ? "approaches" : "does not approach") + " c");
            if (!ok) {
                break;
            }
            hi++;
        }
        if (hi - j0 == MAX_QUARTERS) {
            upperOpen = true;
        }
        int lo = j0;
        boolean lowerOpen = false;
        while (j0 - lo < MAX_QUARTERS) {
            double mid = ((lo - 0.5) * Math.PI / 2 - argMu) / factor;
            boolean ok = approaches(solution, t, mid, rMin, rMax);
            tests.add("phase " + mid + ": " + (ok ? "approaches" : "does not approach") + " c");
            if (!ok) {
                break;
            }
            lo--;
        }
        if (j0 - lo == MAX_QUARTERS) {
            lowerOpen = true;
        }
        // the edges: the boundaries of the last passing quarters; the theory puts them on anti-Stokes rays
        double upperPsi = (hi + 1) * Math.PI / 2;
        double lowerPsi = lo * Math.PI / 2;
        boolean consistent = isAntiStokes(upperPsi) && isAntiStokes(lowerPsi);
        return new PoleFreeSector(c, (lowerPsi - argMu) / factor, (upperPsi - argMu) / factor, lowerOpen, upperOpen,
                consistent, tests);
    }

    private static boolean isAntiStokes(double psi) {
        double r = Math.IEEEremainder(psi - Math.PI / 2, Math.PI);
        return Math.abs(r) < 1e-9;
    }

    private static boolean approaches(Painleve3Solution s, TransseriesAtInfinity t, double phase, double rMin,
                                      double rMax) {
        double[] radii = {rMin, Math.sqrt(rMin * rMax), rMax};
        double[] size = new double[3];
        double[] err = new double[3];
        for (int i = 0; i < 3; i++) {
            try {
                Complex tau = new Complex(Math.log(radii[i]), phase);
                Painleve3Value v = s.evaluate(SurfacePoint.fromLog(tau.getReal(), phase));
                size[i] = t.logOf(tau, v.w(), v.dw())[0].norm();
                err[i] = v.errW() / v.w().norm();
                if (!Double.isFinite(size[i]) || !(err[i] < 0.1)) {
                    return false;
                }
            } catch (TertiusException ex) {
                return false;
            }
        }
        for (int i = 0; i < 3; i++) {
            if (!(size[i] + err[i] < 0.3)) {
                return false;
            }
        }
        return size[2] <= 2 * size[0] + err[0] + err[2];
    }

    public Complex background() {
        return background;
    }

    /** The lower edge: the log-coordinate phase (arg z + 2 pi sheet) of an anti-Stokes ray of c. */
    public double lower() {
        return lower;
    }

    /** The upper edge (as {@link #lower()}). */
    public double upper() {
        return upper;
    }

    /** Opening angle upper - lower; pi for a generic member of the exponentially small family. */
    public double width() {
        return upper - lower;
    }

    /** True if the scan stopped at its limit on the lower side (the sector may extend further). */
    public boolean lowerOpen() {
        return lowerOpen;
    }

    public boolean upperOpen() {
        return upperOpen;
    }

    /**
     * True if both edges are anti-Stokes rays of c, as the structure of the transseries requires; false means a test
     * failed just beyond a Stokes ray, i.e. the sample radii are too small to decide (treat the sector as undecided).
     */
    public boolean consistent() {
        return consistent;
    }

    /** The rays tested and their outcome. */
    public List<String> tests() {
        return tests;
    }

    @Override
    public String toString() {
        return "approaches c = " + background + " for arg z (+ 2 pi sheet) in (" + lower + ", " + upper + ")"
                + (lowerOpen || upperOpen ? " at least" : "") + ", width " + width() / Math.PI + " pi"
                + (consistent ? "" : " (an edge is not an anti-Stokes ray: undecided)");
    }
}
