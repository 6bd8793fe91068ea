package org.eddycast.measure;

import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apache.commons.math3.stat.StatUtils;
import org.eddycast.scenario.Derivation;

/**
 * The entry point of the measured-record route: reads a probe velocity record, cleans it, analyses it and
 * turns it into the turbulence statistics the engine needs.
 *
 * <pre>{@code
 * RecordAnalysis a = RecordAnalyzer.analyze(Path.of("probe.csv"), AnalysisOptions.defaults());
 * TurbulenceStatistics stats = a.statistics();      // power-law spectrum
 * a.derivations();                                  // every value with its rule and source
 * a.warnings();                                     // what needs care
 * }</pre>
 *
 * <p>Steps:
 * <ol>
 *   <li>Read ({@link RecordReader}): delimiter, header and units, time column or stated sampling rate, gaps.</li>
 *   <li>Clean ({@link RecordCleaner}): phase-space despiking, then linear detrending; each can be off.</li>
 *   <li>Single-point statistics per component; the mean speed U is the magnitude of the mean velocity vector
 *       and u' = sqrt(mean of the component variances). The streamwise signal is the projection of the
 *       velocity on the mean-flow direction (the first component for a one-component record, or when the
 *       mean speed is small and its direction therefore ill-defined).</li>
 *   <li>Autocorrelation and integral time ({@link AutocorrelationEstimator}), Welch spectrum
 *       ({@link WelchSpectrumEstimator}) and inertial-range fit ({@link InertialRangeFitter}) of the streamwise
 *       signal.</li>
 *   <li>Scales (rules in ScaleRules, results in {@link ScaleEstimates}): dissipation rate, integral length, correlation time, Kolmogorov length,
 *       wavenumber ratio.</li>
 * </ol>
 * A one-component record is treated as three-dimensional isotropic turbulence, with a warning; a
 * two-component record gives two-dimensional statistics.
 *
 * <p>Errors: a {@link RecordFormatException} (unchecked) names the line and column at fault and what would be
 * valid: text in a number column, times not increasing, too few samples, a constant signal, missing columns,
 * an empty file, an unreadable file. Bad options raise an IllegalArgumentException naming the option.
 */
public final class RecordAnalyzer {

    /** Above this replaced fraction a component's data quality is questioned (our own threshold). */
    static final double SPIKE_FRACTION_WARNING = 0.05;
    private static final int GAPS_LISTED = 10;

    private RecordAnalyzer() {
    }

    /** Reads and analyses a record file (UTF-8 text). */
    public static RecordAnalysis analyze(Path file, AnalysisOptions options) {
        return analyze(reader(options).read(file), options);
    }

    /** Reads and analyses a record from a character stream; {@code sourceName} names it in reports. */
    public static RecordAnalysis analyze(Reader in, String sourceName, AnalysisOptions options) {
        return analyze(reader(options).read(in, sourceName), options);
    }

    /** Analyses a record already read. */
    public static RecordAnalysis analyze(VelocityRecord record, AnalysisOptions options) {
        int n = record.sampleCount();
        if (n < options.minimumSamples()) {
            throw new RecordFormatException(record.lineOf(n - 1), 0, String.format(Locale.ROOT, "the record ends"
                    + " after %d samples; the analysis needs at least %d (%s), that is %.4g s at %.4g Hz",
                    n, options.minimumSamples(), options.segmentLength() == 0
                            ? "8 Welch segments of " + WelchSpectrumEstimator.MIN_SEGMENT + " samples"
                            : "two Welch segments of " + options.segmentLength() + " samples",
                    options.minimumSamples() / record.samplingRate(), record.samplingRate()));
        }
        List<String> warnings = new ArrayList<>(record.notes());
        addGapWarnings(record, warnings);

        RecordCleaner.Result cleaned = new RecordCleaner(options.despike(), options.detrend(),
                options.spareSpikeNeighbours()).clean(record);
        VelocityRecord clean = cleaned.record();
        for (ComponentCleaning c : cleaned.report().components()) {
            if (!c.despikeConverged()) {
                warnings.add(c.component() + ": despiking stopped at its pass limit; spikes may remain");
            }
            if (c.replacedFraction() > SPIKE_FRACTION_WARNING) {
                warnings.add(String.format(Locale.ROOT, "%s: %.1f%% of samples replaced as spikes, above %.0f%%"
                        + " (our own threshold): the record's quality is doubtful", c.component(),
                        100 * c.replacedFraction(), 100 * SPIKE_FRACTION_WARNING));
            }
        }

        int m = clean.componentCount();
        double[] means = new double[m];
        double[] variances = new double[m];
        double meanSquare = 0;
        double varianceSum = 0;
        for (int c = 0; c < m; c++) {
            double[] x = clean.componentView(c);
            means[c] = StatUtils.mean(x);
            variances[c] = StatUtils.variance(x, means[c]);
            if (!(variances[c] > 0)) {
                throw new RecordFormatException(clean.lineOf(0), 0, "component '" + clean.componentNames().get(c)
                        + "' has no fluctuation left after cleaning (lines " + clean.lineOf(0) + " to "
                        + clean.lineOf(n - 1) + "); a velocity record must fluctuate (try switching detrending off"
                        + " if the record is a straight ramp)");
            }
            meanSquare += means[c] * means[c];
            varianceSum += variances[c];
        }
        double meanSpeed = Math.sqrt(meanSquare);
        double rms = Math.sqrt(varianceSum / m);
        List<ComponentStatistics> stats = new ArrayList<>();
        for (int c = 0; c < m; c++) {
            stats.add(new ComponentStatistics(clean.componentNames().get(c), means[c], Math.sqrt(variances[c]),
                    Math.sqrt(variances[c]) / meanSpeed));
        }

        boolean project = m > 1 && rms / meanSpeed <= options.smallSpeedLimit();
        double[] streamwise = project ? projectOnMeanFlow(clean, means, meanSpeed) : clean.component(0);
        String streamwiseRule = project ? "velocity projected on the mean-flow direction"
                : "component '" + clean.componentNames().get(0) + "'" + (m > 1
                ? " (mean speed small, so the mean-flow direction is ill-defined)" : "");

        Autocorrelation correlation = AutocorrelationEstimator.estimate(streamwise, clean.samplingRate());
        PowerSpectrum spectrum = options.segmentLength() == 0
                ? WelchSpectrumEstimator.estimate(streamwise, clean.samplingRate())
                : WelchSpectrumEstimator.estimate(streamwise, clean.samplingRate(), options.segmentLength());
        InertialRangeFitter.Outcome fitOutcome = options.fitBand() == null
                ? InertialRangeFitter.fitAutomatic(spectrum)
                : InertialRangeFitter.fitBand(spectrum, options.fitBand());
        warnings.addAll(fitOutcome.warnings());
        ScaleEstimates scales = ScaleRules.estimate(meanSpeed, rms, correlation, fitOutcome.fit(),
                fitOutcome.noiseLimitFrequency(), clean.samplingRate(), options);
        warnings.addAll(scales.warnings());

        int dimensions = m == 1 ? 3 : m;
        double[] componentRms = new double[dimensions];
        for (int c = 0; c < dimensions; c++) {
            componentRms[c] = m == 1 ? rms : Math.sqrt(variances[c]);
        }
        if (m == 1) {
            warnings.add("one velocity component measured: the turbulence is taken as isotropic in three dimensions,"
                    + " with every component's rms equal to the measured one");
        }

        List<Derivation> derivations = new ArrayList<>();
        derivations.add(new Derivation("sampling rate", clean.samplingRate(), "Hz", clean.hasTimeColumn()
                ? "1 / median time step" : "stated by the user", "measured"));
        derivations.add(new Derivation("samples", n, "", "rows read", "measured"));
        for (ComponentStatistics s : stats) {
            derivations.add(new Derivation("mean velocity, " + s.component(), s.mean(), "m/s",
                    "arithmetic mean after cleaning", "measured"));
            derivations.add(new Derivation("rms velocity, " + s.component(), s.rms(), "m/s",
                    "sample standard deviation after cleaning", "measured"));
        }
        derivations.add(new Derivation("mean speed", meanSpeed, "m/s", "U = magnitude of the mean velocity vector",
                "measured"));
        derivations.add(new Derivation("rms velocity", rms, "m/s", m == 1
                ? "u' = rms of the one measured component (isotropy assumed)"
                : "u' = sqrt(mean of the " + m + " component variances)", m == 1 ? "isotropy assumed" : "measured"));
        derivations.add(new Derivation("turbulence intensity", rms / meanSpeed, "", "u' / U", "measured"));
        derivations.add(new Derivation("dimensions", dimensions, "", m == 1
                ? "one component measured: three dimensions, isotropy assumed"
                : "number of measured components", "measured"));
        derivations.addAll(scales.derivations());

        return new RecordAnalysis(record, clean, cleaned.report(), stats, meanSpeed, rms, streamwiseRule,
                correlation, spectrum, fitOutcome, scales, dimensions, componentRms, derivations, warnings);
    }

    private static RecordReader reader(AnalysisOptions options) {
        return new RecordReader(options.statedSamplingRate(), options.gapFactor());
    }

    private static double[] projectOnMeanFlow(VelocityRecord record, double[] means, double meanSpeed) {
        int n = record.sampleCount();
        double[] out = new double[n];
        for (int c = 0; c < means.length; c++) {
            double[] x = record.componentView(c);
            double e = means[c] / meanSpeed;
            for (int i = 0; i < n; i++) {
                out[i] += e * x[i];
            }
        }
        return out;
    }

    private static void addGapWarnings(VelocityRecord record, List<String> warnings) {
        List<SamplingGap> gaps = record.gaps();
        if (gaps.isEmpty()) {
            return;
        }
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "%d gaps in the time column (steps above"
                + " the gap threshold); the analysis treats the samples as evenly spaced at %.6g Hz: ", gaps.size(),
                record.samplingRate()));
        for (int i = 0; i < Math.min(GAPS_LISTED, gaps.size()); i++) {
            s.append(i == 0 ? "" : "; ").append(gaps.get(i).describe());
        }
        if (gaps.size() > GAPS_LISTED) {
            s.append("; and ").append(gaps.size() - GAPS_LISTED).append(" more");
        }
        warnings.add(s.toString());
    }
}
