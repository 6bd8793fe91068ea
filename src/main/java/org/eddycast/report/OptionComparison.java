package org.eddycast.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;
import org.eddycast.stats.SlopeEstimate;

/**
 * Two or more design options side by side: the eddy diffusivity per axis of each, whether each differs from
 * the first option (their 95% intervals do not overlap), and a verdict in plain words. Non-overlapping 95%
 * intervals are a conservative test of a difference (common practice); overlapping ones mean the runs cannot
 * tell the options apart, not that they are equal.
 *
 * @param names   the options' names, the first is the reference
 * @param axes    axis names
 * @param values  values[option][axis] with their intervals
 * @param differs differs[option][axis]: interval does not overlap the reference's
 * @param verdict the verdict in plain words
 */
public record OptionComparison(List<String> names, List<String> axes, List<List<SlopeEstimate>> values,
                               List<List<Boolean>> differs, String verdict) {

    /** Compares the options; the first is the reference. */
    public static OptionComparison of(List<String> names, List<StudyResult> options) {
        if (options.size() < 2 || names.size() != options.size()) {
            throw new IllegalArgumentException("a comparison needs two or more options with a name each; got "
                    + options.size() + " options and " + names.size() + " names");
        }
        int axes = options.stream().mapToInt(o -> o.diffusivity().axes().size()).min().orElse(0);
        List<String> axisNames = new ArrayList<>();
        for (int a = 0; a < axes; a++) {
            axisNames.add(options.get(0).diffusivity().axes().get(a).axisName());
        }
        List<List<SlopeEstimate>> values = new ArrayList<>();
        List<List<Boolean>> differs = new ArrayList<>();
        StringBuilder verdict = new StringBuilder();
        for (int o = 0; o < options.size(); o++) {
            List<SlopeEstimate> v = new ArrayList<>();
            List<Boolean> d = new ArrayList<>();
            double meanRatio = 0;
            boolean anyDiff = false;
            for (int a = 0; a < axes; a++) {
                SlopeEstimate e = options.get(o).diffusivity().axes().get(a).diffusivity();
                SlopeEstimate ref = options.get(0).diffusivity().axes().get(a).diffusivity();
                v.add(e);
                boolean apart = o > 0 && (e.low() > ref.high() || e.high() < ref.low());
                d.add(apart);
                anyDiff |= apart;
                meanRatio += e.value() / ref.value() / axes;
            }
            values.add(v);
            differs.add(d);
            if (o > 0) {
                verdict.append(mixingSentence(names.get(o), names.get(0), options.get(o), options.get(0)));
                boolean shared = options.get(o).diffusivity().fromCache();
                if (shared && Math.abs(meanRatio - 1) > 1e-9) {
                    verdict.append(String.format(Locale.ROOT, "\"%s\" spreads the tracer %s than \"%s\": its eddy "
                                    + "diffusivity is %.2f times as large. Both come from one simulation (the same "
                                    + "dimensionless case) scaled to each option's units, so the ratio carries no "
                                    + "sampling error. ", names.get(o), meanRatio > 1 ? "faster" : "slower",
                            names.get(0), meanRatio));
                } else if (shared) {
                    verdict.append(String.format(Locale.ROOT, "\"%s\" and \"%s\" share one simulation (the same "
                                    + "dimensionless case): their eddy diffusivities differ only by the units "
                                    + "(ratio %.2f), so any difference between them comes from the geometry or the "
                                    + "release, as the mixing figures show. ", names.get(o), names.get(0),
                            meanRatio));
                } else if (anyDiff) {
                    verdict.append(String.format(Locale.ROOT, "\"%s\" spreads the tracer %s than \"%s\": on average"
                                    + " %.2f times its eddy diffusivity, a difference the 95%% intervals resolve. ",
                            names.get(o), meanRatio > 1 ? "faster" : "slower", names.get(0), meanRatio));
                } else {
                    verdict.append(String.format(Locale.ROOT, "\"%s\" and \"%s\" cannot be told apart with these "
                                    + "runs (the 95%% intervals overlap; ratio %.2f): run more particles to "
                                    + "separate them. ", names.get(o), names.get(0), meanRatio));
                }
            }
        }
        return new OptionComparison(List.copyOf(names), axisNames, values.stream().map(List::copyOf).toList(),
                differs.stream().map(List::copyOf).toList(), verdict.toString().trim());
    }

    /** "name: blend time 427 s against 646 s." when both options have the same first mixing figure. */
    private static String mixingSentence(String name, String reference, StudyResult option, StudyResult first) {
        Forecast fo = option.forecast();
        Forecast fr = first.forecast();
        if (fo == null || fr == null || fo.mixing().isEmpty() || fr.mixing().isEmpty()
                || !fo.mixing().get(0).name().equals(fr.mixing().get(0).name())) {
            return "";
        }
        Forecast.MixingFigure a = fo.mixing().get(0);
        Forecast.MixingFigure b = fr.mixing().get(0);
        boolean overlap = a.low() <= b.high() && b.low() <= a.high();
        boolean distance = "m".equals(a.unit());
        String which = a.value() < b.value() ? (distance ? "nearer the source" : "sooner")
                : (distance ? "farther downstream" : "later");
        double factor = a.value() < b.value() ? b.value() / a.value() : a.value() / b.value();
        return String.format(Locale.ROOT, "%s: %.4g %s [%.4g, %.4g] for \"%s\" against %.4g %s [%.4g, %.4g] for "
                        + "\"%s\"; \"%s\" is mixed %.2f times %s, and the intervals %s. ", capitalized(a.name()),
                a.value(), a.unit(), a.low(), a.high(), name, b.value(), b.unit(), b.low(), b.high(), reference, name,
                factor, which, overlap ? "overlap" : "do not overlap");
    }

    private static String capitalized(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
