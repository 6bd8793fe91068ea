package org.eddycast.uncertainty;

import java.util.List;

/**
 * How sure a study's headline figures are once its inputs are uncertain: each ranged input, each figure's Monte
 * Carlo interval beside its input-uncertainty range, and the inputs ranked by their share of the main figure's
 * variance. Plain data, in SI units; knows nothing of the physics that produced it.
 *
 * @param inputs           the ranged inputs, in the order of the sampling design's columns
 * @param baseSamples      N, the design's base sample
 * @param runs             runs made: N (k + 2) for k inputs
 * @param particles        particles each run followed in the field stage
 * @param figures          the headline figures with both intervals; the first is the main figure
 * @param sensitivity      the inputs' indices for the main figure, ordered by total index, largest first
 * @param advice           one sentence: which input to measure better and what that would give
 * @param notes            what the reader must know about these figures
 */
public record UncertaintySummary(List<RangedInput> inputs, int baseSamples, int runs, int particles,
                                 List<FigureRange> figures, List<SensitivityIndex> sensitivity, String advice,
                                 List<String> notes) {

    public UncertaintySummary {
        inputs = List.copyOf(inputs);
        figures = List.copyOf(figures);
        sensitivity = List.copyOf(sensitivity);
        notes = List.copyOf(notes);
    }

    /** The same summary with one more note. */
    public UncertaintySummary withNote(String note) {
        List<String> more = new java.util.ArrayList<>(notes);
        more.add(note);
        return new UncertaintySummary(inputs, baseSamples, runs, particles, figures, sensitivity, advice, more);
    }

    /** The figure the sensitivity indices are for. */
    public FigureRange mainFigure() {
        return figures.get(0);
    }

    /**
     * One ranged input.
     *
     * @param input        its path in the scenario file, such as {@code flow.bedSlope}
     * @param nominal      the value the single run used
     * @param distribution the distribution in words, such as "uniform 0.40 to 0.50"
     * @param basis        where the range comes from (may be empty)
     */
    public record RangedInput(String input, double nominal, String distribution, String basis) {
    }

    /**
     * One headline figure with its two intervals, each named for what it covers.
     *
     * @param key     a stable name for outside readers, such as {@code blendTime95}
     * @param label   the figure in words
     * @param unit    its SI unit
     * @param nominal the single run's value
     * @param mcLow   the low end of its Monte Carlo 95% interval (the particles' noise only)
     * @param mcHigh  the high end
     * @param mean    the mean over the sampled inputs
     * @param p05     the 5th percentile over the sampled inputs
     * @param p50     the median
     * @param p95     the 95th percentile
     * @param noiseShare the share of the sample's variance that is the sampled runs' own Monte Carlo noise (their
     *                mean squared standard error over the sample's variance, at most 1), NaN when the figure
     *                has no Monte Carlo interval
     */
    public record FigureRange(String key, String label, String unit, double nominal, double mcLow, double mcHigh,
                              double mean, double p05, double p50, double p95, double noiseShare) {
    }

    /**
     * One input's Sobol indices for the main figure, with 95% half-widths.
     *
     * @param input          the input's path
     * @param first          first-order index: the share of the variance the input explains alone
     * @param firstHalfWidth its 95% half-width
     * @param total          total index: the share it explains with all its interactions
     * @param totalHalfWidth its 95% half-width
     */
    public record SensitivityIndex(String input, double first, double firstHalfWidth, double total,
                                   double totalHalfWidth) {
    }
}
