package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Kronecker-substitution products and exact quotients of Gaussian-integer polynomials against the schoolbook
 * algorithms (property test, fixed seed).
 */
class KroneckerTest {
    private static final long SEED = 20240916L;

    @Test
    void productsAndQuotientsAgreeWithTheSchoolbookOnes() {
        qt().withFixedSeed(SEED).withExamples(20)
                .forAll(integers().between(Kronecker.THRESHOLD, 70), integers().between(Kronecker.THRESHOLD, 50),
                        integers().between(1, 200), longs().all())
                .checkAssert((na, nb, bits, seed) -> {
                    Random r = new Random(seed);
                    boolean real = r.nextBoolean();
                    GaussianPolynomial a = random(r, na, bits, real, false);
                    GaussianPolynomial b = random(r, nb, bits, real, true);
                    GaussianPolynomial product = a.multiply(b);
                    assertEquals(schoolbook(a, b), product);
                    assertEquals(a, product.divideExactly(b));
                });
    }

    private static GaussianPolynomial random(Random r, int n, int bits, boolean real, boolean monic) {
        BigInteger[] re = new BigInteger[n];
        BigInteger[] im = new BigInteger[n];
        for (int k = 0; k < n; k++) {
            re[k] = new BigInteger(bits, r).subtract(BigInteger.ONE.shiftLeft(bits - 1));
            im[k] = real ? BigInteger.ZERO : new BigInteger(bits, r).subtract(BigInteger.ONE.shiftLeft(bits - 1));
        }
        if (monic) {
            re[n - 1] = BigInteger.ONE;
            im[n - 1] = BigInteger.ZERO;
        } else if (re[n - 1].signum() == 0 && im[n - 1].signum() == 0) {
            re[n - 1] = BigInteger.TWO;
        }
        return GaussianPolynomial.of(re, im);
    }

    private static GaussianPolynomial schoolbook(GaussianPolynomial a, GaussianPolynomial b) {
        int n = a.degree() + b.degree() + 1;
        BigInteger[] re = new BigInteger[n];
        BigInteger[] im = new BigInteger[n];
        Arrays.fill(re, BigInteger.ZERO);
        Arrays.fill(im, BigInteger.ZERO);
        for (int i = 0; i <= a.degree(); i++) {
            for (int j = 0; j <= b.degree(); j++) {
                re[i + j] = re[i + j].add(a.re(i).multiply(b.re(j))).subtract(a.im(i).multiply(b.im(j)));
                im[i + j] = im[i + j].add(a.re(i).multiply(b.im(j))).add(a.im(i).multiply(b.re(j)));
            }
        }
        return GaussianPolynomial.of(re, im);
    }
}
