package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * A rational solution of Painleve III (type D6), built from the special polynomials S_n(z; mu):
 * <pre>  W(z) = S_n(z; mu-1) S_{n-1}(z; mu) / (S_n(z; mu) S_{n-1}(z; mu-1))   solves PIII(2n+2mu-1, 2n-2mu+1, 1, -1) </pre>
 * (P. A. Clarkson, J. Phys. A 36 (2003) 9507, Theorem 2.1; NIST DLMF §32.8(iii); checked here by substitution,
 * see the tests). For general gamma delta != 0 with alpha/a + beta/c = 4n, n &gt;= 1 ({@link RootChoice}),
 * mu = (x - y + 2)/4 and w(t) = W(t/lambda)/kappa, lambda = sigma/sqrt(a c), kappa = a lambda, sigma = +-1: the
 * two signs give the solutions W(z) and -W(-z) of the normalised equation (w -> -w(-z) is a symmetry of every
 * PIII). Then w'(t) = c W'(t/lambda). Single-valued: the sheet of the point is irrelevant.
 *
 * <p>Errors: Horner rounding bounds of the four polynomial values and derivatives ({@link NumericPolynomial})
 * propagated through the quotient to first order, plus the rounding of lambda, kappa and c (8 units each) and
 * its effect through W' and W'' (W'' from the equation).
 */
public final class RationalSolution extends ClosedFormSolution {
    private final ExactParameters parameters;
    private final RootChoice choice;
    private final int sigma;
    private final int n;
    private final GaussianRational mu;
    private final SpecialPolynomial[] polys; // S_n(mu-1), S_{n-1}(mu), S_n(mu), S_{n-1}(mu-1)
    private final Map<Long, NumericPolynomial<?>[]> numeric = new ConcurrentHashMap<>();
    private volatile ProductForm productForm;

    private RationalSolution(ExactParameters parameters, RootChoice choice, int sigma) {
        this.parameters = parameters;
        this.choice = choice;
        this.sigma = sigma;
        this.n = (int) (choice.sum() / 4);
        // mu = (x - y + 2)/4
        this.mu = choice.x().subtract(choice.y()).add(GaussianRational.of(2, 0))
                .multiply(GaussianRational.of(new BigFraction(1, 4), BigFraction.ZERO));
        List<SpecialPolynomial> s = SpecialPolynomials.generate(n, mu);
        List<SpecialPolynomial> sm = SpecialPolynomials.generate(n, mu.subtract(GaussianRational.ONE));
        this.polys = new SpecialPolynomial[] {sm.get(n), s.get(n - 1), s.get(n), sm.get(n - 1)};
    }

    /**
     * The rational solutions of the equation that this package builds: for each sign choice with
     * alpha/a + beta/c = 4n, n &gt;= 1, the two members sigma = +1, -1. Empty if there are none (D7, D8 and the
     * quadrature cases have none of this form).
     */
    public static List<RationalSolution> all(ExactParameters p) {
        List<RationalSolution> out = new ArrayList<>();
        if (p.type() != Painleve3Type.D6) {
            return out;
        }
        for (RootChoice choice : RootChoice.find(p, m -> m > 0 && m % 4 == 0 && m / 4 <= SpecialPolynomials.MAX_INDEX)) {
            out.add(new RationalSolution(p, choice, 1));
            out.add(new RationalSolution(p, choice, -1));
        }
        return out;
    }

    /**
     * The rational solution number {@code index} of {@link #all} (0 and 1 are the members sigma = +1, -1 of the
     * first family).
     *
     * @throws InvalidInputException if the equation has none (the message says which condition fails) or the
     *     index is out of range
     */
    public static RationalSolution of(ExactParameters p, int index) {
        List<RationalSolution> all = all(p);
        if (all.isEmpty()) {
            throw new InvalidInputException("family", "no rational solution: " + whyNot(p));
        }
        if (index < 0 || index >= all.size()) {
            throw new InvalidInputException("index", "must be in [0, " + (all.size() - 1) + "], got " + index);
        }
        return all.get(index);
    }

    /** The condition that fails, in words (for parameters without a rational solution of this form). */
    static String whyNot(ExactParameters p) {
        if (p.type() != Painleve3Type.D6) {
            return "the special-polynomial solutions need gamma delta != 0 (type D6), got " + p.type().describe();
        }
        return "alpha/a + beta/c = 4n (n >= 1) fails for every a = +-sqrt(gamma), c = +-sqrt(-delta) (DLMF 32.8(iii):"
                + " alpha + epsilon beta = 4n when gamma = 1, delta = -1); here alpha^2/gamma = " + p.alphaInvariant()
                + " and -beta^2/delta = " + p.betaInvariant() + " (alpha/a + beta/c = 0 gives the constants)";
    }

    /**
     * The member {@code sigma} (+1 or -1) of the rational solution of PIII(2n+2mu-1, 2n-2mu+1, 1, -1), n &gt;= 1.
     *
     * @throws InvalidInputException for n outside [1, {@link SpecialPolynomials#MAX_INDEX}] or sigma not +-1
     */
    public static RationalSolution normalized(int n, GaussianRational mu, int sigma) {
        if (n < 1 || n > SpecialPolynomials.MAX_INDEX) {
            throw new InvalidInputException("n", "must be in [1, " + SpecialPolynomials.MAX_INDEX + "], got " + n);
        }
        if (sigma != 1 && sigma != -1) {
            throw new InvalidInputException("sigma", "must be 1 or -1, got " + sigma);
        }
        GaussianRational two = GaussianRational.of(2, 0);
        GaussianRational x = GaussianRational.of(2L * n - 1, 0).add(two.multiply(mu));
        GaussianRational y = GaussianRational.of(2L * n + 1, 0).subtract(two.multiply(mu));
        ExactParameters p = ExactParameters.of(x, y, GaussianRational.ONE, GaussianRational.of(-1, 0));
        return new RationalSolution(p, new RootChoice(1, 1, 4L * n, x, y), sigma);
    }

    @Override
    public ParameterSet parameters() {
        return ParameterSet.of(parameters);
    }

    /** The parameters, exactly. */
    public ExactParameters exactParameters() {
        return parameters;
    }

    @Override
    public String kind() {
        return "rational";
    }

    /** n, the index of the special polynomials. */
    public int index() {
        return n;
    }

    public GaussianRational mu() {
        return mu;
    }

    public int sigma() {
        return sigma;
    }

    public RootChoice choice() {
        return choice;
    }

    /** The four polynomials, in the order S_n(mu-1), S_{n-1}(mu), S_n(mu), S_{n-1}(mu-1). */
    public List<SpecialPolynomial> polynomials() {
        return List.of(polys);
    }

    @Override
    public String description() {
        return "rational solution of PIII(" + parameters + "): w(z) = W(z/lambda)/kappa with W(z) = S_" + n
                + "(z; mu-1) S_" + (n - 1) + "(z; mu) / (S_" + n + "(z; mu) S_" + (n - 1) + "(z; mu-1)), n = " + n
                + ", mu = " + mu + " (Clarkson, J. Phys. A 36 (2003) 9507, Thm 2.1; DLMF 32.8(iii)); W solves"
                + " PIII(" + choice.x() + ", " + choice.y() + ", 1, -1); " + choice.text() + ", lambda = "
                + (sigma > 0 ? "" : "-") + "1/sqrt(a c), kappa = a lambda; degrees " + polys[0].degree() + "/"
                + polys[2].degree() + " in numerator/denominator before cancellation";
    }

    /** Horner's rule in double is accepted up to this relative error bound; beyond it the product form is used. */
    static final double HORNER_TOLERANCE = 1e-13;

    /**
     * In double precision: Horner's rule on the four polynomials when its bound is small enough, else the product
     * form over the roots ({@link ProductForm}, roots computed once), else the multiprecision evaluation.
     */
    @Override
    public Painleve3Value evaluate(SurfacePoint point) {
        ComplexArithmetic dbl = ComplexArithmetic.INSTANCE;
        try {
            Estimate<Complex> e = compute(dbl, point);
            if (e.finite(dbl) && e.relativeError(dbl) <= HORNER_TOLERANCE) {
                return new Painleve3Value(point, e.w(), e.dw(), Math.exp(e.logErrorW()), Math.exp(e.logErrorDw()));
            }
        } catch (ArithmeticException overflow) {
            // coefficients beyond the double range: try the product form
        }
        ProductForm f = productForm();
        Painleve3Value v = f.evaluate(point, this);
        if (v != null) {
            return v;
        }
        return super.evaluate(point);
    }

    private ProductForm productForm() {
        ProductForm f = productForm;
        if (f == null) {
            synchronized (this) {
                if (productForm == null) {
                    productForm = ProductForm.of(polys);
                }
                f = productForm;
            }
        }
        return f;
    }

    /** lambda, kappa, c in double precision (each within a few units of rounding). */
    Complex[] scalesDouble() {
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        Complex a = choice.a(ar, parameters);
        Complex c = choice.c(ar, parameters);
        Complex lambda = a.multiply(c).add(Complex.ZERO).sqrt().reciprocal().multiply(sigma);
        return new Complex[] {lambda, a.multiply(lambda), c};
    }

    @SuppressWarnings("unchecked")
    private <T> NumericPolynomial<T>[] numeric(AnalyticArithmetic<T> ar) {
        long key = ar instanceof MpArithmetic ? ar.digits() : -1;
        NumericPolynomial<?>[] cached = numeric.get(key);
        if (cached == null || cached[0].arithmetic().getClass() != ar.getClass()) {
            cached = new NumericPolynomial<?>[4];
            for (int k = 0; k < 4; k++) {
                cached[k] = polys[k].numeric(ar);
            }
            if (numeric.size() > 8) {
                numeric.clear();
            }
            numeric.put(key, cached);
        }
        return (NumericPolynomial<T>[]) cached;
    }

    /** a, c, x, y in double precision, converted once (the exact conversion costs more than an evaluation). */
    private volatile List<Complex> doubleScalars;

    /** a, c and the normalised parameters x, y of the choice in the arithmetic (cached for double). */
    @SuppressWarnings("unchecked")
    private <T> List<T> scalars(AnalyticArithmetic<T> ar) {
        if (ar == ComplexArithmetic.INSTANCE && doubleScalars != null) {
            return (List<T>) doubleScalars;
        }
        List<T> v = List.of(choice.a(ar, parameters), choice.c(ar, parameters), Conversions.of(ar, choice.x()),
                Conversions.of(ar, choice.y()));
        if (ar == ComplexArithmetic.INSTANCE) {
            doubleScalars = (List<Complex>) v;
        }
        return v;
    }

    @Override
    <T> Estimate<T> compute(AnalyticArithmetic<T> ar, T t, int sheet) {
        double u = ar.epsilon();
        List<T> scalars = scalars(ar);
        T a = scalars.get(0);
        T c = scalars.get(1);
        // a c + 0: a negative zero part in double would take the square root to the other side of its cut, away
        // from the multiprecision value (where zeros have no sign)
        T lambda = ar.reciprocal(ar.sqrt(ar.add(ar.multiply(a, c), ar.zero())));
        if (sigma < 0) {
            lambda = ar.negate(lambda);
        }
        T kappa = ar.multiply(a, lambda);
        T z = ar.divide(t, lambda);
        NumericPolynomial<T>[] p = numeric(ar);
        for (NumericPolynomial<T> q : p) {
            if (!q.finite()) {
                throw new ArithmeticException("coefficients overflow the arithmetic");
            }
        }
        Part<T> num = Part.product(ar, p[0].evaluate(z), p[1].evaluate(z), u);
        Part<T> den = Part.product(ar, p[2].evaluate(z), p[3].evaluate(z), u);
        if (!(den.logAbsValue > Math.log(2) + den.logErrValue)) {
            throw new InvalidInputException("z", "z = " + ar.toComplex(t) + " is a pole of the rational solution (within"
                    + " rounding): the denominator S_" + n + "(z; mu) S_" + (n - 1) + "(z; mu-1) vanishes there");
        }
        T w0 = ar.divide(num.value, den.value);
        T q = ar.subtract(ar.multiply(num.derivative, den.value), ar.multiply(num.value, den.derivative));
        T dw0 = ar.divide(q, ar.multiply(den.value, den.value));
        double rhoDen = Math.exp(den.logErrValue - den.logAbsValue);
        double logErrW0 = Conversions.logAdd(num.logErrValue - den.logAbsValue,
                ar.logAbs(w0) + Math.log(rhoDen + u));
        double logErrQ = Conversions.logAdd(
                Conversions.logAdd(num.logErrDerivative + den.logAbsValue, ar.logAbs(num.derivative) + den.logErrValue),
                Conversions.logAdd(num.logErrValue + ar.logAbs(den.derivative), num.logAbsValue + den.logErrDerivative));
        logErrQ = Conversions.logAdd(logErrQ, Math.log(2 * u) + Conversions.logAdd(
                ar.logAbs(num.derivative) + den.logAbsValue, num.logAbsValue + ar.logAbs(den.derivative)));
        double logErrDw0 = Conversions.logAdd(logErrQ - 2 * den.logAbsValue, ar.logAbs(dw0) + Math.log(2 * rhoDen + u));
        // the argument z = t/lambda carries about 8 units of rounding from lambda
        double logShift = Math.log(8 * u) + ar.logAbs(z);
        logErrW0 = Conversions.logAdd(logErrW0, ar.logAbs(dw0) + logShift);
        T d2w0 = EquationValues.secondDerivative(ar, scalars.get(2), scalars.get(3), ar.one(), ar.negate(ar.one()), z,
                w0, dw0);
        if (d2w0 != null) {
            logErrDw0 = Conversions.logAdd(logErrDw0, ar.logAbs(d2w0) + logShift);
        }
        T w = ar.divide(w0, kappa);
        T dw = ar.multiply(c, dw0);
        double logErrW = Conversions.logAdd(logErrW0 - ar.logAbs(kappa), ar.logAbs(w) + Math.log(8 * u));
        double logErrDw = Conversions.logAdd(logErrDw0 + ar.logAbs(c), ar.logAbs(dw) + Math.log(8 * u));
        return new Estimate<>(w, dw, logErrW, logErrDw);
    }

    /** The zeros of w (roots of S_n(mu-1) and S_{n-1}(mu), times lambda), after cancelling common roots at 0. */
    public List<CertifiedRoot> zeros(int digits) {
        return roots(digits, 0, 1, 2, 3);
    }

    /** The poles of w (roots of S_n(mu) and S_{n-1}(mu-1), times lambda), after cancelling common roots at 0. */
    public List<CertifiedRoot> poles(int digits) {
        return roots(digits, 2, 3, 0, 1);
    }

    /**
     * True if no root of the numerator is a root of the denominator apart from z = 0 (proved exactly, modulo
     * primes; {@link PolynomialProofs}), so that the lists of zeros and poles are complete and disjoint.
     */
    public boolean zerosAndPolesProvedDistinct() {
        GaussianPolynomial num = polys[0].scaled().multiply(polys[1].scaled());
        GaussianPolynomial den = polys[2].scaled().multiply(polys[3].scaled());
        num = num.divideByPowerOfX(num.zeroRootMultiplicity());
        den = den.divideByPowerOfX(den.zeroRootMultiplicity());
        return num.degree() == 0 || den.degree() == 0 || PolynomialProofs.provedCoprime(num, den);
    }

    private List<CertifiedRoot> roots(int digits, int top1, int top2, int bottom1, int bottom2) {
        int order = polys[top1].scaled().zeroRootMultiplicity() + polys[top2].scaled().zeroRootMultiplicity()
                - polys[bottom1].scaled().zeroRootMultiplicity() - polys[bottom2].scaled().zeroRootMultiplicity();
        MpArithmetic mp = new MpArithmetic(digits + 20L);
        MpComplex lambdaMp = mp.reciprocal(mp.sqrt(mp.multiply(choice.a(mp, parameters), choice.c(mp, parameters))));
        Apcomplex lambda = mp.context().toApcomplex(sigma > 0 ? lambdaMp : lambdaMp.negate());
        double logLambda = PreciseValue.log10Abs(lambda);
        List<CertifiedRoot> out = new ArrayList<>();
        if (order > 0) {
            out.add(new CertifiedRoot(Apcomplex.ZERO, Double.NEGATIVE_INFINITY, order, order == 1));
        }
        for (int k : new int[] {top1, top2}) {
            SpecialPolynomial s = polys[k];
            if (s.degree() == 0) {
                continue;
            }
            GaussianPolynomial rest = s.scaled().divideByPowerOfX(s.scaled().zeroRootMultiplicity());
            if (rest.degree() == 0) {
                continue;
            }
            for (CertifiedRoot r : RootIsolation.roots(rest, s.scale(), digits)) {
                long prec = Math.max(digits + 10L, r.value().precision() == Apfloat.INFINITE ? 0 : r.value().precision());
                Apcomplex v = r.value().precision(prec).multiply(lambda.precision(prec));
                // lambda carries 8 units of rounding at digits + 20
                double radius = Math.log10(Math.pow(10, r.log10Radius() - PreciseValue.log10Abs(r.value()))
                        + 8 * Math.pow(10, -(digits + 20.0))) + PreciseValue.log10Abs(r.value()) + logLambda;
                out.add(new CertifiedRoot(v, radius, r.multiplicity(), r.simpleProved()));
            }
        }
        return out;
    }

    /** A product A B of two polynomial values with its derivative and error logs. */
    private static final class Part<T> {
        final T value;
        final T derivative;
        final double logAbsValue;
        final double logErrValue;
        final double logErrDerivative;

        private Part(T value, T derivative, double logAbsValue, double logErrValue, double logErrDerivative) {
            this.value = value;
            this.derivative = derivative;
            this.logAbsValue = logAbsValue;
            this.logErrValue = logErrValue;
            this.logErrDerivative = logErrDerivative;
        }

        static <T> Part<T> product(AnalyticArithmetic<T> ar, NumericPolynomial.Evaluation<T> x,
                                   NumericPolynomial.Evaluation<T> y, double u) {
            T v = ar.multiply(x.value(), y.value());
            T d = ar.add(ar.multiply(x.derivative(), y.value()), ar.multiply(x.value(), y.derivative()));
            double lx = ar.logAbs(x.value());
            double ly = ar.logAbs(y.value());
            double ldx = ar.logAbs(x.derivative());
            double ldy = ar.logAbs(y.derivative());
            // |x| e_y + |y| e_x + e_x e_y + u |x y|
            double errV = Conversions.logAdd(Conversions.logAdd(lx + y.logErrorValue(), ly + x.logErrorValue()),
                    Conversions.logAdd(x.logErrorValue() + y.logErrorValue(), Math.log(u) + lx + ly));
            double errD = Conversions.logAdd(
                    Conversions.logAdd(ldx + y.logErrorValue(), ly + x.logErrorDerivative()),
                    Conversions.logAdd(lx + y.logErrorDerivative(), ldy + x.logErrorValue()));
            errD = Conversions.logAdd(errD, Math.log(2 * u) + Conversions.logAdd(ldx + ly, lx + ldy));
            return new Part<>(v, d, lx + ly, errV, errD);
        }
    }
}
