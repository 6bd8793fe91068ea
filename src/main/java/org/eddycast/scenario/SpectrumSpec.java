package org.eddycast.scenario;

/**
 * The shape of the turbulence energy spectrum, as the user states it.
 *
 * <p>Two models:
 * <ul>
 *   <li>{@link Model#POWER_LAW}: E(k) proportional to k^slope between a smallest wavenumber and
 *       {@code wavenumberRatio} times it (a band of scales); {@code kolmogorovLength} is not used.</li>
 *   <li>{@link Model#MODEL_SPECTRUM}: the model spectrum with energy-containing and dissipation ranges of
 *       Pope (2000, Turbulent Flows, Cambridge University Press, sec. 6.5.3), fixed by the integral length
 *       and {@code kolmogorovLength} (metres); {@code slope} and {@code wavenumberRatio} are not used.</li>
 * </ul>
 *
 * @param model            which spectrum model
 * @param slope            power-law exponent of E(k), for example -5/3 (power-law model only)
 * @param wavenumberRatio  largest over smallest wavenumber of the band, at least 1 (power-law model only)
 * @param kolmogorovLength Kolmogorov length scale in metres (model spectrum only; NaN otherwise)
 */
public record SpectrumSpec(Model model, double slope, double wavenumberRatio, double kolmogorovLength) {

    /** The spectrum models the engine knows. */
    public enum Model {
        POWER_LAW("power-law"),
        MODEL_SPECTRUM("model");

        private final String key;

        Model(String key) {
            this.key = key;
        }

        /** The name used in scenario files. */
        public String key() {
            return key;
        }

        /** The model for a scenario-file name, or null if there is none. */
        public static Model fromKey(String key) {
            for (Model m : values()) {
                if (m.key.equals(key)) {
                    return m;
                }
            }
            return null;
        }
    }

    /** Kolmogorov's inertial-range slope, -5/3. */
    public static final double KOLMOGOROV_SLOPE = -5.0 / 3.0;

    /** A power-law band spectrum. */
    public static SpectrumSpec powerLaw(double slope, double wavenumberRatio) {
        return new SpectrumSpec(Model.POWER_LAW, slope, wavenumberRatio, Double.NaN);
    }

    /** Pope's model spectrum with the given Kolmogorov length (metres). */
    public static SpectrumSpec modelSpectrum(double kolmogorovLength) {
        return new SpectrumSpec(Model.MODEL_SPECTRUM, KOLMOGOROV_SLOPE, Double.NaN, kolmogorovLength);
    }
}
