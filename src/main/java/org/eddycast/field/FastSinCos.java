package org.eddycast.field;

import java.math.BigDecimal;

/**
 * Sine and cosine of many phases at once, for the particle kernel.
 *
 * <p>Method: Cody-Waite range reduction by pi/2 with a two-part constant (Cody and Waite 1980, Software
 * Manual for the Elementary Functions, Prentice-Hall, ch. 8), then the Taylor polynomials of sine (to degree
 * 15) and cosine (to degree 16) on the reduced interval [-pi/4, pi/4], where the first omitted terms are below
 * 5e-17, and a quadrant swap. The whole is branch-free apart from the loop so the compiler can keep it in
 * registers.
 *
 * <p>Accuracy: within 2e-15 absolute of {@link Math#sin} and {@link Math#cos} for |phase| up to 1e6 (tested);
 * the reduction loses accuracy beyond about 2^20 pi/2, far beyond the phases the engine produces.
 */
public final class FastSinCos {

    /** pi/2 rounded to 33 significant bits, so that q * PIO2_HI is exact for |q| below 2^20. */
    static final double PIO2_HI;
    /** pi/2 - PIO2_HI, rounded to double. */
    static final double PIO2_LO;
    private static final double TWO_OVER_PI = 2.0 / Math.PI;

    static {
        BigDecimal halfPi = new BigDecimal(
                "1.57079632679489661923132169163975144209858469968755291048747229615390820314310449931401741267");
        long bits = Double.doubleToLongBits(halfPi.doubleValue());
        PIO2_HI = Double.longBitsToDouble(bits & 0xFFFFFFFFF8000000L);
        PIO2_LO = halfPi.subtract(new BigDecimal(PIO2_HI)).doubleValue();
    }

    // Taylor coefficients (-1)^n / (2n+1)! and (-1)^n / (2n)!.
    private static final double S3 = -1.0 / 6.0;
    private static final double S5 = 1.0 / 120.0;
    private static final double S7 = -1.0 / 5040.0;
    private static final double S9 = 1.0 / 362880.0;
    private static final double S11 = -1.0 / 39916800.0;
    private static final double S13 = 1.0 / 6227020800.0;
    private static final double S15 = -1.0 / 1307674368000.0;
    private static final double C2 = -0.5;
    private static final double C4 = 1.0 / 24.0;
    private static final double C6 = -1.0 / 720.0;
    private static final double C8 = 1.0 / 40320.0;
    private static final double C10 = -1.0 / 3628800.0;
    private static final double C12 = 1.0 / 479001600.0;
    private static final double C14 = -1.0 / 87178291200.0;
    private static final double C16 = 1.0 / 20922789888000.0;

    private FastSinCos() {
    }

    /**
     * Writes sin and cos of {@code phase[0..n)} into {@code sin} and {@code cos}.
     * The arrays may not overlap except that none is read after it is written.
     */
    public static void sinCos(double[] phase, double[] sin, double[] cos, int n) {
        for (int i = 0; i < n; i++) {
            double p = phase[i];
            double q = Math.rint(p * TWO_OVER_PI);
            double r = (p - q * PIO2_HI) - q * PIO2_LO;
            double r2 = r * r;
            double s = sinPolynomial(r, r2);
            double c = cosPolynomial(r2);
            long quadrant = (long) q;
            boolean swap = (quadrant & 1L) != 0;
            double sv = swap ? c : s;
            double cv = swap ? s : c;
            sin[i] = (quadrant & 2L) != 0 ? -sv : sv;
            cos[i] = ((quadrant + 1L) & 2L) != 0 ? -cv : cv;
        }
    }

    /** Sine of one phase, by the same method. */
    public static double sin(double phase) {
        double q = Math.rint(phase * TWO_OVER_PI);
        double r = (phase - q * PIO2_HI) - q * PIO2_LO;
        double r2 = r * r;
        long quadrant = (long) q;
        double v = (quadrant & 1L) != 0 ? cosPolynomial(r2) : sinPolynomial(r, r2);
        return (quadrant & 2L) != 0 ? -v : v;
    }

    /** Cosine of one phase, by the same method. */
    public static double cos(double phase) {
        double q = Math.rint(phase * TWO_OVER_PI);
        double r = (phase - q * PIO2_HI) - q * PIO2_LO;
        double r2 = r * r;
        long quadrant = (long) q;
        double v = (quadrant & 1L) != 0 ? sinPolynomial(r, r2) : cosPolynomial(r2);
        return ((quadrant + 1L) & 2L) != 0 ? -v : v;
    }

    private static double sinPolynomial(double r, double r2) {
        return r + r * r2 * (S3 + r2 * (S5 + r2 * (S7 + r2 * (S9 + r2 * (S11 + r2 * (S13 + r2 * S15))))));
    }

    private static double cosPolynomial(double r2) {
        return 1.0 + r2 * (C2 + r2 * (C4 + r2 * (C6 + r2 * (C8 + r2 * (C10 + r2 * (C12 + r2 * (C14
                + r2 * C16)))))));
    }
}
