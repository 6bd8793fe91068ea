package org.eddycast.field;

import java.math.BigDecimal;

/**
 * Sine and cosine for the particle kernels, in plain scalar code: of a phase in radians (the scalar kernels)
 * and of a phase in turns (the method the vector kernels write out in lanes, see {@link VectorSinCos}).
 *
 * <p>Method: the nearest whole number q of turns, q = rint(phase / 2 pi); Cody-Waite reduction of the half
 * angle, h = phase / 2 - q pi, with a two-part constant (Cody and Waite 1980, Software Manual for the
 * Elementary Functions, Prentice-Hall, ch. 8), so that h lies in [-pi/2, pi/2]; on that interval
 * sin h = h P(h^2) and cos h = Q(h^2) with P of degree 6 and Q of degree 7, near-minimax polynomials found by
 * Chebyshev interpolation of sin(h)/h and cos(h) in h^2 (Trefethen 2013, Approximation Theory and
 * Approximation Practice, SIAM); then the double-angle formulas sin(phase) = 2 sin h cos h and
 * cos(phase) = 2 cos^2 h - 1. Unlike a reduction by quarter turns this needs no quadrant logic, so the vector
 * form is floating-point arithmetic only.
 *
 * <p>Accuracy: within 2e-13 absolute of {@link Math#sin} and {@link Math#cos} for |phase| up to 1e6 (the
 * polynomials' own error is below 8e-14 for sin h and 8e-15 for cos h; tested); the reduction loses accuracy
 * beyond about 2^20 pi, far beyond the phases the engine produces.
 */
public final class FastSinCos {

    /** pi rounded to 33 significant bits, so that q * PI_HI is exact for |q| below 2^20. */
    static final double PI_HI;
    /** pi - PI_HI, rounded to double. */
    static final double PI_LO;
    static final double ONE_OVER_TWO_PI = 0.5 / Math.PI;

    static {
        BigDecimal pi = new BigDecimal(
                "3.14159265358979323846264338327950288419716939937510582097494459230781640628620899862803482534");
        long bits = Double.doubleToLongBits(pi.doubleValue());
        PI_HI = Double.longBitsToDouble(bits & 0xFFFFFFFFF8000000L);
        PI_LO = pi.subtract(new BigDecimal(PI_HI)).doubleValue();
    }

    /** sin(h) / h on h^2 in [0, (pi/2)^2]: coefficients of h^0, h^2, ..., h^12. */
    static final double[] SINE = {
        0.9999999999999496, -0.16666666666466673, 0.00833333332035835, -1.9841266683130672e-4,
        2.7556952912858047e-6, -2.503026818882279e-8, 1.54112197466489e-10};
    /**
     * cos(h) on h^2 in [0, (pi/2)^2]: coefficients of h^0, h^2, ..., h^14, the first held at 1 so that the
     * cosine of 0 is exactly 1 (error below 8e-15).
     */
    static final double[] COSINE = {
        1.0, -0.49999999999999684, 0.04166666666654123, -0.0013888888880751317, 2.4801585321095498e-5,
        -2.7557089550661797e-7, 2.0863068045993953e-9, -1.106499051779341e-11};

    /**
     * 2 sin(pi f) / f on f^2 in [0, 1/4] (f a fraction of a turn): coefficients of f^0, f^2, ..., f^12, a
     * near-minimax fit by Chebyshev interpolation in f^2 like the radian polynomials (error of
     * 2 sin(pi f) below 2e-13, of sin(2 pi f) through the double-angle formula below 6e-14).
     */
    static final double[] TURN_SINE = {
        6.28318530717927, -10.335425559975919, 5.10032807181349, -1.1985288678714572, 0.1642895893412971,
        -0.014728010944231444, 0.0008949841698154202};
    /**
     * cos(pi f) on f^2 in [0, 1/4]: coefficients of f^0, f^2, ..., f^14, the first held at 1 so that the cosine
     * of a whole number of turns is exactly 1 (error below 1e-14).
     */
    static final double[] TURN_COSINE = {
        1.0, -4.934802200544648, 4.05871212640455, -1.335262768072252, 0.23533061156693527, -0.02580667630543047,
        0.0019283090826937293, -0.00010093673762780023};

    private static final double S0 = SINE[0];
    private static final double S1 = SINE[1];
    private static final double S2 = SINE[2];
    private static final double S3 = SINE[3];
    private static final double S4 = SINE[4];
    private static final double S5 = SINE[5];
    private static final double S6 = SINE[6];
    private static final double C0 = COSINE[0];
    private static final double C1 = COSINE[1];
    private static final double C2 = COSINE[2];
    private static final double C3 = COSINE[3];
    private static final double C4 = COSINE[4];
    private static final double C5 = COSINE[5];
    private static final double C6 = COSINE[6];
    private static final double C7 = COSINE[7];

    private FastSinCos() {
    }

    /**
     * Writes sin and cos of {@code phase[0..n)} into {@code sin} and {@code cos}.
     * The arrays may not overlap except that none is read after it is written.
     */
    public static void sinCos(double[] phase, double[] sin, double[] cos, int n) {
        for (int i = 0; i < n; i++) {
            double h = halfAngle(phase[i]);
            double w = h * h;
            double s = h * sinePolynomial(w);
            double c = cosinePolynomial(w);
            sin[i] = 2 * s * c;
            cos[i] = Math.fma(2 * c, c, -1.0);
        }
    }

    /** Sine of one phase, by the same method. */
    public static double sin(double phase) {
        double h = halfAngle(phase);
        double w = h * h;
        return 2 * h * sinePolynomial(w) * cosinePolynomial(w);
    }

    /** Cosine of one phase, by the same method. */
    public static double cos(double phase) {
        double h = halfAngle(phase);
        double c = cosinePolynomial(h * h);
        return Math.fma(2 * c, c, -1.0);
    }

    /**
     * sin(2 pi t) for a phase t in turns, as the vector kernels compute it: f = t - rint(t), exact, then
     * (2 sin(pi f)) cos(pi f) by the turn polynomials.
     */
    public static double sinOfTurns(double t) {
        double f = t - Math.rint(t);
        double w = f * f;
        return f * turnSinePolynomial(w) * turnCosinePolynomial(w);
    }

    /** cos(2 pi t) for a phase t in turns, as the vector kernels compute it: 2 cos^2(pi f) - 1. */
    public static double cosOfTurns(double t) {
        double f = t - Math.rint(t);
        double c = turnCosinePolynomial(f * f);
        return Math.fma(c + c, c, -1.0);
    }

    /** phase / 2 - q pi with q the nearest whole number of turns: in [-pi/2, pi/2]. */
    private static double halfAngle(double phase) {
        double q = Math.rint(phase * ONE_OVER_TWO_PI);
        return Math.fma(-q, PI_LO, Math.fma(-q, PI_HI, 0.5 * phase));
    }

    private static double sinePolynomial(double w) {
        return S0 + w * (S1 + w * (S2 + w * (S3 + w * (S4 + w * (S5 + w * S6)))));
    }

    private static double turnSinePolynomial(double w) {
        double p = TURN_SINE[6];
        for (int i = 5; i >= 0; i--) {
            p = Math.fma(p, w, TURN_SINE[i]);
        }
        return p;
    }

    private static double turnCosinePolynomial(double w) {
        double p = TURN_COSINE[7];
        for (int i = 6; i >= 0; i--) {
            p = Math.fma(p, w, TURN_COSINE[i]);
        }
        return p;
    }

    private static double cosinePolynomial(double w) {
        return C0 + w * (C1 + w * (C2 + w * (C3 + w * (C4 + w * (C5 + w * (C6 + w * C7))))));
    }
}
