package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.forecast.Forecast;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.SlopeEstimate;

/**
 * Two or more design options side by side: which spreads the tracer faster, by how much, and whether the 95%
 * intervals overlap. "Faster" is judged by the mean of the per-axis eddy diffusivities, and, where every option
 * has one, by the first time or distance to mixed.
 */
public final class OptionComparison {

    private OptionComparison() {
    }

    /** The mean diffusivity over the axes with its interval (intervals averaged, a conservative band). */
    public static SlopeEstimate meanDiffusivity(StudyResult s) {
        double v = 0;
        double lo = 0;
        double hi = 0;
        List<AxisEstimate> axes = s.diffusivity().axes();
        for (AxisEstimate a : axes) {
            v += a.diffusivity().value() / axes.size();
            lo += a.diffusivity().low() / axes.size();
            hi += a.diffusivity().high() / axes.size();
        }
        return new SlopeEstimate(v, Double.NaN, lo, hi, 0, 0, 0);
    }

    /** Plain sentences comparing the options, fastest first. */
    public static List<String> verdict(List<StudyResult> options) {
        List<String> lines = new ArrayList<>();
        if (options.size() < 2) {
            lines.add("one option only: nothing to compare");
            return lines;
        }
        int best = 0;
        for (int i = 1; i < options.size(); i++) {
            if (meanDiffusivity(options.get(i)).value() > meanDiffusivity(options.get(best)).value()) {
                best = i;
            }
        }
        SlopeEstimate b = meanDiffusivity(options.get(best));
        for (int i = 0; i < options.size(); i++) {
            if (i == best) {
                continue;
            }
            SlopeEstimate o = meanDiffusivity(options.get(i));
            boolean overlap = b.low() <= o.high() && o.low() <= b.high();
            lines.add(String.format(Locale.ROOT,
                    "\"%s\" spreads the tracer faster than \"%s\": mean eddy diffusivity %.4g against %.4g m^2/s, "
                            + "%.2f times as large; the 95%% intervals %s.",
                    options.get(best).scenario().name(), options.get(i).scenario().name(), b.value(), o.value(),
                    b.value() / o.value(), overlap ? "overlap, so the difference is not established by these runs "
                            + "(use more particles or a precision target)" : "do not overlap"));
            Forecast fb = options.get(best).forecast();
            Forecast fo = options.get(i).forecast();
            if (fb != null && fo != null && !fb.mixing().isEmpty() && !fo.mixing().isEmpty()
                    && fb.mixing().get(0).name().equals(fo.mixing().get(0).name())) {
                Forecast.MixingFigure mb = fb.mixing().get(0);
                Forecast.MixingFigure mo = fo.mixing().get(0);
                lines.add(String.format(Locale.ROOT, "%s: %.4g %s against %.4g %s.", mb.name(), mb.value(), mb.unit(),
                        mo.value(), mo.unit()));
            }
        }
        return lines;
    }
}
