package org.tertius.core.piii;

import java.util.Optional;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;
import org.tertius.core.step.SolverSettings;

/** A Painleve III solution integrated by the core engine in the log variable tau = log z. */
final class IntegratedSolution extends Painleve3Solution {
    private final Painleve3 equation;
    private final Painleve3Form form;
    private final Solution engine;
    /** The start data z0, w0, w'(z0) as given (exactly, or the binary values of doubles). */
    private final ExactNumber[] exactStart;
    private final boolean startsAtZero;
    /** What computed the start data in double precision, or null when they were given. */
    private final String computedBy;

    private IntegratedSolution(Painleve3 equation, Painleve3Form form, Solution engine, ExactNumber[] exactStart,
                               boolean startsAtZero, String computedBy) {
        this.computedBy = computedBy;
        this.equation = equation;
        this.form = form;
        this.engine = engine;
        this.exactStart = exactStart.clone();
        this.startsAtZero = startsAtZero;
    }

    static IntegratedSolution create(Painleve3 eq, Complex z0, Complex w0, Complex dw0, Complex d3w0,
                                     ExactNumber[] exactStart, String computedBy, SolverSettings settings,
                                     double errW0, double errDw0) {
        boolean atZero = w0.getReal() == 0 && w0.getImaginary() == 0;
        boolean deltaZero = Painleve3.isZero(eq.delta());
        boolean gammaZero = Painleve3.isZero(eq.gamma());
        Painleve3Form form;
        double[] re;
        double[] im;
        if (atZero) {
            if (deltaZero) {
                throw new InvalidInputException("w0", "w0 = 0 is accepted only for delta != 0 (a zero of w is a regular"
                        + " point of the Hamiltonian form only then); start at a nearby point where w != 0");
            }
            Complex c = HamiltonianForm.principalC(eq);
            double scale = Math.max(1, c.norm());
            if (dw0.subtract(c).norm() <= 1e-12 * scale) {
                // w' = C
            } else if (dw0.add(c).norm() <= 1e-12 * scale) {
                c = c.negate();
            } else {
                throw new InvalidInputException("dw0", "w0 = 0 is a zero of w, where the equation forces"
                        + " w'(z0)^2 = -delta, i.e. w'(z0) = +-" + Painleve3.fmt(HamiltonianForm.principalC(eq))
                        + "; got " + Painleve3.fmt(dw0));
            }
            if (d3w0 == null) {
                throw new InvalidInputException("d3w0", "w0 = 0: a solution through a zero of w is fixed by"
                        + " w'''(z0) as well as w'(z0); give the third derivative");
            }
            HamiltonianForm h = new HamiltonianForm(eq, c);
            form = h;
            re = new double[2];
            im = new double[2];
            h.toStateAtZero(z0, d3w0, re, im);
        } else {
            if (!deltaZero) {
                form = new HamiltonianForm(eq, HamiltonianForm.principalC(eq));
            } else if (!gammaZero) {
                Painleve3 r = eq.reciprocal();
                form = new ReciprocalForm(new HamiltonianForm(r, HamiltonianForm.principalC(r)));
            } else {
                form = new AugmentedForm(eq);
            }
            int dim = form.system().dimension();
            re = new double[dim];
            im = new double[dim];
            form.toState(z0, w0, dw0, re, im);
        }
        SurfacePoint p0 = SurfacePoint.of(z0, 0);
        double[] e0 = new double[re.length];
        if (errW0 > 0 || errDw0 > 0) {
            if (atZero) {
                throw new InvalidInputException("start errors", "are not taken for a start at a zero of w (w0 = 0)");
            }
            addStateError(form, z0, w0, dw0, errW0, true, e0);
            addStateError(form, z0, w0, dw0, errDw0, false, e0);
        }
        // an uncertain start (data computed elsewhere) is carried by the flow like every later error
        Solution engine = Solution.start(form.system(), settings, form.projection(), p0.logRe(), p0.logIm(), re, im,
                e0, new double[re.length]);
        return new IntegratedSolution(eq, form, engine, exactStart, atZero, computedBy);
    }

    /**
     * Adds |d state / d w0| errW0 (or the same for w'(z0)) to e0: the state map is analytic in w0 and w'(z0), so its
     * derivative is the difference quotient along a real increment h (central, h relative 1e-6, whose own error,
     * about h^2, is negligible beside a first-order error estimate).
     */
    private static void addStateError(Painleve3Form form, Complex z0, Complex w0, Complex dw0, double error,
                                      boolean ofW, double[] e0) {
        if (!(error > 0)) {
            return;
        }
        Complex base = ofW ? w0 : dw0;
        double h = 1e-6 * Math.max(1, base.norm());
        int n = e0.length;
        double[][] plus = {new double[n], new double[n]};
        double[][] minus = {new double[n], new double[n]};
        form.toState(z0, ofW ? w0.add(h) : w0, ofW ? dw0 : dw0.add(h), plus[0], plus[1]);
        form.toState(z0, ofW ? w0.subtract(h) : w0, ofW ? dw0 : dw0.subtract(h), minus[0], minus[1]);
        for (int i = 0; i < n; i++) {
            double slope = Math.hypot(plus[0][i] - minus[0][i], plus[1][i] - minus[1][i]) / (2 * h);
            e0[i] += slope * error;
        }
    }

    @Override
    public Painleve3 equation() {
        return equation;
    }

    @Override
    public Painleve3Value evaluate(SurfacePoint point) {
        return value(point, engine.evaluate(point.logRe(), point.logIm()));
    }

    @Override
    public SolutionValue valueAt(SurfacePoint point) {
        return value(point, engine.evaluateCanonical(point.logRe(), point.logIm())).toSolutionValue();
    }

    /** The PIII value from an engine estimate at the point. */
    Painleve3Value value(SurfacePoint point, StateEstimate s) {
        int n = s.dimension();
        double[] re = new double[n];
        double[] im = new double[n];
        double[] err = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = s.re(i);
            im[i] = s.im(i);
            err[i] = s.error(i);
        }
        double[] e = new double[2];
        Complex[] v = form.fromState(point.z(), re, im, err, e);
        return new Painleve3Value(point, v[0], v[1], e[0], e[1]);
    }

    @Override
    public int nodeCount() {
        return engine.nodeCount();
    }

    @Override
    public String formDescription() {
        return form.describe();
    }

    @Override
    public Optional<EngineReading> engineReading() {
        return Optional.of(new Painleve3Reading(this));
    }

    @Override
    public HighPrecisionForm highPrecisionForm() {
        if (computedBy != null) {
            throw new InvalidInputException("digits", "the start data of this solution come from " + computedBy
                    + ", computed in double precision, so no more digits can be vouched for; give start data exactly"
                    + " (--z0 --w0 --dw0) to compute to many digits");
        }
        if (startsAtZero) {
            throw new InvalidInputException("w0", "w0 = 0 is not accepted at high precision: start the solution at a"
                    + " point where w != 0");
        }
        return new Painleve3PreciseForm(this, exactStart);
    }

    /** The engine solution (path tree) behind this solution. */
    Solution engine() {
        return engine;
    }

    Painleve3Form form() {
        return form;
    }
}
