package org.eddycast.measure;

/**
 * Settings of a record analysis. Start from {@link #defaults()} and change what is needed with the
 * {@code with...} methods; every value is checked and a bad one named with its valid range.
 *
 * @param statedSamplingRate    samples per second for a record without a time column; NaN when not stated
 * @param gapFactor             a time step above this many median steps is reported as a gap (default 1.5)
 * @param despike               run phase-space despiking (default on)
 * @param detrend               remove a linear trend (default on)
 * @param spareSpikeNeighbours  the despiker's neighbour-sparing rule (default on; see PhaseSpaceDespiker)
 * @param segmentLength         Welch segment length, a power of two; 0 for the automatic choice (default)
 * @param fitBand               inertial-range band given by the caller; null for the automatic rule (default)
 * @param kinematicViscosity    of the fluid (m^2/s); default water at 20 C, 1.0034e-6 (IAPWS 2008)
 * @param intensityWarningLimit u'/U above which frozen turbulence is questioned (default 0.2, common practice)
 * @param smallSpeedLimit       u'/U above which the mean speed counts as small and the fallback rules apply
 *                              (default 0.5, our own choice)
 * @param maxWavenumberRatio    cap on the power-law band's wavenumber ratio (default 64)
 */
public record AnalysisOptions(double statedSamplingRate, double gapFactor, boolean despike, boolean detrend,
                              boolean spareSpikeNeighbours, int segmentLength, FrequencyBand fitBand,
                              double kinematicViscosity, double intensityWarningLimit, double smallSpeedLimit,
                              double maxWavenumberRatio) {

    public AnalysisOptions {
        if (!Double.isNaN(statedSamplingRate) && !(statedSamplingRate > 0 && Double.isFinite(statedSamplingRate))) {
            throw new IllegalArgumentException("stated sampling rate must be positive (Hz), or NaN for none, not "
                    + statedSamplingRate);
        }
        if (!(gapFactor > 1 && gapFactor < 1e6)) {
            throw new IllegalArgumentException("gap factor must be above 1 (median steps), not " + gapFactor);
        }
        if (segmentLength != 0 && (segmentLength < 16 || Integer.bitCount(segmentLength) != 1)) {
            throw new IllegalArgumentException("segment length must be 0 (automatic) or a power of two of at"
                    + " least 16, not " + segmentLength);
        }
        if (!(kinematicViscosity > 0 && kinematicViscosity < 1)) {
            throw new IllegalArgumentException("kinematic viscosity must be positive and below 1 m^2/s, not "
                    + kinematicViscosity);
        }
        if (!(intensityWarningLimit > 0 && intensityWarningLimit <= smallSpeedLimit)) {
            throw new IllegalArgumentException("intensity warning limit must be positive and not above the"
                    + " small-speed limit (" + smallSpeedLimit + "), not " + intensityWarningLimit);
        }
        if (!(smallSpeedLimit > 0 && Double.isFinite(smallSpeedLimit))) {
            throw new IllegalArgumentException("small-speed limit must be positive and finite, not "
                    + smallSpeedLimit);
        }
        if (!(maxWavenumberRatio >= 1 && maxWavenumberRatio <= 1e6)) {
            throw new IllegalArgumentException("largest wavenumber ratio must be between 1 and 1e6, not "
                    + maxWavenumberRatio);
        }
    }

    /** Default settings: time column expected, despiking and detrending on, automatic band, water at 20 C. */
    public static AnalysisOptions defaults() {
        return new AnalysisOptions(Double.NaN, RecordReader.DEFAULT_GAP_FACTOR, true, true, true, 0, null,
                KolmogorovScales.WATER_VISCOSITY_20C, 0.2, 0.5, 64);
    }

    public AnalysisOptions withSamplingRate(double hz) {
        return new AnalysisOptions(hz, gapFactor, despike, detrend, spareSpikeNeighbours, segmentLength, fitBand,
                kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withGapFactor(double factor) {
        return new AnalysisOptions(statedSamplingRate, factor, despike, detrend, spareSpikeNeighbours,
                segmentLength, fitBand, kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withDespike(boolean on) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, on, detrend, spareSpikeNeighbours, segmentLength,
                fitBand, kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withDetrend(boolean on) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, on, spareSpikeNeighbours, segmentLength,
                fitBand, kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withSpareSpikeNeighbours(boolean on) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, detrend, on, segmentLength, fitBand,
                kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withSegmentLength(int samples) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, detrend, spareSpikeNeighbours, samples,
                fitBand, kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    /** A caller-chosen inertial-range band; null restores the automatic rule. */
    public AnalysisOptions withFitBand(FrequencyBand band) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, detrend, spareSpikeNeighbours,
                segmentLength, band, kinematicViscosity, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withKinematicViscosity(double nu) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, detrend, spareSpikeNeighbours,
                segmentLength, fitBand, nu, intensityWarningLimit, smallSpeedLimit, maxWavenumberRatio);
    }

    public AnalysisOptions withIntensityLimits(double warning, double smallSpeed) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, detrend, spareSpikeNeighbours,
                segmentLength, fitBand, kinematicViscosity, warning, smallSpeed, maxWavenumberRatio);
    }

    public AnalysisOptions withMaxWavenumberRatio(double ratio) {
        return new AnalysisOptions(statedSamplingRate, gapFactor, despike, detrend, spareSpikeNeighbours,
                segmentLength, fitBand, kinematicViscosity, intensityWarningLimit, smallSpeedLimit, ratio);
    }

    /** True when the viscosity is the default (water at 20 C). */
    boolean defaultViscosity() {
        return kinematicViscosity == KolmogorovScales.WATER_VISCOSITY_20C;
    }

    /** Samples the analysis needs with these settings. */
    int minimumSamples() {
        return segmentLength == 0 ? WelchSpectrumEstimator.MIN_SAMPLES
                : Math.max(WelchSpectrumEstimator.MIN_SAMPLES, 2 * segmentLength);
    }
}
