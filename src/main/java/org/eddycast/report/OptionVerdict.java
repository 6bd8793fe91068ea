package org.eddycast.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;

/**
 * The design question's answer in one sentence, naming the options by their own names: which option is mixed
 * first (when every option has the same first mixing figure: a blend time or a distance to mixed), else which
 * spreads the tracer fastest (mean eddy diffusivity over the axes); and whether the 95% intervals of the best
 * and the runner-up overlap. Overlapping intervals mean the runs cannot tell the two apart, not that they are
 * equal (common practice).
 */
public final class OptionVerdict {

    private OptionVerdict() {
    }

    /** One figure per option: value and interval. */
    private record Figure(String name, double value, double low, double high) {
    }

    /** The sentence; two or more options with a name each. */
    public static String sentence(List<String> names, List<StudyResult> options) {
        if (options.size() < 2 || names.size() != options.size()) {
            throw new IllegalArgumentException("a verdict needs two or more options with a name each; got "
                    + options.size() + " options and " + names.size() + " names");
        }
        String mixingName = commonMixingName(options);
        List<Figure> figures = new ArrayList<>();
        for (int o = 0; o < options.size(); o++) {
            if (mixingName != null) {
                Forecast.MixingFigure m = options.get(o).forecast().mixing().get(0);
                figures.add(new Figure(names.get(o), m.value(), m.low(), m.high()));
            } else {
                Headline.Figure d = Headline.meanDiffusivity(options.get(o));
                figures.add(new Figure(names.get(o), d.value(), d.low(), d.high()));
            }
        }
        // a smaller mixing figure is better; a larger diffusivity spreads faster
        Comparator<Figure> better = mixingName != null ? Comparator.comparingDouble(Figure::value)
                : Comparator.comparingDouble(Figure::value).reversed();
        List<Figure> ranked = new ArrayList<>(figures);
        ranked.sort(better);
        Figure best = ranked.get(0);
        Figure next = ranked.get(1);
        boolean overlap = best.low() <= next.high() && next.low() <= best.high();
        String unit = mixingName != null ? SummaryContent.unit(options.get(0).forecast().mixing().get(0).unit())
                : "m\u00b2/s";
        String what = mixingName != null ? shortName(mixingName) : "mean eddy diffusivity";
        double factor = mixingName != null ? next.value() / best.value() : best.value() / next.value();
        boolean distance = "m".equals(unit);
        String verb = mixingName == null ? "spreads the tracer fastest"
                : distance ? "is mixed across nearest the release" : "is mixed soonest";
        String others = String.join(", ", ranked.subList(1, ranked.size()).stream()
                .map(f -> SummaryContent.number(f.value()) + " " + unit + " for \u201c" + f.name() + "\u201d")
                .toList());
        return String.format(Locale.ROOT, "\u201c%s\u201d %s: %s %s %s against %s (%.2f times %s), and the 95%% "
                        + "intervals %s.", best.name(), verb, what, SummaryContent.number(best.value()), unit, others,
                factor, mixingName == null ? "as fast" : distance ? "nearer" : "sooner",
                overlap ? "overlap, so these runs cannot tell the two apart" : "do not overlap");
    }

    /** The first mixing figure's name when every option has the same one, else null. */
    static String commonMixingName(List<StudyResult> options) {
        String name = null;
        for (StudyResult o : options) {
            Forecast f = o.forecast();
            if (f == null || f.mixing().isEmpty()) {
                return null;
            }
            String n = f.mixing().get(0).name();
            if (name != null && !name.equals(n)) {
                return null;
            }
            name = n;
        }
        return name;
    }

    /** "blend time (every point within ...)" gives "blend time". */
    static String shortName(String name) {
        int bracket = name.indexOf(" (");
        return bracket > 0 ? name.substring(0, bracket) : name;
    }
}
