package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.fraction.BigFraction;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Bessel-type solutions (NIST DLMF §32.10(iv)) against Apfloat's 0F1 and Bessel functions, the equation's
 * residual at high precision, and the engine.
 */
class BesselTypeSolutionTest {
    private static final int DIGITS = 40;
    private static final GaussianRational A = GaussianRational.of(new BigFraction(1), new BigFraction(0));
    private static final GaussianRational B = GaussianRational.of(new BigFraction(7, 10), new BigFraction(1, 5));

    private static BesselTypeSolution seed(String alpha, String beta) {
        return BesselTypeSolution.of(ExactParameters.parse(alpha, beta, "1", "-1"), A, B);
    }

    /**
     * Non-integer order: u = A z^(2nu) 0F1(;1+nu;x) + B 0F1(;1-nu;x), x = -a c z^2/4, by Apfloat's
     * hypergeometric0F1 (d/dx 0F1(;b;x) = 0F1(;b+1;x)/b, DLMF 16.3.1), on several sheets.
     */
    @Test
    void nonIntegerOrderAgreesWithApfloat0F1OnSeveralSheets() {
        // alpha = 1.3, beta = 0.7 (a = c = 1: b = 0.3, nu = 0.65); alpha = 0.6 + 0.2i
        for (String[] ab : new String[][] {{"13/10", "7/10"}, {"3/5+1/5i", "7/5-1/5i"}}) {
            BesselTypeSolution s = seed(ab[0], ab[1]);
            for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(-2, 1, 1), SurfacePoint.of(-0.7, -1.1, -1),
                SurfacePoint.of(3, -2, 2)}) {
                Apcomplex[] ref = hypergeometricReference(s, p);
                PreciseValue v = s.evaluate(p, DIGITS);
                assertAgrees(ref[0], v.w(), v.log10ErrorW(), "w at " + p);
                assertAgrees(ref[1], v.dw(), v.log10ErrorDw(), "w' at " + p);
                assertTrue(v.correctDigitsW() >= DIGITS, "digits " + v.correctDigitsW());
            }
        }
    }

    /**
     * Integer order against mpmath's Bessel J and Y (resource special/bessel-type-integer-order.csv, from
     * tools/reference/bessel_type_reference.py, command in its header): the member through the reference value
     * at the first point (A : B solved from the basis there) must reproduce the reference at the others.
     */
    @Test
    void integerOrderAgreesWithMpmathBesselFunctions() throws IOException {
        Map<Integer, List<String[]>> rows = new TreeMap<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                getClass().getResourceAsStream("/special/bessel-type-integer-order.csv"),
                StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.startsWith("#") && !line.isBlank()) {
                    String[] f = line.split(",");
                    rows.computeIfAbsent(Integer.parseInt(f[0]), k -> new ArrayList<>()).add(f);
                }
            }
        }
        assertEquals(4, rows.size());
        for (Map.Entry<Integer, List<String[]>> e : rows.entrySet()) {
            int nu = e.getKey();
            ExactParameters p = ExactParameters.of(2L * nu, 2 - 2L * nu, 1, -1);
            String[] first = e.getValue().get(0);
            SurfacePoint p0 = SurfacePoint.of(Double.parseDouble(first[1]), Double.parseDouble(first[2]));
            GaussianRational[] ab = throughValue(nu, p0, first[3], first[4]);
            BesselTypeSolution s = BesselTypeSolution.of(p, BesselTypeSolution.families(p).get(0), ab[0], ab[1]);
            for (String[] row : e.getValue().subList(1, e.getValue().size())) {
                SurfacePoint q = SurfacePoint.of(Double.parseDouble(row[1]), Double.parseDouble(row[2]));
                PreciseValue v = s.evaluate(q, DIGITS);
                Apcomplex ref = new Apcomplex(new Apfloat(row[3], 50), new Apfloat(row[4], 50));
                // the reference carries 45 significant digits: allow 10^-44 relative besides the estimate
                assertAgrees(ref, v.w(), v.log10ErrorW(), 39, "w at " + q + " for nu = " + nu);
            }
        }
    }

    /** A : B of u = A U1 + B U2 (a = c = 1) with -u'/u = w0 at p0: A = U2' + w0 U2, B = -(U1' + w0 U1). */
    private static GaussianRational[] throughValue(int nu, SurfacePoint p0, String re, String im) {
        MpArithmetic ar = new MpArithmetic(80);
        MpComplex z = ar.of(p0.re(), p0.im());
        List<Tracked<MpComplex>> basis = RiccatiSeries.basis(ar, ar.one(),
                GaussianRational.of(nu, 0), z, ar.log(z));
        MpComplex w0 = ar.context().fromApcomplex(new Apcomplex(new Apfloat(re, 50),
                new Apfloat(im, 50)));
        MpComplex a = ar.add(basis.get(1).derivative, ar.multiply(w0, basis.get(1).value));
        MpComplex b = ar.negate(ar.add(basis.get(0).derivative, ar.multiply(w0,
                basis.get(0).value)));
        return new GaussianRational[] {rational(ar.context().toApcomplex(a)), rational(ar.context().toApcomplex(b))};
    }

    private static GaussianRational rational(Apcomplex x) {
        return GaussianRational.of(new BigFraction(new BigDecimal(x.real().toString(true))
                .unscaledValue(), BigInteger.TEN.pow(Math.max(0, new BigDecimal(
                x.real().toString(true)).scale()))), new BigFraction(new BigDecimal(x.imag().toString(true))
                .unscaledValue(), BigInteger.TEN.pow(Math.max(0, new BigDecimal(
                x.imag().toString(true)).scale()))));
    }

    /**
     * Integer orders 0, 1, 2, -1 against Apfloat's besselJ and besselY (DLMF 10.2.2-3): the same one-parameter
     * family as u = z^nu (C1 J_nu(kz) + C2 Y_nu(kz)), k = sqrt(a c); C1 : C2 fixed by w at one point, then compared
     * at others (principal sheet, away from the cut of Y). Slow: Apfloat's Bessel Y takes about a second a value.
     */
    @Test
    @Tag("slow")
    void integerOrdersAgreeWithApfloatBesselFunctionsAtMorePoints() {
        for (String alpha : new String[] {"0", "2", "4", "-2"}) {
            integerOrderCase(alpha, new SurfacePoint[] {SurfacePoint.of(2.5, -1), SurfacePoint.of(0.3, 2),
                SurfacePoint.of(-1.5, 0.8)}, DIGITS);
        }
    }

    /** nu = alpha/2 with beta = 2 - alpha (a = c = 1). */
    private static void integerOrderCase(String alpha, SurfacePoint[] points, int digits) {
        String beta = String.valueOf(2 - Integer.parseInt(alpha));
        BesselTypeSolution s = seed(alpha, beta);
        assertTrue(Conversions.isInteger(s.order()));
        SurfacePoint p0 = SurfacePoint.of(1.1, 0.4);
        PreciseValue v0 = s.evaluate(p0, digits);
        BesselReference ref = new BesselReference(s.order().re().doubleValue(), v0.w(), p0, digits + 10);
        for (SurfacePoint p : points) {
            PreciseValue v = s.evaluate(p, digits);
            assertAgrees(ref.w(p), v.w(), v.log10ErrorW(), digits, "w at " + p + " for alpha = " + alpha);
        }
    }

    @Test
    void residualVanishesIncludingBacklundStepsAndRescaling() {
        List<BesselTypeSolution> cases = List.of(seed("13/10", "7/10"), seed("2", "0"), seed("0", "2"),
                // alpha + beta = 6: one step of T1 from the seed
                seed("17/5", "13/5"),
                // alpha + beta = 10 with a complex part: two steps
                seed("5+1/3i", "5-1/3i"),
                // gamma = 4, delta = -9 (a = 2, c = 3): alpha/2 + beta/3 = 2
                BesselTypeSolution.of(ExactParameters.parse("1", "9/2", "4", "-9"), A, B));
        assertEquals(1, cases.get(3).steps());
        assertEquals(2, cases.get(4).steps());
        for (BesselTypeSolution s : cases) {
            for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(0.8, 0.3), SurfacePoint.of(-1.4, 0.9, 1)}) {
                double r = Residuals.relativeResidual(s, p, 80);
                assertTrue(r < 1e-40, "residual " + r + " at " + p + " of " + s.description());
            }
        }
    }

    @Test
    void engineStartedFromTheValuesAgrees() {
        for (BesselTypeSolution s : new BesselTypeSolution[] {seed("13/10", "7/10"), seed("17/5", "13/5"),
            seed("2", "0")}) {
            SurfacePoint z0 = SurfacePoint.of(1, 0.2);
            Painleve3Value v0 = s.evaluate(z0);
            Painleve3Solution e = Painleve3Solution.builder(s.equation()).start(z0.z(), v0.w(), v0.dw()).build();
            for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(2.5, 1.5), SurfacePoint.of(-2, 1),
                SurfacePoint.of(0.5, -1.5)}) {
                Painleve3Value a = e.evaluate(p);
                Painleve3Value b = s.evaluate(p);
                double d = a.w().subtract(b.w()).norm();
                assertTrue(d <= a.errW() + b.errW(), "w at " + p + ": " + d + " vs " + a.errW() + " " + s.description());
                assertTrue(b.errW() <= 1e-12 * (1 + b.w().norm()), "estimate " + b);
            }
        }
    }

    @Test
    void parametersWithoutBesselSolutionsAreRefusedWithTheCondition() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> seed("1/3", "1/5"));
        assertTrue(e.getMessage().contains("4n + 2"), e.getMessage());
        e = assertThrows(InvalidInputException.class,
                () -> BesselTypeSolution.of(ExactParameters.parse("1", "2", "0", "-1"), A, B));
        assertTrue(e.getMessage().contains("gamma delta != 0"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> BesselTypeSolution.of(ExactParameters.parse("1", "1", "1",
                "-1"), GaussianRational.ZERO, GaussianRational.ZERO));
        assertTrue(e.getMessage().contains("both be zero"), e.getMessage());
    }

    private static void assertAgrees(Apcomplex ref, Apcomplex value, double log10Error, String what) {
        assertAgrees(ref, value, log10Error, DIGITS, what);
    }

    private static void assertAgrees(Apcomplex ref, Apcomplex value, double log10Error, int digits, String what) {
        double d = PreciseValue.log10Abs(ref.subtract(value));
        // the reference itself carries digits + 10 (integer order) or digits + 20 digits
        double allowed = Math.max(log10Error, PreciseValue.log10Abs(ref) - digits - 5);
        assertTrue(d <= allowed + 0.3, what + ": |difference| 1e" + d + " above the estimate 1e" + log10Error);
    }

    /** w, w' from Apfloat's 0F1 for u = A z^(2nu) 0F1(;1+nu;x) + B 0F1(;1-nu;x) (a = c = 1 here). */
    private static Apcomplex[] hypergeometricReference(BesselTypeSolution s, SurfacePoint p) {
        long prec = DIGITS + 20;
        FixedPrecisionApcomplexHelper h = new FixedPrecisionApcomplexHelper(prec);
        Apcomplex z = new Apcomplex(new Apfloat(new BigDecimal(p.re()), prec),
                new Apfloat(new BigDecimal(p.im()), prec));
        Apcomplex nu = h.valueOf(new Apcomplex(new Apfloat(s.order().re().bigDecimalValue((int) prec + 5,
                RoundingMode.HALF_EVEN), prec), new Apfloat(s.order().im().bigDecimalValue((int) prec + 5,
                RoundingMode.HALF_EVEN), prec)));
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex two = h.valueOf(new Apcomplex(new Apfloat(2, prec)));
        Apcomplex x = h.divide(h.negate(h.multiply(z, z)), h.valueOf(new Apcomplex(new Apfloat(4, prec))));
        Apcomplex dx = h.divide(h.negate(z), two);
        Apcomplex b1 = h.add(one, nu);
        Apcomplex b2 = h.subtract(one, nu);
        Apcomplex f1 = ApcomplexMath.hypergeometric0F1(b1, x);
        Apcomplex f1p = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b1, one), x), b1);
        Apcomplex f2 = ApcomplexMath.hypergeometric0F1(b2, x);
        Apcomplex f2p = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b2, one), x), b2);
        Apfloat twoPiK = new Apfloat(2L * p.sheet(), prec).multiply(ApfloatMath.pi(prec));
        Apcomplex logz = h.add(h.log(z), new Apcomplex(Apfloat.ZERO, twoPiK));
        Apcomplex zp = h.exp(h.multiply(h.multiply(two, nu), logz));
        Apcomplex a = h.valueOf(new Apcomplex(new Apfloat(A.re().doubleValue(), prec)));
        Apcomplex bb = h.valueOf(new Apcomplex(new Apfloat(new BigDecimal("0.7"), prec),
                new Apfloat(new BigDecimal("0.2"), prec)));
        Apcomplex u = h.add(h.multiply(a, h.multiply(zp, f1)), h.multiply(bb, f2));
        Apcomplex du = h.add(h.multiply(a, h.add(h.multiply(h.divide(h.multiply(two, nu), z), h.multiply(zp, f1)),
                h.multiply(zp, h.multiply(f1p, dx)))), h.multiply(bb, h.multiply(f2p, dx)));
        Apcomplex w = h.negate(h.divide(du, u));
        // z w' = z w^2 + (2 nu - 1) w + z
        Apcomplex bcoef = h.subtract(h.multiply(two, nu), one);
        Apcomplex dw = h.divide(h.add(h.add(h.multiply(z, h.multiply(w, w)), h.multiply(bcoef, w)), z), z);
        return new Apcomplex[] {w, dw};
    }

    /** w = -u'/u for u = z^nu (C1 J_nu(z) + C2 Y_nu(z)) (a = c = 1, k = 1), C1 : C2 matched to w(p0). */
    private static final class BesselReference {
        private final FixedPrecisionApcomplexHelper h;
        private final Apcomplex nu;
        private final Apcomplex c1;
        private final Apcomplex c2;

        BesselReference(double order, Apcomplex w0, SurfacePoint p0, long prec) {
            this.h = new FixedPrecisionApcomplexHelper(prec);
            this.nu = h.valueOf(new Apcomplex(new Apfloat((long) order, prec)));
            Apcomplex[] f = basis(p0);
            // -(C1 f1' + C2 f2') / (C1 f1 + C2 f2) = w0  =>  C1 (f1' + w0 f1) + C2 (f2' + w0 f2) = 0
            Apcomplex w = h.valueOf(w0);
            this.c1 = h.add(f[3], h.multiply(w, f[2]));
            this.c2 = h.negate(h.add(f[1], h.multiply(w, f[0])));
        }

        /** {f1, f1', f2, f2'} with f1 = z^nu J_nu(z), f2 = z^nu Y_nu(z); (z^nu C_nu)' = z^nu C_{nu-1} (DLMF 10.6.6). */
        private Apcomplex[] basis(SurfacePoint p) {
            long prec = h.precision();
            Apcomplex z = h.valueOf(new Apcomplex(new Apfloat(new BigDecimal(p.re()), prec),
                    new Apfloat(new BigDecimal(p.im()), prec)));
            Apcomplex zn = h.pow(z, nu);
            Apcomplex nm1 = h.subtract(nu, h.valueOf(Apcomplex.ONE));
            Apcomplex j = ApcomplexMath.besselJ(nu, z);
            Apcomplex jm = ApcomplexMath.besselJ(nm1, z);
            Apcomplex y = ApcomplexMath.besselY(nu, z);
            Apcomplex ym = ApcomplexMath.besselY(nm1, z);
            return new Apcomplex[] {h.multiply(zn, j), h.multiply(zn, jm), h.multiply(zn, y), h.multiply(zn, ym)};
        }

        Apcomplex w(SurfacePoint p) {
            Apcomplex[] f = basis(p);
            Apcomplex u = h.add(h.multiply(c1, f[0]), h.multiply(c2, f[2]));
            Apcomplex du = h.add(h.multiply(c1, f[1]), h.multiply(c2, f[3]));
            return h.negate(h.divide(du, u));
        }
    }

}
