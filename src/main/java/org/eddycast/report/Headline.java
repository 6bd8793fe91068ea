package org.eddycast.report;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;
import org.eddycast.stats.AxisEstimate;

/**
 * The answer a result opens with: one line of text and a few labelled figures, each with its value, its 95%
 * interval and its unit. Plain data: the window shows it in large type at the top of the results, the sheet on
 * its first page.
 *
 * <p>Filled from the forecast's first mixing figure (a blend time or a distance to mixed across the width) with
 * its interval; without one, from the mean eddy diffusivity over the axes with the mean of the axes' interval
 * ends (a screening figure: the axes' intervals are not combined statistically).
 *
 * @param text    the answer in one sentence
 * @param figures the figures behind it, the most important first
 * @param howSure for a scenario with input ranges, how sure the answer is (both intervals of the main figure and
 *                the input it is most sensitive to), in one line; empty otherwise
 */
public record Headline(String text, List<Figure> figures, String howSure) {

    /** A headline without input ranges. */
    public Headline(String text, List<Figure> figures) {
        this(text, figures, "");
    }

    /**
     * One labelled figure.
     *
     * @param label what it is, in words
     * @param value its value
     * @param low   the low end of its 95% interval (NaN for none)
     * @param high  the high end of its 95% interval (NaN for none)
     * @param unit  its unit as printed
     */
    public record Figure(String label, double value, double low, double high, String unit) {

        /** The value, the interval in brackets when there is one, and the unit: "42.1 [38.5, 46.0] s". */
        public String valueText() {
            String v = SummaryContent.number(value);
            if (!Double.isNaN(low) && !Double.isNaN(high)) {
                v += " [" + SummaryContent.number(low) + ", " + SummaryContent.number(high) + "]";
            }
            return unit.isEmpty() ? v : v + " " + unit;
        }
    }

    public Headline {
        figures = List.copyOf(figures);
    }

    /**
     * The headline of one study: the answer sentence of its question (the stations, the blend time, in the
     * scenario's display units) when the result has one, with how sure it is for a scenario with input ranges,
     * and the figures below.
     */
    public static Headline of(StudyResult s) {
        Headline built = built(s);
        String text = built.text();
        if (s.answers() != null && s.answers().headline() != null && !s.answers().headline().isBlank()) {
            text = s.answers().headline();
        }
        // how sure the answer is follows it at once, each interval named for what it covers
        String howSure = s.uncertainty() == null ? ""
                : UncertaintyText.headlineLine(s.uncertainty(), s.scenario().forecast().units());
        return new Headline(text, built.figures(), howSure);
    }

    private static Headline built(StudyResult s) {
        Forecast f = s.forecast();
        if (f != null && !f.mixing().isEmpty()) {
            Forecast.MixingFigure m = f.mixing().get(0);
            Figure first = new Figure(m.name(), m.value(), m.low(), m.high(), SummaryContent.unit(m.unit()));
            List<Figure> figures = new ArrayList<>(List.of(first));
            figures.add(meanDiffusivity(s));
            return new Headline(capitalized(firstWords(m.name())) + ": about " + SummaryContent.number(m.value())
                    + " " + first.unit() + " (95% interval " + SummaryContent.number(m.low()) + " to "
                    + SummaryContent.number(m.high()) + " " + first.unit() + ").", figures);
        }
        Figure d = meanDiffusivity(s);
        return new Headline("Mean eddy diffusivity: " + SummaryContent.number(d.value()) + " " + d.unit()
                + " (95% interval " + SummaryContent.number(d.low()) + " to " + SummaryContent.number(d.high())
                + " " + d.unit() + ").", List.of(d));
    }

    /** The mean over the axes of the eddy diffusivity and of its interval's ends. */
    static Figure meanDiffusivity(StudyResult s) {
        List<AxisEstimate> axes = s.diffusivity().axes();
        double v = 0;
        double lo = 0;
        double hi = 0;
        for (AxisEstimate a : axes) {
            v += a.diffusivity().value();
            lo += a.diffusivity().low();
            hi += a.diffusivity().high();
        }
        int n = Math.max(1, axes.size());
        return new Figure("mean eddy diffusivity over " + axes.size() + " axes", v / n, lo / n, hi / n,
                "m\u00b2/s");
    }

    /** A mixing figure's name up to its explanation in brackets: "blend time (every point ...)" gives "blend time". */
    private static String firstWords(String name) {
        int bracket = name.indexOf(" (");
        return bracket > 0 ? name.substring(0, bracket) : name;
    }

    private static String capitalized(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
