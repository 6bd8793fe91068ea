package org.eddycast.propagation;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.eddycast.engine.Answers;
import org.eddycast.engine.StudyResult;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankFlow;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.Estimate;
import org.eddycast.transport.Passage;
import org.eddycast.transport.TankStageResult;

/**
 * A figure the headline gives, read from one run with its Monte Carlo interval: the value a sweep samples. The
 * first figure of a study is its main one, the one the sensitivity indices rank the inputs for.
 *
 * @param key   a stable name for outside readers
 * @param label the figure in words
 * @param unit  its SI unit
 * @param read  reads the figure from a run: value, low and high of its 95% Monte Carlo interval (NaN when it
 *              has none); a value not determined is NaN
 */
public record HeadlineFigure(String key, String label, String unit, Function<StudyResult, double[]> read) {

    /** The figure of one run: {value, low, high}. */
    public double[] of(StudyResult r) {
        return read.apply(r);
    }

    /**
     * The figures of a study's headline, main one first: a channel's peak and its time at the first station, the
     * distance to mixed across the width and the longitudinal dispersion coefficient; a tank's 95% blend time;
     * otherwise the eddy diffusivity along the first axis.
     */
    public static List<HeadlineFigure> forScenario(Scenario s) {
        List<HeadlineFigure> figures = new ArrayList<>();
        if (s.flow() instanceof ChannelFlow) {
            if (!s.forecast().stations().isEmpty()) {
                figures.add(new HeadlineFigure("stationPeak", "peak at the first station", "kg/m^3",
                        r -> passage(r, p -> new double[] {p.peak(), p.peakLow(), p.peakHigh()})));
                figures.add(new HeadlineFigure("stationPeakTime", "time of the peak at the first station", "s",
                        r -> passage(r, p -> new double[] {p.peakTime(), Double.NaN, Double.NaN})));
            }
            figures.add(new HeadlineFigure("distanceToMixedWidth", "distance to mixed across the width", "m",
                    r -> channel(r, ChannelStageResult::distanceToMixedWidth)));
            figures.add(new HeadlineFigure("longitudinalDispersion", "longitudinal dispersion coefficient",
                    "m^2/s", r -> channel(r, ChannelStageResult::longitudinalDispersion)));
        } else if (s.flow() instanceof TankFlow) {
            figures.add(new HeadlineFigure("blendTime95", "95% blend time", "s",
                    r -> r.transport() instanceof TankStageResult t ? estimate(t.blendTime95()) : missing()));
        } else {
            figures.add(new HeadlineFigure("eddyDiffusivity", "eddy diffusivity along x", "m^2/s",
                    HeadlineFigure::firstAxis));
        }
        return List.copyOf(figures);
    }

    private static double[] passage(StudyResult r, Function<Passage, double[]> read) {
        List<Answers.StationAnswer> stations = r.answers().stations();
        return stations.isEmpty() ? missing() : read.apply(stations.get(0).passage());
    }

    private static double[] channel(StudyResult r, Function<ChannelStageResult, Estimate> read) {
        return r.transport() instanceof ChannelStageResult c ? estimate(read.apply(c)) : missing();
    }

    private static double[] firstAxis(StudyResult r) {
        AxisEstimate a = r.diffusivity().axes().get(0);
        return a.determined() ? new double[] {a.diffusivity().value(), a.diffusivity().low(), a.diffusivity().high()}
                : missing();
    }

    private static double[] estimate(Estimate e) {
        return e.determined() ? new double[] {e.value(), e.low(), e.high()} : missing();
    }

    private static double[] missing() {
        return new double[] {Double.NaN, Double.NaN, Double.NaN};
    }
}
