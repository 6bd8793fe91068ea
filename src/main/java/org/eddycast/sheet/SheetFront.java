package org.eddycast.sheet;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.engine.StudyResult;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.Headline;
import org.eddycast.report.OptionVerdict;
import org.eddycast.report.SummaryContent;

/**
 * What the sheet's first page says before any detail: the question the scenario asks, the answer (the
 * headline and its figures), the key inputs, and the one chart that shows the answer best.
 *
 * @param question  the scenario's question in one or two sentences
 * @param answer    the answer in one sentence
 * @param figures   the figures behind the answer, as "label: value [interval] unit"
 * @param keyInputs the inputs, release point included, as rows of (input, value with unit)
 * @param chart     the chart for the first page, or null
 */
public record SheetFront(String question, String answer, List<String> figures, List<List<String>> keyInputs,
                         ChartSpec chart) {

    public SheetFront {
        figures = List.copyOf(figures);
        keyInputs = keyInputs.stream().map(List::copyOf).toList();
    }

    /** The front of one study's sheet. */
    public static SheetFront of(StudyResult r, SummaryContent content, List<ChartSpec> charts) {
        Headline h = Headline.of(r);
        List<String> figures = new ArrayList<>();
        if (!h.howSure().isEmpty()) {
            figures.add(h.howSure());
        }
        for (Headline.Figure f : h.figures()) {
            figures.add(capitalized(f.label()) + ": " + f.valueText());
        }
        List<List<String>> inputs = new ArrayList<>();
        for (SummaryContent.Row row : content.inputs()) {
            inputs.add(List.of(row.quantity(), (row.value() + " " + unitShown(row.unit())).trim()));
        }
        return new SheetFront(question(r.scenario().description(), r.scenario().flow().kind()), h.text(), figures,
                inputs, charts.isEmpty() ? null : charts.get(0));
    }

    /** The front of a comparison sheet: the question, the one-sentence verdict, the options' chart. */
    public static SheetFront ofOptions(List<String> names, List<StudyResult> options, List<ChartSpec> charts) {
        StudyResult first = options.get(0);
        return new SheetFront(question(first.scenario().description(), first.scenario().flow().kind()),
                OptionVerdict.sentence(names, options), List.of(), List.of(),
                charts.isEmpty() ? null : charts.get(0));
    }

    /**
     * The scenario's question: the first sentence of its description that asks one, without the notes for
     * testers; a question in general words for the flow route when the description asks none.
     */
    static String question(String description, String route) {
        for (String sentence : description.split("(?<=[.?!])\\s+")) {
            if (sentence.endsWith("?")) {
                return sentence;
            }
        }
        return switch (route) {
            case "tank" -> "How long until a dose is blended through the tank?";
            case "channel" -> "How wide does the tracer cloud grow downstream, and where is it mixed across the "
                    + "width?";
            default -> "How fast does the turbulence spread a released tracer?";
        };
    }

    private static String unitShown(String unit) {
        return unit.equals("-") ? "" : SummaryContent.unit(unit);
    }

    private static String capitalized(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
