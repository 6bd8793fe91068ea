package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.SpectrumSpec;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * The full analysis of a velocity record, immutable: the record before and after cleaning, what cleaning
 * changed, single-point statistics, the streamwise autocorrelation and Welch spectrum, the inertial-range fit,
 * the derived scales, every derivation and every warning. Made by {@link RecordAnalyzer}.
 *
 * <p>{@link #statistics()} gives the engine's input with a power-law spectrum;
 * {@link #statisticsWithModelSpectrum()} the same with Pope's model spectrum fixed by the Kolmogorov length.
 */
public final class RecordAnalysis {

    private final VelocityRecord rawRecord;
    private final VelocityRecord cleanedRecord;
    private final CleaningReport cleaning;
    private final List<ComponentStatistics> components;
    private final double meanSpeed;
    private final double rmsVelocity;
    private final String streamwiseSignal;
    private final Autocorrelation autocorrelation;
    private final PowerSpectrum spectrum;
    private final LogBinnedSpectrum binnedSpectrum;
    private final InertialRangeFit fit;
    private final double peakFrequency;
    private final double noiseLimitFrequency;
    private final ScaleEstimates scales;
    private final int dimensions;
    private final double[] statisticsComponentRms;
    private final List<Derivation> derivations;
    private final List<String> warnings;

    RecordAnalysis(VelocityRecord rawRecord, VelocityRecord cleanedRecord, CleaningReport cleaning,
                   List<ComponentStatistics> components, double meanSpeed, double rmsVelocity, String streamwiseSignal,
                   Autocorrelation autocorrelation, PowerSpectrum spectrum, InertialRangeFitter.Outcome fitOutcome,
                   ScaleEstimates scales, int dimensions, double[] statisticsComponentRms,
                   List<Derivation> derivations, List<String> warnings) {
        this.rawRecord = rawRecord;
        this.cleanedRecord = cleanedRecord;
        this.cleaning = cleaning;
        this.components = List.copyOf(components);
        this.meanSpeed = meanSpeed;
        this.rmsVelocity = rmsVelocity;
        this.streamwiseSignal = streamwiseSignal;
        this.autocorrelation = autocorrelation;
        this.spectrum = spectrum;
        this.binnedSpectrum = LogBinnedSpectrum.of(spectrum);
        this.fit = fitOutcome.fit();
        this.peakFrequency = fitOutcome.peakFrequency();
        this.noiseLimitFrequency = fitOutcome.noiseLimitFrequency();
        this.scales = scales;
        this.dimensions = dimensions;
        this.statisticsComponentRms = statisticsComponentRms.clone();
        this.derivations = List.copyOf(derivations);
        this.warnings = List.copyOf(warnings);
    }

    /** The engine's input with a power-law spectrum: fitted slope (or -5/3 without a fit) and the band's ratio. */
    public TurbulenceStatistics statistics() {
        return build(powerLawSpectrum(), "power-law band: fitted slope and wavenumber ratio above");
    }

    /** The power-law spectrum: fitted slope (or -5/3 without a fit) and the band's wavenumber ratio. */
    public SpectrumSpec powerLawSpectrum() {
        double slope = fit != null ? fit.slope() : SpectrumSpec.KOLMOGOROV_SLOPE;
        return SpectrumSpec.powerLaw(slope, scales.wavenumberRatio());
    }

    /**
     * Pope's model spectrum fixed by the measured Kolmogorov length.
     *
     * @throws IllegalStateException when no dissipation rate (hence no Kolmogorov length) could be estimated
     */
    public SpectrumSpec modelSpectrum() {
        if (Double.isNaN(scales.kolmogorovLength())) {
            throw new IllegalStateException("no Kolmogorov length: the record gave no dissipation rate (no inertial"
                    + " range could be fitted); use the power-law spectrum instead");
        }
        return SpectrumSpec.modelSpectrum(scales.kolmogorovLength());
    }

    /**
     * The engine's input with Pope's model spectrum fixed by the Kolmogorov length.
     *
     * @throws IllegalStateException when no dissipation rate (hence no Kolmogorov length) could be estimated
     */
    public TurbulenceStatistics statisticsWithModelSpectrum() {
        return build(modelSpectrum(), "model spectrum (Pope 2000, Turbulent Flows, sec. 6.5.3) with the Kolmogorov"
                + " length above");
    }

    private TurbulenceStatistics build(SpectrumSpec spec, String spectrumRule) {
        List<Derivation> all = new ArrayList<>(derivations);
        all.add(new Derivation("spectrum model", spec.model() == SpectrumSpec.Model.POWER_LAW ? spec.slope()
                : spec.kolmogorovLength(), spec.model() == SpectrumSpec.Model.POWER_LAW ? "" : "m", spectrumRule,
                "chosen from the record analysis"));
        return new TurbulenceStatistics(dimensions, rmsVelocity, statisticsComponentRms, scales.integralLength(),
                scales.correlationTime(), spec, meanSpeed, scales.dissipationRate(), all);
    }

    /** The record as read. */
    public VelocityRecord rawRecord() {
        return rawRecord;
    }

    /** The record after cleaning. */
    public VelocityRecord cleanedRecord() {
        return cleanedRecord;
    }

    public CleaningReport cleaning() {
        return cleaning;
    }

    /** Mean, rms and intensity per measured component. */
    public List<ComponentStatistics> components() {
        return components;
    }

    /** Magnitude of the mean velocity vector (m/s). */
    public double meanSpeed() {
        return meanSpeed;
    }

    /** u' = sqrt(mean of the component variances) (m/s). */
    public double rmsVelocity() {
        return rmsVelocity;
    }

    /** u' / U. */
    public double turbulenceIntensity() {
        return rmsVelocity / meanSpeed;
    }

    /** Which signal the autocorrelation and spectrum were taken of, in words. */
    public String streamwiseSignal() {
        return streamwiseSignal;
    }

    public Autocorrelation autocorrelation() {
        return autocorrelation;
    }

    /** Welch spectrum of the streamwise signal. */
    public PowerSpectrum spectrum() {
        return spectrum;
    }

    /** The same spectrum averaged in log-frequency bins, for plots. */
    public LogBinnedSpectrum binnedSpectrum() {
        return binnedSpectrum;
    }

    /** The inertial-range fit, empty when none was possible. */
    public Optional<InertialRangeFit> fit() {
        return Optional.ofNullable(fit);
    }

    /** The energy-containing peak of f E(f) found by the automatic rule (Hz); NaN for a given band. */
    public double peakFrequency() {
        return peakFrequency;
    }

    /** Upper end of the usable spectrum found by the automatic rule (Hz); NaN for a given band. */
    public double noiseLimitFrequency() {
        return noiseLimitFrequency;
    }

    public ScaleEstimates scales() {
        return scales;
    }

    /** Every derived value with its rule and source, in the order derived. */
    public List<Derivation> derivations() {
        return derivations;
    }

    /** Everything that needs the user's attention. */
    public List<String> warnings() {
        return warnings;
    }
}
