package org.tertius.core.pade;

import java.util.Arrays;
import org.tertius.core.number.ComplexPairs;

/**
 * A rational function p(s)/q(s) with complex coefficients, q(0) = 1. Immutable; evaluation allocates
 * nothing.
 */
public final class PadeApproximant {
    private final double[] pRe;
    private final double[] pIm;
    private final double[] qRe;
    private final double[] qIm;
    /** The significant tail of the defect, from index {@link #dStart} on. */
    private final double[] dRe;
    private final double[] dIm;
    private final int dStart;
    /** Moduli of the coefficients (for the rounding bound). */
    private final double[] pAbs;
    private final double[] qAbs;
    /** Sum of |d_k| below dStart (bounds their contribution for |s| &lt;= 1). */
    private final double dHead;

    PadeApproximant(double[] pRe, double[] pIm, double[] qRe, double[] qIm, double[] dRe, double[] dIm) {
        this.pRe = pRe;
        this.pIm = pIm;
        this.qRe = qRe;
        this.qIm = qIm;
        this.pAbs = moduli(pRe, pIm);
        this.qAbs = moduli(qRe, qIm);
        // keep the defect's significant tail (its leading coefficients are rounding-level where the approximant
        // matches the series) and bound the head by the sum of its moduli
        double max = 0;
        for (int k = 0; k < dRe.length; k++) {
            max = Math.max(max, Math.abs(dRe[k]) + Math.abs(dIm[k]));
        }
        int start = 0;
        double head = 0;
        while (start < dRe.length - 1 && Math.abs(dRe[start]) + Math.abs(dIm[start]) < 1e-3 * max) {
            head += ComplexPairs.abs(dRe[start], dIm[start]);
            start++;
        }
        this.dStart = start;
        this.dHead = head;
        this.dRe = Arrays.copyOfRange(dRe, start, dRe.length);
        this.dIm = Arrays.copyOfRange(dIm, start, dIm.length);
    }

    private static double[] moduli(double[] re, double[] im) {
        double[] m = new double[re.length];
        for (int k = 0; k < re.length; k++) {
            m[k] = ComplexPairs.abs(re[k], im[k]);
        }
        return m;
    }

    /** Numerator degree. */
    public int numeratorDegree() {
        return pRe.length - 1;
    }

    /** Denominator degree. */
    public int denominatorDegree() {
        return qRe.length - 1;
    }

    /**
     * Evaluates at s; writes {re, im} of p(s)/q(s) into out[0..1], |q(s)| into out[2] (small next to a pole),
     * and into out[3] the defect estimate |D(s)| / |q(s)|, where D = q f - p is formed with all the Taylor
     * coefficients that were available (not only those the degrees used). After a degree reduction D is the
     * part of the known series that the approximant does not reproduce; without one it holds rounding only.
     * If {@code out} has a fifth slot, out[4] receives a bound of the rounding error of the evaluation itself.
     */
    public void evaluate(double sr, double si, double[] out) {
        double sm = ComplexPairs.abs(sr, si);
        double nr = 0;
        double ni = 0;
        for (int k = pRe.length - 1; k >= 0; k--) {
            double t = nr * sr - ni * si + pRe[k];
            ni = nr * si + ni * sr + pIm[k];
            nr = t;
        }
        double dr = 0;
        double di = 0;
        for (int k = qRe.length - 1; k >= 0; k--) {
            double t = dr * sr - di * si + qRe[k];
            di = dr * si + di * sr + qIm[k];
            dr = t;
        }
        double d = dr * dr + di * di;
        out[0] = (nr * dr + ni * di) / d;
        out[1] = (ni * dr - nr * di) / d;
        out[2] = Math.sqrt(d);
        double er = 0;
        double ei = 0;
        for (int k = dRe.length - 1; k >= 0; k--) {
            double t = er * sr - ei * si + dRe[k];
            ei = er * si + ei * sr + dIm[k];
            er = t;
        }
        double big = Math.max(1, sm);
        out[3] = (ComplexPairs.abs(er, ei) * Math.pow(sm, dStart) + dHead * Math.pow(big, dStart))
                / out[2];
        // rounding of the two Horner sums (a standard bound, about 2 deg ulps of the sum of |terms|), divided
        // through: large next to a pole, where |q(s)| is small against its terms
        if (out.length > 4) {
            double na = 0;
            for (int k = pAbs.length - 1; k >= 0; k--) {
                na = na * sm + pAbs[k];
            }
            double da = 0;
            for (int k = qAbs.length - 1; k >= 0; k--) {
                da = da * sm + qAbs[k];
            }
            double u = Math.ulp(1.0);
            double pm = ComplexPairs.abs(nr, ni);
            double ep = 2 * pRe.length * u * na;
            double eq = 2 * qRe.length * u * da;
            out[4] = (ep + eq * pm / out[2]) / out[2];
        }
    }

    /** Denominator coefficients (real parts), lowest degree first; a copy. */
    public double[] denominatorRe() {
        return qRe.clone();
    }

    /** Denominator coefficients (imaginary parts), lowest degree first; a copy. */
    public double[] denominatorIm() {
        return qIm.clone();
    }

    /** Numerator coefficients (real parts); a copy. */
    public double[] numeratorRe() {
        return pRe.clone();
    }

    /** Numerator coefficients (imaginary parts); a copy. */
    public double[] numeratorIm() {
        return pIm.clone();
    }

    /** Bytes held by this approximant (for memory accounting). */
    public long footprint() {
        return 16L * (pRe.length + qRe.length + dRe.length) + 96;
    }
}
