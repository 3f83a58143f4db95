package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.hipparchus.fraction.BigFraction;
import org.junit.jupiter.api.Test;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Certified roots of the special polynomials against an independent high-precision root finder: mpmath's
 * polyroots on polynomials generated in Python fractions (resource special/special-polynomial-roots.csv, made by
 * tools/reference/special_roots_reference.py, command in its header). Cases: S_3(1/3), S_5(1/2 + i/3), S_4(2)
 * (a triple root at 0) and S_11(1/3) (degree 66).
 */
class RootIsolationTest {
    private static final int DIGITS = 45;

    @Test
    void rootsAgreeWithTheReferenceWithinTheirDisksAndTheCountIsTheDegree() throws IOException {
        Map<String, List<Apcomplex>> cases = reference();
        assertEquals(4, cases.size());
        for (Map.Entry<String, List<Apcomplex>> c : cases.entrySet()) {
            String[] key = c.getKey().split(",");
            int n = Integer.parseInt(key[0]);
            GaussianRational mu = GaussianRational.of(fraction(key[1]), fraction(key[2]));
            SpecialPolynomial s = SpecialPolynomials.of(n, mu);
            List<CertifiedRoot> roots = RootIsolation.roots(s.scaled(), s.scale(), DIGITS);
            int count = 0;
            for (CertifiedRoot r : roots) {
                count += r.multiplicity();
            }
            assertEquals(s.degree(), count, "root count of S_" + n + "(" + mu + ")");
            assertEquals(c.getValue().size(), s.degree(), "reference count");
            List<CertifiedRoot> unused = new ArrayList<>(roots);
            for (Apcomplex ref : c.getValue()) {
                CertifiedRoot hit = null;
                for (CertifiedRoot r : unused) {
                    double distance = PreciseValue.log10Abs(ref.subtract(r.value()));
                    // the reference carries 50 digits; the disk must reach it up to that
                    double allowed = Math.max(r.log10Radius(), -48 + Math.max(0, PreciseValue.log10Abs(ref)));
                    if (distance <= allowed + 1e-9) {
                        hit = r;
                        break;
                    }
                }
                assertTrue(hit != null, "no certified root of S_" + n + "(" + mu + ") near " + ref);
                if (hit.multiplicity() == 1) {
                    unused.remove(hit);
                    assertTrue(hit.correctDigits() >= DIGITS, "digits " + hit.correctDigits() + " at " + hit);
                    assertTrue(hit.simpleProved(), "simplicity not proved at " + hit);
                }
            }
        }
    }

    @Test
    void aTripleRootAtZeroIsExactAndCounted() {
        SpecialPolynomial s = SpecialPolynomials.of(4, SpecialPolynomials.mu(2, 1));
        List<CertifiedRoot> roots = RootIsolation.roots(s.scaled(), s.scale(), 20);
        CertifiedRoot zero = roots.get(0);
        assertEquals(3, zero.multiplicity());
        assertEquals(Double.NEGATIVE_INFINITY, zero.log10Radius());
        assertEquals(8, roots.size());
    }

    private static BigFraction fraction(String s) {
        String[] p = s.split("/");
        return p.length == 1 ? new BigFraction(Long.parseLong(p[0]))
                : new BigFraction(Long.parseLong(p[0]), Long.parseLong(p[1]));
    }

    private static Map<String, List<Apcomplex>> reference() throws IOException {
        Map<String, List<Apcomplex>> out = new LinkedHashMap<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                RootIsolationTest.class.getResourceAsStream("/special/special-polynomial-roots.csv"),
                StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                String[] f = line.split(",");
                String key = f[0] + "," + f[1] + "," + f[2];
                Apcomplex v = new Apcomplex(new Apfloat(f[3], 60), new Apfloat(f[4], 60));
                out.computeIfAbsent(key, k -> new ArrayList<>()).add(v);
            }
        }
        return out;
    }

    static double log10Distance(Apcomplex a, Apcomplex b) {
        return Math.log10(ApcomplexMath.abs(a.subtract(b)).doubleValue());
    }
}
