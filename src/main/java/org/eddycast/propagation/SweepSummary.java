package org.eddycast.propagation;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.eddycast.engine.DisplayFormat;
import org.eddycast.engine.StudyResult;
import org.eddycast.scenario.InputRange;
import org.eddycast.uncertainty.NarrowingAdvice;
import org.eddycast.uncertainty.SampleSummary;
import org.eddycast.uncertainty.SobolIndices;
import org.eddycast.uncertainty.UncertaintySummary;
import org.eddycast.uncertainty.UncertaintySummary.FigureRange;
import org.eddycast.uncertainty.UncertaintySummary.RangedInput;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;

/**
 * Merges a sweep's parts and summarises them: each figure's spread over the sampled inputs (from the design's
 * A and B rows, 2N independent points) and the inputs' Sobol indices for the main figure. The same parts give the
 * same summary to the bit, in whatever order and however split they come.
 */
public final class SweepSummary {

    /** Seed of the bootstrap behind the indices' half-widths: fixed, so a summary is reproducible. */
    static final long BOOTSTRAP_SEED = 20100101L;

    private SweepSummary() {
    }

    /**
     * Puts parts back in row order, checking that they are of this sweep and cover every row exactly once.
     *
     * @throws IllegalArgumentException naming what does not fit
     */
    public static Merged merge(SweepPlan plan, List<SweepPart> parts) {
        int rows = plan.rows();
        double[][] responses = new double[rows][];
        double[][] halfWidths = new double[rows][];
        for (SweepPart p : parts) {
            if (!p.fingerprint().equals(plan.fingerprint())) {
                throw new IllegalArgumentException("a part (rows " + p.from() + " to " + (p.to() - 1)
                        + ") is of another scenario, ranges or build (" + p.fingerprint() + ", this sweep is "
                        + plan.fingerprint() + ")");
            }
            for (int i = 0; i < p.responses().length; i++) {
                int row = p.from() + i;
                if (responses[row] != null) {
                    throw new IllegalArgumentException("row " + row + " is in two parts: give each shard once");
                }
                responses[row] = p.responses()[i];
                halfWidths[row] = p.halfWidths()[i];
            }
        }
        List<String> missing = new ArrayList<>();
        for (int row = 0; row < rows && missing.size() < 5; row++) {
            if (responses[row] == null) {
                missing.add(Integer.toString(row));
            }
        }
        if (!missing.isEmpty()) {
            throw new IllegalArgumentException("rows " + String.join(", ", missing) + (missing.size() == 5 ? ", ..." : "")
                    + " of " + rows + " are in no part: run the missing shards");
        }
        return new Merged(responses, halfWidths);
    }

    /**
     * A whole sweep's rows, in row order.
     *
     * @param responses  every row's figures
     * @param halfWidths their 95% Monte Carlo half-widths
     */
    public record Merged(double[][] responses, double[][] halfWidths) {
    }

    /**
     * The summary of a whole sweep.
     *
     * @param merged    every row's figures and their half-widths, in row order
     * @param nominal   the scenario's own run (its value and Monte Carlo interval sit beside the ranges), or null
     */
    public static UncertaintySummary summarise(SweepPlan plan, Merged merged, StudyResult nominal) {
        double[][] responses = merged.responses();
        int n = plan.design().baseSamples();
        List<HeadlineFigure> figures = plan.figures();
        double[] centre = responses[plan.centreRow()];
        List<FigureRange> ranges = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        List<String> scalings = new ArrayList<>();
        for (int f = 0; f < figures.size(); f++) {
            HeadlineFigure figure = figures.get(f);
            double[] own = nominal == null ? new double[] {centre[f], Double.NaN, Double.NaN} : figure.of(nominal);
            double scale = scale(own[0], centre[f]);
            if (nominal != null && scale != 1) {
                scalings.add(String.format(Locale.ROOT, "%s %.3f", figure.label(), scale));
            }
            double[] sample = determined(responses, 0, 2 * n, f);
            for (int i = 0; i < sample.length; i++) {
                sample[i] *= scale;
            }
            if (sample.length < 2 * n) {
                notes.add(String.format(Locale.ROOT, "%s was not determined in %d of the %d sampled runs; its "
                        + "range is over the others", figure.label(), 2 * n - sample.length, 2 * n));
            }
            SampleSummary s = sample.length == 0 ? null : SampleSummary.of(sample);
            double noise = noiseShare(sample, merged.halfWidths(), 2 * n, f, scale);
            if (noise > NOISY) {
                notes.add(String.format(Locale.ROOT, "about %.0f%% of the variance of the %s over the inputs is the "
                        + "sampled runs' own particle noise: raise uncertainty.particles to separate the inputs' "
                        + "effect from it", 100 * noise, figure.label()));
            }
            ranges.add(new FigureRange(figure.key(), figure.label(), figure.unit(), own[0], own[1], own[2],
                    s == null ? Double.NaN : s.mean(), s == null ? Double.NaN : s.p05(),
                    s == null ? Double.NaN : s.p50(), s == null ? Double.NaN : s.p95(), noise));
        }
        List<SensitivityIndex> indices = new ArrayList<>();
        String advice = "";
        double[] main = determined(responses, 0, plan.design().rows(), 0);
        if (main.length == plan.design().rows()) {
            SobolIndices sobol = SobolIndices.estimate(plan.design(), main, BOOTSTRAP_SEED);
            for (int i = 0; i < plan.inputs().size(); i++) {
                indices.add(new SensitivityIndex(plan.inputs().get(i), sobol.first()[i], sobol.firstHalfWidth()[i],
                        sobol.total()[i], sobol.totalHalfWidth()[i]));
            }
            indices.sort(Comparator.comparingDouble(SensitivityIndex::total).reversed());
            FigureRange m = ranges.get(0);
            DisplayFormat format = new DisplayFormat(plan.scenario().forecast().units());
            advice = NarrowingAdvice.sentence(plan.inputs(), sobol.total(), m.p05(), m.p95(),
                    x -> format.ofUnit(m.unit(), x));
        } else {
            notes.add("the sensitivity indices need the main figure from every run; some runs did not determine it");
        }
        int particles = plan.scenario().uncertainty().particles();
        notes.add(String.format(Locale.ROOT, "input ranges: Saltelli's design with N = %d base samples and a centre "
                + "run at the scenario's own inputs, %d runs of %d particles each, every run with the scenario's "
                + "seed; the 5-95%% range is over the design's 2N = %d independent points", n, plan.rows(), particles,
                2 * n));
        if (nominal == null) {
            notes.add("each figure's value here is the centre run's (at the sweep's particle count); the scenario's "
                    + "own run, with its particles, gives the value its Monte Carlo interval belongs to");
        } else if (!scalings.isEmpty()) {
            notes.add("the sweep's runs follow fewer particles than the scenario's own run; each of their figures is "
                    + "scaled by the own run's value over the centre run's, so that the range is centred as the own "
                    + "run is (" + String.join(", ", scalings) + ")");
        }
        notes.add(String.format(Locale.ROOT, "Sobol indices: first-order by Saltelli et al. (2010), total by "
                + "Jansen (1999), 95%% half-widths by bootstrap over the base samples; with N = %d they rank the "
                + "inputs coarsely (a larger sweep narrows them)", n));
        return new UncertaintySummary(rangedInputs(plan), n, plan.rows(), particles, ranges, indices, advice, notes);
    }

    /** The noise share above which a figure's range is said to be more the runs' noise than the inputs'. */
    static final double NOISY = 0.25;

    /**
     * The share of the sample's variance that the runs' own Monte Carlo noise explains: the mean of the rows'
     * squared standard errors (95% half-width over 1.96) over the sample variance, at most 1; NaN when the figure
     * has no interval.
     */
    static double noiseShare(double[] sample, double[][] halfWidths, int rows, int f, double scale) {
        double sum = 0;
        int count = 0;
        for (int row = 0; row < rows; row++) {
            double h = halfWidths[row][f] * scale / 1.96;
            if (Double.isFinite(h)) {
                sum += h * h;
                count++;
            }
        }
        if (count == 0 || sample.length < 2) {
            return Double.NaN;
        }
        double variance = new org.apache.commons.math3.stat.descriptive.moment.Variance().evaluate(sample);
        return variance > 0 ? Math.min(1, sum / count / variance) : 1;
    }

    /**
     * The factor that ties a sweep run's figure to the scenario's own run: own over centre, 1 where either is
     * missing or the centre is zero.
     */
    static double scale(double own, double centre) {
        if (!Double.isFinite(own) || !Double.isFinite(centre) || centre == 0) {
            return 1;
        }
        return own / centre;
    }

    private static List<RangedInput> rangedInputs(SweepPlan plan) {
        List<RangedInput> out = new ArrayList<>();
        double[] nominal = plan.nominal();
        for (int i = 0; i < nominal.length; i++) {
            InputRange r = SweepPlan.resolved(plan.scenario(), plan.scenario().uncertainty().ranges().get(i));
            out.add(new RangedInput(r.input(), nominal[i], plan.distributions().get(i).describe(), r.basis()));
        }
        return out;
    }

    private static double[] determined(double[][] responses, int from, int to, int f) {
        return java.util.Arrays.stream(responses, from, to).mapToDouble(r -> r[f]).filter(Double::isFinite)
                .toArray();
    }
}
