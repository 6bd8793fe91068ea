package org.eddycast.field;

import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * The model spectrum of Pope (2000, Turbulent Flows, Cambridge University Press, sec. 6.5.3, eqs. 6.246-6.248):
 * E(k) = C eps^(2/3) k^(-5/3) f_L(k l) f_eta(k eta) with C = 1.5,
 * f_L(x) = (x / sqrt(x^2 + c_L))^(5/3 + p0), p0 = 2, and
 * f_eta(x) = exp(-beta ([x^4 + c_eta^4]^(1/4) - c_eta)), beta = 5.2.
 *
 * <p>Here l = k^(3/2)/eps is Pope's energy-containing length, not the integral length. Given the ratio of
 * the longitudinal integral length L11 to the Kolmogorov length eta, this class finds l/eta and the constants
 * c_L and c_eta so that E integrates to the kinetic energy k and 2 nu integral k^2 E to eps (Pope's two
 * conditions), and so that L11 = (3 pi / 4) integral (E/k) / integral E has the requested ratio. Units: eta = 1
 * (and eps = nu = 1).
 *
 * <p>The solution exists for L11/eta above about 23 (25 is required); below that the dissipation range swallows the
 * energy-containing range and the constructor throws.
 */
public final class PopeModelSpectrum implements SpectrumShape {

    static final double C = 1.5;
    static final double P0 = 2.0;
    static final double BETA = 5.2;
    /** Smallest L11/eta accepted. */
    public static final double MIN_RATIO = 25.0;

    private static final int GRID = 700;
    private static final Map<Double, double[]> SOLVED = new ConcurrentHashMap<>();

    private final double ratio;
    private final double energyLength;
    private final double cL;
    private final double cEta;

    /** @param integralOverKolmogorov L11 / eta, at least {@link #MIN_RATIO} */
    public PopeModelSpectrum(double integralOverKolmogorov) {
        if (!(integralOverKolmogorov >= MIN_RATIO && integralOverKolmogorov <= 1e7)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the model spectrum needs integral length / Kolmogorov length between %.0f and 1e7; got %.4g",
                    MIN_RATIO, integralOverKolmogorov));
        }
        this.ratio = integralOverKolmogorov;
        double[] p = SOLVED.computeIfAbsent(integralOverKolmogorov, PopeModelSpectrum::solve);
        this.energyLength = p[0];
        this.cL = p[1];
        this.cEta = p[2];
    }

    /** Pope's energy-containing length l = k^(3/2)/eps in Kolmogorov lengths. */
    public double energyLength() {
        return energyLength;
    }

    public double cL() {
        return cL;
    }

    public double cEta() {
        return cEta;
    }

    @Override
    public double density(double k) {
        return density(k, energyLength, cL, cEta);
    }

    @Override
    public double lowerWavenumber() {
        return 1e-2 / energyLength;
    }

    @Override
    public double upperWavenumber() {
        return 4.0;
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT,
                "model spectrum (Pope 2000) with integral length / Kolmogorov length = %.4g", ratio);
    }

    static double density(double k, double l, double cL, double cEta) {
        double x = k * l;
        double fL = Math.pow(x / Math.sqrt(x * x + cL), 5.0 / 3.0 + P0);
        double k4 = k * k * k * k;
        double fEta = Math.exp(-BETA * (Math.sqrt(Math.sqrt(k4 + cEta * cEta * cEta * cEta)) - cEta));
        return C * Math.pow(k, -5.0 / 3.0) * fL * fEta;
    }

    /** Integral of g(k) E(k) dk over a log grid wide enough for both ends of the spectrum. */
    static double integrate(double l, double cL, double cEta, DoubleUnaryOperator weight) {
        double lo = Math.log(1e-3 / l);
        double hi = Math.log(30.0);
        double h = (hi - lo) / (GRID - 1);
        double sum = 0;
        for (int i = 0; i < GRID; i++) {
            double k = Math.exp(lo + i * h);
            double f = density(k, l, cL, cEta) * k * weight.applyAsDouble(k);
            sum += (i == 0 || i == GRID - 1) ? 0.5 * f : f;
        }
        return sum * h;
    }

    private static double[] solve(double targetRatio) {
        BrentSolver brent = new BrentSolver(1e-12, 1e-10);
        DoubleUnaryOperator ratioMismatch = logL -> {
            double l = Math.exp(logL);
            double[] c = constants(l);
            double energy = integrate(l, c[0], c[1], k -> 1.0);
            double inverseMoment = integrate(l, c[0], c[1], k -> 1.0 / k);
            return Math.log(0.75 * Math.PI * inverseMoment / energy) - Math.log(targetRatio);
        };
        double logL;
        try {
            logL = brent.solve(200, ratioMismatch::applyAsDouble, Math.log(targetRatio), Math.log(targetRatio * 8));
        } catch (NoBracketingException e) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the model spectrum has no solution for integral length / Kolmogorov length = %.4g", targetRatio),
                    e);
        }
        double l = Math.exp(logL);
        double[] c = constants(l);
        return new double[] {l, c[0], c[1]};
    }

    /** c_L and c_eta for energy length l (eta = eps = nu = 1): energy l^(2/3), dissipation 1. */
    private static double[] constants(double l) {
        // Each nesting level needs its own solver: a solver keeps the state of the solve in progress.
        double energy = Math.pow(l, 2.0 / 3.0);
        DoubleUnaryOperator cLFor = cEta -> new BrentSolver(1e-12, 1e-10).solve(200,
                cL -> integrate(l, cL, cEta, k -> 1.0) - energy, 1e-4, 1e4);
        double cEta = new BrentSolver(1e-12, 1e-10).solve(200,
                ce -> 2.0 * integrate(l, cLFor.applyAsDouble(ce), ce, k -> k * k) - 1.0, 0.0, 5.0);
        return new double[] {cLFor.applyAsDouble(cEta), cEta};
    }
}
