package org.eddycast.propagation;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.function.DoubleConsumer;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.engine.ToolVersion;
import org.eddycast.particles.Cancellation;
import org.eddycast.forecast.RuleSpreads;
import org.eddycast.particles.RunCancelledException;
import org.eddycast.scenario.InputRange;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioWriter;
import org.eddycast.scenario.TankFlow;
import org.eddycast.uncertainty.InputDistribution;
import org.eddycast.uncertainty.SaltelliDesign;

/**
 * A sweep over a scenario's input ranges: Saltelli's design over the ranged inputs (Saltelli et al. 2010, Comput.
 * Phys. Commun. 181:259), one scenario per row, the whole chain run for each (field stage, transport stage,
 * answers) and the headline figures read from it. Every run uses the scenario's own seed, so that the runs differ
 * by their inputs and not by their particles' noise (common random numbers): the spread over the rows is the
 * inputs' doing. After the design's rows comes one more, the centre: the scenario's own inputs at the sweep's
 * particle count, the reference that ties the sweep's runs (which may follow fewer particles) to the scenario's
 * own run. Any range of rows can run in any process; the result of a row does not depend on which others run
 * beside it.
 */
public final class SweepPlan {

    private final Scenario scenario;
    private final ScenarioSampler sampler;
    private final List<InputDistribution> distributions = new ArrayList<>();
    private final SaltelliDesign design;
    private final List<HeadlineFigure> figures;
    private final String fingerprint;
    private List<Scenario> scenarios;
    private List<DimensionlessCase> cases;
    private int fieldSimulations;

    /**
     * Plans the sweep of a scenario whose inputs carry ranges.
     *
     * @throws ScenarioException when the scenario has no ranges or a range is not valid for its input
     */
    public SweepPlan(Scenario scenario) {
        if (!scenario.uncertainty().ranged()) {
            throw new ScenarioException("the scenario's inputs carry no ranges: add an \"uncertainty\" block with "
                    + "\"ranges\" to sweep it");
        }
        this.scenario = scenario;
        this.sampler = new ScenarioSampler(scenario);
        double[] nominal = sampler.nominal();
        for (int i = 0; i < nominal.length; i++) {
            try {
                distributions.add(InputDistributions.of(resolved(scenario, sampler.ranges().get(i)), nominal[i]));
            } catch (IllegalArgumentException e) {
                throw new ScenarioException("uncertainty.ranges[" + i + "] (" + sampler.inputs().get(i) + "): "
                        + e.getMessage());
            }
        }
        this.design = new SaltelliDesign(scenario.uncertainty().baseSamples(), nominal.length);
        this.figures = HeadlineFigure.forScenario(scenario);
        this.fingerprint = fingerprint(scenario);
    }

    /**
     * A range as it is sampled: "the rule's spread" becomes the rule's stated plus-or-minus fraction, with the
     * rule's basis where the user gave none.
     *
     * @throws ScenarioException when the input's rule states no spread
     */
    static InputRange resolved(Scenario s, InputRange r) {
        if (r.shape() != InputRange.Shape.RULE) {
            return r;
        }
        RuleSpreads.Spread spread = s.flow() instanceof TankFlow ? RuleSpreads.tank(r.input()) : null;
        if (spread == null) {
            throw new ScenarioException(r.input() + ": \"spread\": \"rule\" needs a rule that states its spread; "
                    + "those that do: " + String.join(", ", new java.util.TreeSet<>(RuleSpreads.tankInputs()))
                    + " (tanks). Give plusMinus, low and high, or a distribution instead");
        }
        return InputRange.plusMinus(r.input(), spread.fraction(), r.basis().isEmpty() ? spread.basis() : r.basis());
    }

    /** The scenario swept. */
    public Scenario scenario() {
        return scenario;
    }

    /** The ranged inputs' paths, in column order. */
    public List<String> inputs() {
        return sampler.inputs();
    }

    /** Each input's value in the scenario itself. */
    public double[] nominal() {
        return sampler.nominal();
    }

    /** Each input's distribution, in column order. */
    public List<InputDistribution> distributions() {
        return List.copyOf(distributions);
    }

    /** The sampling design. */
    public SaltelliDesign design() {
        return design;
    }

    /** The figures read from every run, main one first. */
    public List<HeadlineFigure> figures() {
        return figures;
    }

    /** Identifies the scenario, its ranges and the build: parts of one sweep carry the same. */
    public String fingerprint() {
        return fingerprint;
    }

    /**
     * The field-stage simulations the latest {@link #run} made: fewer than its rows where rows share a
     * dimensionless case (an input that does not enter the field stage, such as the feed point).
     */
    public int fieldSimulations() {
        return fieldSimulations;
    }

    /** The rows of the sweep: the design's, then the centre. */
    public int rows() {
        return design.rows() + 1;
    }

    /** The centre row: the scenario's own inputs. */
    public int centreRow() {
        return design.rows();
    }

    /** The first row of shard {@code k} of {@code n} (1-based k): the rows are split into near-equal runs. */
    public int shardStart(int k, int n) {
        return (int) ((long) rows() * (k - 1) / n);
    }

    /** One past the last row of shard {@code k} of {@code n}. */
    public int shardEnd(int k, int n) {
        return (int) ((long) rows() * k / n);
    }

    /**
     * The scenario of one row.
     *
     * @throws ScenarioException naming the row's inputs and values when they give a scenario that cannot run
     */
    public Scenario scenarioAt(int row) {
        return sampler.at(point(row));
    }

    /** The inputs' values at one row. */
    public double[] point(int row) {
        return row == centreRow() ? sampler.nominal() : design.point(row, distributions);
    }

    /**
     * Runs rows {@code from} to {@code to} (exclusive). Every row's scenario is made and checked before anything
     * is simulated, so an input range that reaches an invalid value stops the sweep at once, naming it.
     *
     * @param progress told the fraction of the rows done, 0 to 1
     * @throws ScenarioException       when a row's scenario cannot run
     * @throws RunCancelledException   when cancelled
     */
    public SweepPart run(int from, int to, int threads, DoubleConsumer progress, Cancellation cancel) {
        if (from < 0 || to > rows() || from > to) {
            throw new IllegalArgumentException("rows " + from + " to " + to + " of " + rows());
        }
        prepare();
        SharedFieldStage field = new SharedFieldStage(cases, from, to);
        double[][] responses = new double[to - from][];
        double[][] halfWidths = new double[to - from][];
        for (int row = from; row < to; row++) {
            if (cancel.isCancelled()) {
                throw new RunCancelledException();
            }
            int done = row - from;
            int count = to - from;
            StudyResult r = Engine.run(scenarios.get(row), threads,
                    (fraction, partial) -> progress.accept((done + fraction) / count), cancel, true,
                    field.forRow(row));
            double[] values = new double[figures.size()];
            double[] widths = new double[figures.size()];
            for (int f = 0; f < values.length; f++) {
                double[] figure = figures.get(f).of(r);
                values[f] = figure[0];
                widths[f] = (figure[2] - figure[1]) / 2;
            }
            responses[row - from] = values;
            halfWidths[row - from] = widths;
        }
        progress.accept(1.0);
        fieldSimulations = field.simulated();
        return new SweepPart(fingerprint, ScenarioWriter.text(scenario), design.baseSamples(), inputs(), figureKeys(),
                rows(), from, responses, halfWidths);
    }

    /**
     * Makes every row's scenario and its field stage's dimensionless case, once: a range that reaches a value its
     * input cannot take stops the sweep here, before anything is simulated.
     *
     * @throws ScenarioException naming the row's inputs and values
     */
    public void prepare() {
        if (cases != null) {
            return;
        }
        checkTails();
        List<Scenario> sampled = new ArrayList<>(rows());
        List<DimensionlessCase> made = new ArrayList<>(rows());
        for (int row = 0; row < rows(); row++) {
            Scenario s = scenarioAt(row);
            sampled.add(s);
            made.add(Engine.dimensionlessCase(s));
        }
        scenarios = sampled;
        cases = made;
    }

    /** The share of each tail a range must keep valid, whatever the sample happens to draw. */
    static final double TAIL = 0.001;

    /**
     * Checks each input at its 0.1% and 99.9% quantiles, the others at their scenario values: a range whose tail
     * reaches a value its input cannot take (a normal range on a length that reaches below zero) is refused even
     * when a small sample would miss that tail.
     */
    private void checkTails() {
        double[] nominal = sampler.nominal();
        for (int i = 0; i < nominal.length; i++) {
            for (double u : new double[] {TAIL, 1 - TAIL}) {
                double[] point = nominal.clone();
                point[i] = distributions.get(i).quantile(u);
                sampler.at(point);
            }
        }
    }

    /** The figures' keys, in response order. */
    public List<String> figureKeys() {
        List<String> keys = new ArrayList<>();
        for (HeadlineFigure f : figures) {
            keys.add(f.key());
        }
        return keys;
    }

    private static String fingerprint(Scenario s) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(ScenarioWriter.text(s).getBytes(StandardCharsets.UTF_8));
            sha.update(("|" + ToolVersion.get()).getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(sha.digest()).substring(0, 24);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
