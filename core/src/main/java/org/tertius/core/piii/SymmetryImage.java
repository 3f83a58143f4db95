package org.tertius.core.piii;

import java.util.List;
import java.util.Optional;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;

/**
 * A Painleve III solution obtained from another by a symmetry of the equation (DLMF §32.7(ii)-style elementary
 * symmetries, checked by substitution): 1/w, -w, or w(lambda z). Its values, its reading of the engine's path
 * tree (so that regions and poles work on images too) and its high-precision form are those of the base,
 * transformed.
 */
final class SymmetryImage extends Painleve3Solution {
    /** The symmetries. */
    enum Kind {
        RECIPROCAL("1/w"), NEGATED("-w"), SCALED_ARGUMENT("w(lambda z)");

        private final String label;

        Kind(String label) {
            this.label = label;
        }
    }

    private final Painleve3Solution base;
    private final Painleve3 equation;
    private final Kind kind;
    private final Complex lambda;
    private final double logLambdaRe;
    private final double logLambdaIm;

    SymmetryImage(Painleve3Solution base, Painleve3 equation, Kind kind, Complex lambda) {
        this.base = base;
        this.equation = equation;
        this.kind = kind;
        this.lambda = lambda;
        this.logLambdaRe = Math.log(lambda.norm());
        this.logLambdaIm = lambda.getArgument();
    }

    @Override
    public Painleve3 equation() {
        return equation;
    }

    @Override
    public int nodeCount() {
        return base.nodeCount();
    }

    @Override
    public String formDescription() {
        return kind.label + " of: " + base.formDescription();
    }

    /** The point of the base that corresponds to p (lambda p, on the sheet that log-coordinates give). */
    private SurfacePoint toBase(SurfacePoint p) {
        if (kind != Kind.SCALED_ARGUMENT) {
            return p;
        }
        return SurfacePoint.fromLog(p.logRe() + logLambdaRe, p.logIm() + logLambdaIm);
    }

    private SurfacePoint fromBase(SurfacePoint q) {
        if (kind != Kind.SCALED_ARGUMENT) {
            return q;
        }
        return SurfacePoint.fromLog(q.logRe() - logLambdaRe, q.logIm() - logLambdaIm);
    }

    @Override
    public Painleve3Value evaluate(SurfacePoint point) {
        return transform(point, base.evaluate(toBase(point)));
    }

    @Override
    public SolutionValue valueAt(SurfacePoint point) {
        return transform(point, Painleve3Value.of(base.valueAt(toBase(point)))).toSolutionValue();
    }

    /** The image's value at p from the base's value at the corresponding point (first-order error propagation). */
    private Painleve3Value transform(SurfacePoint point, Painleve3Value v) {
        switch (kind) {
            case RECIPROCAL: {
                Complex w = v.w();
                double m = w.norm();
                Complex idw = v.dw().negate().divide(w.multiply(w));
                double ew = v.errW() / (m * m);
                double edw = v.errDw() / (m * m) + 2 * v.dw().norm() * v.errW() / (m * m * m);
                return new Painleve3Value(point, w.reciprocal(), idw, ew, edw);
            }
            case NEGATED:
                return new Painleve3Value(point, v.w().negate(), v.dw().negate(), v.errW(), v.errDw());
            default:
                return new Painleve3Value(point, v.w(), v.dw().multiply(lambda), v.errW(), v.errDw() * lambda.norm());
        }
    }

    @Override
    public Optional<EngineReading> engineReading() {
        return base.engineReading().map(ImageReading::new);
    }

    @Override
    public HighPrecisionForm highPrecisionForm() {
        if (kind == Kind.SCALED_ARGUMENT) {
            throw new InvalidInputException("digits", "the image w(lambda z) has its factor lambda as a binary double;"
                    + " for arbitrary precision integrate the scaled equation from exact start data instead");
        }
        return new ImageForm(base.highPrecisionForm());
    }

    /** The base's reading of the engine, with points and values carried through the symmetry. */
    private final class ImageReading implements EngineReading {
        private final EngineReading base;

        ImageReading(EngineReading base) {
            this.base = base;
        }

        @Override
        public Solution tree() {
            return base.tree();
        }

        @Override
        public double tauRe(SurfacePoint p) {
            return base.tauRe(toBase(p));
        }

        @Override
        public double tauIm(SurfacePoint p) {
            return base.tauIm(toBase(p));
        }

        @Override
        public SurfacePoint point(double tauRe, double tauIm) {
            return fromBase(base.point(tauRe, tauIm));
        }

        @Override
        public Complex coordinateDerivative(SurfacePoint p) {
            Complex d = base.coordinateDerivative(toBase(p));
            return kind == Kind.SCALED_ARGUMENT ? d.divide(lambda) : d;
        }

        @Override
        public SolutionValue read(SurfacePoint p, StateEstimate state) {
            return transform(p, Painleve3Value.of(base.read(toBase(p), state))).toSolutionValue();
        }

        @Override
        public int primaryComponent() {
            return base.primaryComponent();
        }

        @Override
        public boolean primaryReciprocal() {
            return base.primaryReciprocal() ^ (kind == Kind.RECIPROCAL);
        }

        @Override
        public Complex primaryFactor(SurfacePoint p) {
            Complex f = base.primaryFactor(toBase(p));
            return kind == Kind.RECIPROCAL ? f.reciprocal() : kind == Kind.NEGATED ? f.negate() : f;
        }
    }

    /** The base's high-precision form with the values carried through 1/w or -w. */
    private final class ImageForm implements HighPrecisionForm {
        private final HighPrecisionForm base;

        ImageForm(HighPrecisionForm base) {
            this.base = base;
        }

        @Override
        public Solution planner() {
            return base.planner();
        }

        @Override
        public Coordinate coordinate() {
            return base.coordinate();
        }

        @Override
        public List<String> valueNames() {
            return base.valueNames();
        }

        @Override
        public void requireDigits(int digits) {
            base.requireDigits(digits);
        }

        @Override
        public MpComplex[] coefficients(MpContext ctx) {
            return base.coefficients(ctx);
        }

        @Override
        public MpComplex startTau(MpContext ctx) {
            return base.startTau(ctx);
        }

        @Override
        public MpComplex[] startState(MpContext ctx) {
            return base.startState(ctx);
        }

        @Override
        public MpComplex[] values(MpContext ctx, MpComplex u, MpComplex[] state) {
            MpComplex[] v = base.values(ctx, u, state);
            if (kind == Kind.NEGATED) {
                return new MpComplex[] {v[0].negate(), v[1].negate()};
            }
            MpComplex inverse = ctx.reciprocal(v[0]);
            return new MpComplex[] {inverse, ctx.multiply(ctx.multiply(v[1], inverse), inverse).negate()};
        }
    }
}
