package org.tertius.connection.special;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;

/**
 * All roots of a Gaussian-integer polynomial to a requested number of digits, each with a disk proved to contain
 * exactly the roots counted for it.
 *
 * <p>Method. The root x = 0 is split off exactly (vanishing low coefficients). For the rest, P of degree d,
 * approximations z_1..z_d come from the {@link AberthIteration} (double precision first, then Apfloat at the
 * working precision). Certification: with W_i = P(z_i) / (lc prod_{j != i} (z_i - z_j)) (Weierstrass
 * corrections), Lagrange interpolation at the z_i gives P(x) = lc [prod_j (x - z_j)] [1 + sum_i W_i/(x - z_i)],
 * so the roots of P are the eigenvalues of diag(z_i) - W 1^T; Gerschgorin's theorem (rows) puts them in the
 * disks |x - z_i + W_i| &lt;= (d-1)|W_i|, hence in the disks |x - z_i| &lt;= d |W_i|, and a connected union of m of
 * these disks contains exactly m roots counted with multiplicity (Gerschgorin's continuity argument; the
 * inclusion is that of D. Braess and K. P. Hadeler, Numer. Math. 21 (1973) 161). |P(z_i)| is bounded above by
 * the computed value plus the Horner rounding bound of {@link NumericPolynomial}; the product and the radius get
 * a relative allowance of 4 d u + 1e-9. Disjoint disks thus certify one root each; the count of all roots is
 * the exact degree. Whether the roots are simple is proved separately, exactly ({@link PolynomialProofs}).
 */
public final class RootIsolation {
    /** Largest number of digits accepted. */
    public static final int MAX_DIGITS = 10000;

    private RootIsolation() {
    }

    /**
     * The roots of p divided by {@code divisor} (a positive integer: the roots of T_n(x) = q^d S_n(x/q) give those
     * of S_n), to {@code digits} significant digits.
     *
     * @throws InvalidInputException if digits is outside [1, {@link #MAX_DIGITS}] or p is zero
     */
    public static List<CertifiedRoot> roots(GaussianPolynomial p, BigInteger divisor, int digits) {
        if (digits < 1 || digits > MAX_DIGITS) {
            throw new InvalidInputException("digits", "must be in [1, " + MAX_DIGITS + "], got " + digits);
        }
        if (p.isZero()) {
            throw new InvalidInputException("polynomial", "the zero polynomial has no isolated roots");
        }
        List<CertifiedRoot> out = new ArrayList<>();
        int zeros = p.zeroRootMultiplicity();
        GaussianPolynomial rest = p.divideByPowerOfX(zeros);
        if (zeros > 0) {
            out.add(new CertifiedRoot(Apcomplex.ZERO, Double.NEGATIVE_INFINITY, zeros, zeros == 1));
        }
        if (rest.degree() >= 1) {
            out.addAll(isolate(rest, digits, PolynomialProofs.provedSquareFree(rest)));
        }
        if (divisor.equals(BigInteger.ONE)) {
            return out;
        }
        List<CertifiedRoot> scaled = new ArrayList<>(out.size());
        double lg = Math.log10(divisor.doubleValue());
        for (CertifiedRoot r : out) {
            long prec = r.value().precision() == Apfloat.INFINITE ? digits + 10 : r.value().precision();
            Apcomplex v = r.value().divide(new Apcomplex(new Apfloat(divisor, prec)));
            scaled.add(new CertifiedRoot(v, r.log10Radius() - lg, r.multiplicity(), r.simpleProved()));
        }
        return scaled;
    }

    private static List<CertifiedRoot> isolate(GaussianPolynomial p, int digits, boolean squareFree) {
        int d = p.degree();
        ComplexArithmetic dbl = ComplexArithmetic.INSTANCE;
        // approximations in double precision on p(R y) (no overflow near the roots), then scaled back
        NumericPolynomial.Scaled scaled = NumericPolynomial.scaledDouble(p);
        NumericPolynomial<Complex> pd = scaled.polynomial();
        List<Complex> start = null;
        if (pd.finite() && Double.isFinite(scaled.scale()) && scaled.scale() > 0) {
            start = AberthIteration.circle(pd);
            AberthIteration.iterate(pd, start, 1e-14, 400, 40);
            for (int i = 0; i < start.size(); i++) {
                Complex c = start.get(i).multiply(scaled.scale());
                if (c.isNaN() || c.isInfinite()) {
                    start = null;
                    break;
                }
                start.set(i, c);
            }
        }
        long precision = digits + 15L + Math.max(0, p.maxCoefficientDigits() / 4);
        MpArithmetic mp = new MpArithmetic(Math.min(100000, precision));
        List<MpComplex> z;
        if (start != null) {
            z = AberthIteration.convert(dbl, start, mp);
        } else {
            z = AberthIteration.circle(new NumericPolynomial<>(mp, p, BigInteger.ONE));
        }
        long cap = 4L * digits + 200 + p.maxCoefficientDigits();
        boolean newtonFirst = start != null;
        while (true) {
            NumericPolynomial<MpComplex> pa = new NumericPolynomial<>(mp, p, BigInteger.ONE);
            double tolerance = Math.pow(10, -(mp.digits() - 5));
            List<CertifiedRoot> roots = null;
            if (newtonFirst) {
                // cheap refinement of good approximations (no pairwise sums); certification decides
                List<MpComplex> trial = new ArrayList<>(z);
                AberthIteration.newton(pa, trial, tolerance, 60);
                List<CertifiedRoot> candidate = components(mp, trial, radii(pa, trial), squareFree);
                if (candidate.size() == d) {
                    z = trial;
                    roots = candidate;
                }
            }
            if (roots == null) {
                AberthIteration.iterate(pa, z, tolerance, 200, 6);
                roots = components(mp, z, radii(pa, z), squareFree);
            }
            boolean accurate = roots.size() == d;
            for (CertifiedRoot r : roots) {
                accurate &= r.correctDigits() >= digits;
            }
            // genuinely multiple roots never separate: without a proof of simplicity stop at half the cap
            long limit = squareFree ? cap : cap / 2;
            if (accurate || precision >= limit) {
                return roots;
            }
            precision = Math.min(cap, 2 * precision);
            MpArithmetic wider = new MpArithmetic(Math.min(100000, precision));
            z = AberthIteration.convert(mp, z, wider);
            mp = wider;
        }
    }

    /** Natural logs of the Gerschgorin radii d |W_i| (bounds, see the class comment). */
    static <T> double[] radii(NumericPolynomial<T> p, List<T> z) {
        AnalyticArithmetic<T> ar = p.arithmetic();
        int d = z.size();
        double u = ar.epsilon();
        double logLc = p.logAbsCoefficient(d);
        double[] out = new double[d];
        for (int i = 0; i < d; i++) {
            NumericPolynomial.Evaluation<T> e = p.evaluate(z.get(i));
            double logP = Conversions.logAdd(ar.logAbs(e.value()), e.logErrorValue());
            double logProduct = 0;
            for (int j = 0; j < d; j++) {
                if (j != i) {
                    logProduct += ar.logAbs(ar.subtract(z.get(i), z.get(j)));
                }
            }
            out[i] = Math.log(d) + logP - logLc - logProduct + Math.log1p(4 * d * u + 1e-9);
        }
        return out;
    }

    /** Groups overlapping disks; a group of m disks is one entry of multiplicity m (m roots counted). */
    private static List<CertifiedRoot> components(MpArithmetic ap, List<MpComplex> z, double[] logRadius,
                                                  boolean squareFree) {
        int d = z.size();
        int[] parent = new int[d];
        for (int i = 0; i < d; i++) {
            parent[i] = i;
        }
        for (int i = 0; i < d; i++) {
            for (int j = i + 1; j < d; j++) {
                double logDistance = ap.logAbs(ap.subtract(z.get(i), z.get(j)));
                double logSum = Conversions.logAdd(logRadius[i], logRadius[j]);
                if (!(logSum < logDistance + Math.log1p(-1e-6))) {
                    parent[find(parent, i)] = find(parent, j);
                }
            }
        }
        List<CertifiedRoot> out = new ArrayList<>();
        double ln10 = Math.log(10);
        for (int i = 0; i < d; i++) {
            if (find(parent, i) != i) {
                continue;
            }
            List<Integer> members = new ArrayList<>();
            for (int j = 0; j < d; j++) {
                if (find(parent, j) == i) {
                    members.add(j);
                }
            }
            if (members.size() == 1) {
                out.add(new CertifiedRoot(ap.context().toApcomplex(z.get(i)), logRadius[i] / ln10, 1, squareFree));
                continue;
            }
            // a cluster: its center is the mean, its radius reaches every member disk
            MpComplex center = ap.zero();
            for (int j : members) {
                center = ap.add(center, z.get(j));
            }
            center = ap.divide(center, ap.of(members.size()));
            double logR = Double.NEGATIVE_INFINITY;
            for (int j : members) {
                double reach = Conversions.logAdd(ap.logAbs(ap.subtract(center, z.get(j))), logRadius[j]);
                logR = Math.max(logR, reach);
            }
            out.add(new CertifiedRoot(ap.context().toApcomplex(center), (logR + Math.log1p(1e-9)) / ln10, members.size(), false));
        }
        return out;
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }
}
