package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.eddycast.scenario.Derivation;

/**
 * Turns measured single-point statistics into the length, time and dissipation scales the engine needs,
 * stating each rule.
 *
 * <p>Rules:
 * <ul>
 *   <li>Regime from u'/U: frozen turbulence (Taylor, G. I. (1938), "The spectrum of turbulence", Proceedings
 *       of the Royal Society of London A 164:476-490) is taken to hold for u'/U up to 0.2 (common practice),
 *       questioned up to 0.5, and replaced by the fallback rules above 0.5 (our own choice).</li>
 *   <li>Convection speed: U under frozen turbulence. With a small mean speed the small eddies are swept past
 *       the probe by the energy-containing motion as well (the random-sweeping argument of Tennekes, H.
 *       (1975), "Eulerian and Lagrangian time microscales in isotropic turbulence", Journal of Fluid Mechanics
 *       67:561-567; from memory), so we take the rms speed past the probe, sqrt(U^2 + 3 u'^2): our own
 *       choice, and the dissipation it gives is rough.</li>
 *   <li>Dissipation rate: {@link KolmogorovScales#dissipationRate} from the fitted band's -5/3 level.</li>
 *   <li>Integral length: L = U T (frozen turbulence). Fallback: L = A u'^3 / eps with A = 1, the
 *       order-of-magnitude estimate eps ~ u'^3 / L (common practice; the factor differs between flows by
 *       about two, from memory); L = U_c T when no dissipation rate is available either.</li>
 *   <li>Correlation time of the field's amplitudes in a frame moving with the flow: the eddy-turnover time
 *       L / u' under frozen turbulence (common practice; the probe's own integral time is then the time the
 *       eddies take to be carried past, not their lifetime); the measured integral time T when the mean
 *       speed is small (the eddies then evolve in place).</li>
 *   <li>Wavenumber ratio of the power-law band: k_max / k_min with k_min = 1 / L and k_max = 2 pi f_end / U_c
 *       at the upper end of the fitted inertial range, between 1 and the cap. For a -5/3 band the
 *       longitudinal integral length L11 = (pi / (2 u'^2)) integral E(k)/k dk (Pope 2000, Turbulent Flows,
 *       eq. 6.213) gives k_min L11 = (3 pi / 10) (1 - R^(-5/3)) / (1 - R^(-2/3)), between 0.94 (R infinite)
 *       and 1.22 (R = 8): derived, so k_min = 1 / L holds to about 20%.</li>
 *   <li>Kolmogorov length: {@link KolmogorovScales#kolmogorovLength}.</li>
 * </ul>
 */
final class ScaleRules {

    static final String TAYLOR = "Taylor 1938, The spectrum of turbulence, Proc. R. Soc. Lond. A 164:476-490";
    static final String KOLMOGOROV = "Kolmogorov 1941, Dokl. Akad. Nauk SSSR 30:301-305; C1 = 0.53 from"
            + " Sreenivasan 1995, On the universality of the Kolmogorov constant, Phys. Fluids 7:2778-2784";
    static final String WELCH = "Welch 1967, The use of fast Fourier transform for the estimation of power spectra,"
            + " IEEE Trans. Audio Electroacoust. AU-15:70-73";
    static final String IAPWS = "IAPWS 2008 (Huber et al. 2009, J. Phys. Chem. Ref. Data 38:101)";

    /** The fallback constant A in L = A u'^3 / eps. */
    static final double FALLBACK_LENGTH_CONSTANT = 1.0;

    private ScaleRules() {
    }

    /**
     * @param meanSpeed    U, magnitude of the mean velocity (m/s)
     * @param rmsVelocity  u' (m/s)
     * @param correlation  autocorrelation of the streamwise signal
     * @param fit          inertial-range fit of its spectrum, or null
     * @param noiseLimit   upper end of the usable spectrum (Hz), NaN when unknown
     * @param samplingRate samples per second
     * @param options      limits, viscosity and cap
     */
    static ScaleEstimates estimate(double meanSpeed, double rmsVelocity, Autocorrelation correlation,
                                   InertialRangeFit fit, double noiseLimit, double samplingRate,
                                   AnalysisOptions options) {
        List<Derivation> d = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double intensity = rmsVelocity / meanSpeed;
        FlowRegime regime = !(intensity <= options.smallSpeedLimit()) ? FlowRegime.SMALL_MEAN_SPEED
                : intensity > options.intensityWarningLimit() ? FlowRegime.FROZEN_TURBULENCE_QUESTIONABLE
                : FlowRegime.FROZEN_TURBULENCE;

        double integralTime = correlation.integralTime();
        String timeRule = Autocorrelation.INTEGRAL_TIME_RULE + " of the streamwise fluctuation";
        if (!correlation.crossesZero()) {
            timeRule += "; no zero crossing within half the record, integrated to the last lag (a lower bound)";
            warnings.add(String.format(Locale.ROOT, "the autocorrelation does not cross zero within half the record"
                    + " (%.4g s); the integral time %.4g s is a lower bound: a longer record is needed",
                    correlation.lagTimes()[correlation.lagTimes().length - 1], integralTime));
        }
        d.add(new Derivation("integral time", integralTime, "s", timeRule, "common practice"));

        double convection;
        switch (regime) {
            case FROZEN_TURBULENCE -> convection = meanSpeed;
            case FROZEN_TURBULENCE_QUESTIONABLE -> {
                convection = meanSpeed;
                warnings.add(String.format(Locale.ROOT, "turbulence intensity u'/U = %.3g is above %.2g: Taylor's"
                        + " frozen-turbulence hypothesis (used for the integral length and the dissipation rate)"
                        + " is doubtful (the %.2g limit is common practice)", intensity,
                        options.intensityWarningLimit(), options.intensityWarningLimit()));
            }
            default -> {
                convection = Math.sqrt(meanSpeed * meanSpeed + 3 * rmsVelocity * rmsVelocity);
                warnings.add(String.format(Locale.ROOT, "the mean speed %.4g m/s is small beside u' = %.4g m/s"
                        + " (u'/U above %.2g): frozen turbulence does not apply; the fallback rules are used and the"
                        + " dissipation rate and integral length are rough estimates", meanSpeed, rmsVelocity,
                        options.smallSpeedLimit()));
                d.add(new Derivation("convection speed", convection, "m/s", "U_c = sqrt(U^2 + 3 u'^2), the rms speed"
                        + " past the probe (our own choice; mean speed small)", "random sweeping, Tennekes 1975,"
                        + " J. Fluid Mech. 67:561-567 (from memory)"));
            }
        }

        double dissipation = Double.NaN;
        double bandEnd;
        if (fit != null) {
            d.add(new Derivation("spectrum slope", fit.slope(), "", "least-squares line through log E(f) against"
                    + " log f of the streamwise Welch spectrum over " + fit.describe(), WELCH));
            dissipation = KolmogorovScales.dissipationRate(fit.compensatedLevel(), convection);
            d.add(new Derivation("dissipation rate", dissipation, "W/kg", String.format(Locale.ROOT,
                    "E11(k1) = C1 eps^(2/3) k1^(-5/3), C1 = %.2f, with k1 = 2 pi f / U_c and E11 = U_c E(f) / (2 pi):"
                    + " eps = (2 pi / U_c) (K / C1)^(3/2), K = mean of E(f) f^(5/3) over the band = %.4g"
                    + " (m/s)^2 Hz^(2/3), U_c = %.4g m/s", KolmogorovScales.C1, fit.compensatedLevel(), convection),
                    KOLMOGOROV + "; " + TAYLOR));
            if (!fit.inertialRangeFound()) {
                warnings.add("no clear inertial range: the slope and dissipation rate come from the whole candidate"
                        + " range and are unreliable");
            }
            if (Math.abs(fit.slope() + 5.0 / 3.0) > 0.3) {
                warnings.add(String.format(Locale.ROOT, "the fitted slope %.3g is far from -5/3: the band may not be"
                        + " an inertial range, and the dissipation rate from Kolmogorov's law is doubtful",
                        fit.slope()));
            }
            bandEnd = fit.highFrequency();
        } else {
            warnings.add("no inertial-range fit: dissipation rate and Kolmogorov length unknown; the spectrum slope"
                    + " is taken as -5/3");
            d.add(new Derivation("spectrum slope", -5.0 / 3.0, "", "Kolmogorov's -5/3 taken (no fit possible)",
                    "Kolmogorov 1941"));
            bandEnd = Double.isNaN(noiseLimit) ? samplingRate / 4 : noiseLimit;
        }

        double length;
        if (regime.frozen()) {
            length = meanSpeed * integralTime;
            d.add(new Derivation("integral length", length, "m", String.format(Locale.ROOT,
                    "L = U T (frozen turbulence), U = %.4g m/s, T = %.4g s", meanSpeed, integralTime), TAYLOR));
        } else if (dissipation > 0) {
            length = FALLBACK_LENGTH_CONSTANT * rmsVelocity * rmsVelocity * rmsVelocity / dissipation;
            d.add(new Derivation("integral length", length, "m", String.format(Locale.ROOT,
                    "L = A u'^3 / eps, A = %.1f (mean speed small; order-of-magnitude estimate, uncertain by about a"
                    + " factor of two)", FALLBACK_LENGTH_CONSTANT), "common practice (from memory)"));
            warnings.add("integral length from L = u'^3 / eps: an order-of-magnitude estimate");
        } else {
            length = convection * integralTime;
            d.add(new Derivation("integral length", length, "m", String.format(Locale.ROOT,
                    "L = U_c T with the sweeping speed U_c = %.4g m/s (mean speed small and no dissipation rate;"
                    + " our own choice)", convection), "our own choice"));
            warnings.add("integral length from the sweeping speed times the integral time: a rough estimate");
        }

        double correlationTime;
        if (regime.frozen()) {
            correlationTime = length / rmsVelocity;
            d.add(new Derivation("correlation time", correlationTime, "s", "tau = L / u', the eddy-turnover time"
                    + " (frozen turbulence: the probe's integral time measures advection past the probe, not the"
                    + " eddies' lifetime)", "common practice"));
        } else {
            correlationTime = integralTime;
            d.add(new Derivation("correlation time", correlationTime, "s", "tau = T, the measured integral time"
                    + " (mean speed small: the eddies evolve in place at the probe)", "common practice"));
        }

        double eta = KolmogorovScales.kolmogorovLength(options.kinematicViscosity(), dissipation);
        if (!Double.isNaN(eta)) {
            d.add(new Derivation("Kolmogorov length", eta, "m", String.format(Locale.ROOT,
                    "eta = (nu^3 / eps)^(1/4), nu = %.5g m^2/s%s", options.kinematicViscosity(),
                    options.defaultViscosity() ? " (water at 20 C)" : " (given)"),
                    "Kolmogorov 1941" + (options.defaultViscosity() ? "; viscosity " + IAPWS : "")));
        }

        double kEnd = 2 * Math.PI * bandEnd / convection;
        double rawRatio = kEnd * length;
        double ratio = Math.min(options.maxWavenumberRatio(), Math.max(1.0, rawRatio));
        String ratioRule = String.format(Locale.ROOT, "k_max / k_min with k_min = 1 / L and k_max = 2 pi f_end / U_c,"
                + " f_end = %.4g Hz (%s), U_c = %.4g m/s: %.4g, kept between 1 and %.4g", bandEnd,
                fit != null ? "end of the fitted inertial range" : "end of the usable spectrum", convection, rawRatio,
                options.maxWavenumberRatio());
        d.add(new Derivation("wavenumber ratio", ratio, "", ratioRule, "k_min L11 between 0.94 and 1.22 for a -5/3"
                + " band, from L11 = (pi / (2 u'^2)) integral E/k dk (Pope 2000, Turbulent Flows, eq. 6.213; derived)"));
        if (rawRatio > options.maxWavenumberRatio()) {
            warnings.add(String.format(Locale.ROOT, "the measured inertial range reaches a wavenumber ratio of %.4g;"
                    + " the power-law band is capped at %.4g", rawRatio, options.maxWavenumberRatio()));
        } else if (rawRatio < 2) {
            warnings.add(String.format(Locale.ROOT, "the measured band spans a wavenumber ratio of only %.3g; the"
                    + " power-law spectrum is nearly a single scale", rawRatio));
        }
        return new ScaleEstimates(regime, convection, integralTime, dissipation, length, correlationTime, eta,
                ratio, d, warnings);
    }
}
