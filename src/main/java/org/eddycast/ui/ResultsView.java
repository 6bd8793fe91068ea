package org.eddycast.ui;

import java.awt.BorderLayout;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.forecast.Forecast;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.ChartSpecs;
import org.eddycast.report.Headline;
import org.eddycast.report.SpreadCurves;
import org.eddycast.report.SummaryContent;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.uncertainty.UncertaintySummary;

/**
 * The results side: the answer on top, then one row of tabs grouped by what a user looks for (the forecast
 * curves; the numbers; the handbook check; how well the run settled; the inputs, assumptions and cautions;
 * design options compared). Shows whatever a study result holds; the forecast results plug in through
 * {@link SummaryContent}.
 */
final class ResultsView extends JPanel {

    /** Tab indices. */
    static final int CURVES_TAB = 0;
    static final int TABLES_TAB = 1;
    static final int HANDBOOK_TAB = 2;
    static final int QUALITY_TAB = 3;
    static final int INPUTS_TAB = 4;
    static final int OPTIONS_TAB = 5;

    private static final String WIDTH = "Plume width";
    private static final String PEAK = "Peak concentration";
    private static final String STATIONS = "Concentration at the stations";
    private static final String RUNNING = "Running estimate of the eddy diffusivity";
    private static final String SPREAD = "Spread of the particle cloud";
    private static final String SPECTRUM = "Velocity spectrum of the record";
    private static final String AUTOCORRELATION = "Autocorrelation of the record";

    private final JTabbedPane tabs = new JTabbedPane();
    private final ChartDeck curves = new ChartDeck("curves", entries(
            WIDTH, "The forecast plume width appears here when a run finishes.",
            PEAK, "The forecast peak concentration appears here when a run finishes.",
            STATIONS, "In a channel with stations, the concentration against time at each appears here."));
    private final ChartDeck quality = new ChartDeck("quality", entries(
            RUNNING, "The running eddy diffusivity appears here while the simulation runs.",
            SPREAD, "The spread of the particle cloud appears here while the simulation runs.",
            SPECTRUM, "For the measured-record route, the record's spectrum appears here.",
            AUTOCORRELATION, "For the measured-record route, the record's autocorrelation appears here."));
    private final TextTable forecastTable = new TextTable("forecast");
    private final WrappingText mixing = new WrappingText("mixing");
    private final TextTable diffusivityTable = new TextTable("results");
    private final TextTable handbookTable = new TextTable("handbook");
    private final WrappingText handbookNotes = new WrappingText("handbookNotes");
    private final WrappingText qualityNotes = new WrappingText("qualityNotes");
    private final TextTable inputsTable = new TextTable("inputs");
    private final WrappingText reasoning = new WrappingText("reasoning");
    private final WrappingText banner = new WrappingText("banner");
    private final JLabel stale = new JLabel();
    /** The warnings given before the run, wrapping inside the panel. */
    private final WrappingText preflight = new WrappingText("preflight");
    private List<String> preflightWarnings = List.of();
    private final HeadlinePanel headline = new HeadlinePanel();
    private final OptionsView options = new OptionsView();
    /** Heads the inputs tab while the result has an uncertainty part; hidden otherwise. */
    private final SensitivityView sensitivity = new SensitivityView();
    private boolean movedToQuality;
    /** The tabs whose page scrolls: each shows its top again for a new result. */
    private final List<JScrollPane> pages = new ArrayList<>();
    private boolean hasResult;

    ResultsView() {
        super(new BorderLayout());
        banner.setBorder(BorderFactory.createEmptyBorder(4, 10, 2, 10));
        stale.setName("stale");
        stale.setVisible(false);
        styleStale();
        JPanel top = new JPanel(new MigLayout("insets 0, wrap 1, fillx, gapy 0, hidemode 3", "[grow,fill]"));
        top.add(banner, "wmin 10");
        top.add(stale, "wmin 10, gapx 8 8");
        preflight.setBorder(BorderFactory.createEmptyBorder(0, 10, 4, 10));
        preflight.setVisible(false);
        top.add(preflight, "wmin 10");
        top.add(headline, "wmin 10");
        add(top, BorderLayout.NORTH);
        tabs.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT);
        addTab("Curves", KeyEvent.VK_U, curves, "The forecast plume width and peak concentration over time or "
                + "distance, with their 95% bands");
        addTab("Tables", KeyEvent.VK_T, scrolled(column(
                heading("Forecast at selected points"), forecastTable.scroll(), mixing,
                heading("Eddy diffusivity and the figures of the run"), diffusivityTable.scroll())),
                "The forecast and the eddy diffusivity as numbers, each with its 95% interval and unit");
        addTab("Handbook", KeyEvent.VK_H, scrolled(column(handbookTable.scroll(), handbookNotes)),
                "Published handbook estimates beside the simulated values, with their ratio and whether they "
                        + "agree");
        addTab("Run quality", KeyEvent.VK_Q, column(quality, qualityNotes),
                "Whether the simulation ran long enough: the running estimate levelling off, the cloud's spread, "
                        + "the measured record's spectrum, and any warnings");
        JPanel inputsPage = column(sensitivity, heading("Inputs"), inputsTable.scroll(), reasoning);
        ((MigLayout) inputsPage.getLayout()).setComponentConstraints(sensitivity, "wmin 10, hidemode 3");
        sensitivity.setVisible(false);
        addTab("Inputs and cautions", KeyEvent.VK_I, scrolled(inputsPage), "The inputs this result was computed "
                + "from, how each value was obtained, and the cautions; with ranged inputs, how sure the answer "
                + "is and which input to measure better");
        addTab("Options", KeyEvent.VK_O, options, "Design options kept with Ctrl+K, compared side by side");
        add(tabs, BorderLayout.CENTER);
        showEmpty();
    }

    /** Adds a tab whose body stands over the one-line cautions footer that every results tab carries. */
    private void addTab(String title, int mnemonic, JComponent body, String tip) {
        JPanel page = new JPanel(new BorderLayout());
        page.add(body, BorderLayout.CENTER);
        page.add(new CautionFooter(this::showCautions), BorderLayout.SOUTH);
        tabs.addTab(title, null, page, tip);
        tabs.setMnemonicAt(tabs.getTabCount() - 1, mnemonic);
    }

    private static Map<String, String> entries(String... pairs) {
        Map<String, String> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put(pairs[i], pairs[i + 1]);
        }
        return m;
    }

    private static JLabel heading(String text) {
        JLabel l = new JLabel(text);
        l.putClientProperty("FlatLaf.styleClass", "h4");
        return l;
    }

    private static JPanel column(JComponent... parts) {
        JPanel p = new JPanel(new MigLayout("insets dialog, wrap 1, fillx", "[grow,fill]"));
        for (JComponent c : parts) {
            boolean grows = c instanceof ChartDeck;
            p.add(c, grows ? "grow, push, wmin 10, hmin 160" : "wmin 10");
        }
        if (parts.length > 0 && parts[0] instanceof ChartDeck) {
            ((MigLayout) p.getLayout()).setLayoutConstraints("insets 0, wrap 1, fill");
        }
        return p;
    }

    /** A page that scrolls down when the window is short, and follows the window's width. */
    private JScrollPane scrolled(JPanel page) {
        JScrollPane pane = ScrollPage.around(page);
        pages.add(pane);
        return pane;
    }

    private void styleStale() {
        java.awt.Color warn = UIManager.getColor("Component.warning.focusedBorderColor");
        stale.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 4, 0, 0,
                warn == null ? java.awt.Color.ORANGE : warn), BorderFactory.createEmptyBorder(3, 8, 3, 8)));
        stale.putClientProperty("FlatLaf.styleClass", "h4");
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (stale != null) {
            styleStale();
        }
    }

    /** Brings the full list of cautions into view: the Inputs and cautions tab, scrolled to the list. */
    void showCautions() {
        tabs.setSelectedIndex(INPUTS_TAB);
        reasoning.revalidate();
        javax.swing.SwingUtilities.invokeLater(() -> {
            int at = reasoning.getText().indexOf(Cautions.HEADING + "\n");
            try {
                java.awt.geom.Rectangle2D r = reasoning.modelToView2D(Math.max(0, at));
                if (r != null) {
                    java.awt.Rectangle view = r.getBounds();
                    view.height = Math.max(view.height, reasoning.getVisibleRect().height);
                    reasoning.scrollRectToVisible(view);
                }
            } catch (javax.swing.text.BadLocationException e) {
                // the text changed meanwhile: the tab is shown, which is what matters
            }
        });
    }

    /** Shows one chart of the Curves tab by its title (for tests and screenshots). */
    void showChart(String title) {
        curves.select(title);
    }

    /** The cautions footer of a tab (for tests). */
    CautionFooter footer(int tab) {
        return (CautionFooter) ((JPanel) tabs.getComponentAt(tab)).getComponent(1);
    }

    OptionsView options() {
        return options;
    }

    JTabbedPane tabs() {
        return tabs;
    }

    /**
     * Shows how sure the answer is under uncertain inputs at the head of the inputs tab, or hides that section
     * when the result has no uncertainty part (null).
     */
    void showUncertainty(UncertaintySummary u) {
        showUncertainty(u, org.eddycast.scenario.DisplayUnits.si());
    }

    /** As {@link #showUncertainty(UncertaintySummary)}, the figures in the scenario's display units. */
    void showUncertainty(UncertaintySummary u, org.eddycast.scenario.DisplayUnits units) {
        if (u != null) {
            sensitivity.show(u, units);
        }
        sensitivity.setVisible(u != null);
        revalidate();
    }

    /** The uncertainty part on view, or null. */
    UncertaintySummary uncertainty() {
        return sensitivity.isVisible() ? sensitivity.summary() : null;
    }

    SensitivityView sensitivity() {
        return sensitivity;
    }

    /** The charts currently available (for export). */
    List<ChartSpec> charts() {
        List<ChartSpec> list = new ArrayList<>(curves.charts());
        list.addAll(quality.charts());
        return list;
    }

    /** The eddy diffusivity table as text rows (for tests and the clipboard). */
    List<List<String>> tableRows() {
        return diffusivityTable.rows();
    }

    /** Every column heading of the result's tables (for tests: each has a tooltip). */
    List<String> columnHeadings() {
        List<String> all = new ArrayList<>();
        for (TextTable t : List.of(forecastTable, diffusivityTable, handbookTable, inputsTable)) {
            all.addAll(t.header());
        }
        return all;
    }

    /** The status line's text (for tests). */
    String bannerText() {
        return banner.getText();
    }

    /** Shows the warnings given before the run (an empty list hides them). */
    void showPreflight(List<String> warnings) {
        preflightWarnings = List.copyOf(warnings);
        StringBuilder text = new StringBuilder();
        for (String w : preflightWarnings) {
            text.append(text.length() == 0 ? "" : "\n").append("Before the run: ").append(w);
        }
        preflight.setText(text.toString());
        preflight.setVisible(!preflightWarnings.isEmpty());
    }

    /** The preflight warnings shown (for tests). */
    List<String> preflightShown() {
        return preflight.isVisible() ? preflightWarnings : List.of();
    }

    /** The stale-result banner's text, "" when the result is current (for tests). */
    String staleText() {
        return stale.isVisible() ? stale.getText() : "";
    }

    /** The headline as shown (for tests). */
    String headlineText() {
        return headline.text();
    }

    /** The forecast table's rows (for tests). */
    List<List<String>> forecastRows() {
        return forecastTable.rows();
    }

    /** The handbook table's rows (for tests). */
    List<List<String>> handbookRows() {
        return handbookTable.rows();
    }

    /** The assumptions and cautions as shown (for tests). */
    String reasoningText() {
        return reasoning.getText();
    }

    void showEmpty() {
        hasResult = false;
        banner.setText(" ");
        stale.setVisible(false);
        headline.show(null, "No result yet: fill in the form and press Run (Ctrl+R).");
        curves.set(WIDTH, null, "The forecast plume width appears here when a run finishes.");
        curves.set(PEAK, null, "The forecast peak concentration appears here when a run finishes.");
        curves.set(STATIONS, null, "In a channel with stations, the concentration against time at each appears here.");
        quality.set(RUNNING, null, "The running eddy diffusivity appears here while the simulation runs.");
        quality.set(SPREAD, null, "The spread of the particle cloud appears here while the simulation runs.");
        quality.set(SPECTRUM, null, null);
        quality.set(AUTOCORRELATION, null, null);
        forecastTable.show(SummaryContent.Table.EMPTY);
        handbookTable.show(SummaryContent.Table.EMPTY);
        diffusivityTable.show(SummaryContent.Table.EMPTY);
        inputsTable.show(SummaryContent.Table.EMPTY);
        mixing.setText("");
        handbookNotes.setText("");
        qualityNotes.setText("");
        reasoning.setText(cautionsText(List.of(), Cautions.ALL));
        showUncertainty(null);
    }

    /** Curves so far while a run is going. */
    void showPartial(SpreadCurves c, String status) {
        banner.setText(status);
        quality.set(SPREAD, ChartSpecs.spread(c, "Spread of the particle cloud (so far)"), null);
        quality.set(RUNNING, ChartSpecs.settling(c, null), null);
    }

    void showRunning(String status) {
        banner.setText(status);
        if (hasResult) {
            stale.setText("A new run is going: the answer below is the previous result's.");
            stale.setVisible(true);
        } else {
            headline.show(null, "The answer appears here when the run finishes.");
        }
        // the forecast tabs stay empty until the end: show the curves that fill in meanwhile
        if (tabs.getSelectedIndex() < QUALITY_TAB) {
            tabs.setSelectedIndex(QUALITY_TAB);
            quality.select(RUNNING);
            movedToQuality = true;
        }
    }

    /** Marks the result on view as out of date: the form changed or a run was cancelled since it was made. */
    void showStale(String why) {
        stale.setText("Inputs changed since this result" + (why == null ? "" : " (" + why + ")")
                + ": run again to update it.");
        stale.setVisible(true);
        revalidate();
    }

    void showResult(StudyResult s) {
        if (movedToQuality && tabs.getSelectedIndex() == QUALITY_TAB) {
            tabs.setSelectedIndex(CURVES_TAB);
        }
        movedToQuality = false;
        hasResult = true;
        stale.setVisible(false);
        DiffusivityResult r = s.diffusivity();
        SpreadCurves c = SpreadCurves.of(r);
        quality.set(SPREAD, ChartSpecs.spread(c, "Spread of the particle cloud"), null);
        quality.set(RUNNING, ChartSpecs.settling(c, r.axes()), null);
        if (s.flow().analysis() != null) {
            quality.set(SPECTRUM, ChartSpecs.spectrum(s.flow().analysis()), null);
            quality.set(AUTOCORRELATION, ChartSpecs.autocorrelation(s.flow().analysis()), null);
        } else {
            quality.set(SPECTRUM, null, "This route has no measured record.");
            quality.set(AUTOCORRELATION, null, "This route has no measured record.");
        }
        SummaryContent content = SummaryContent.of(s);
        diffusivityTable.show(rowsTable(List.of("quantity", "value", "95% interval", "unit"), content.results()));
        inputsTable.show(rowsTable(List.of("input", "value", "unit"), content.inputs()));
        showForecast(s, content);
        headline.show(Headline.of(s), null);
        reasoning.setText(cautionsText(content.assumptions(), content.cautions()));
        reasoning.setCaretPosition(0);
        showUncertainty(s.uncertainty(), s.scenario().forecast().units());
        List<String> warnings = new ArrayList<>(s.flow().warnings());
        warnings.addAll(r.warnings());
        qualityNotes.setText(warnings.isEmpty() ? "No warnings: the running estimate settled within the run."
                : "Warnings:\n" + String.join("\n", warnings.stream().map(w -> "\u2022 " + w).toList()));
        String how = r.fromCache()
                ? "reused an identical earlier simulation, no new run"
                : String.format(Locale.ROOT, "simulated in %.1f s", r.elapsedSeconds());
        banner.setText(String.format(Locale.ROOT, "Result of \"%s\" (%s)%s", s.scenario().name(), how,
                warnings.isEmpty() ? "" : ": " + warnings.size() + " warning" + (warnings.size() == 1 ? "" : "s")
                        + ", see Run quality"));
        pages.forEach(ScrollPage::toTop);
        revalidate();
        repaint();
    }

    private static SummaryContent.Table rowsTable(List<String> header, List<SummaryContent.Row> rows) {
        boolean interval = header.size() == 4;
        return new SummaryContent.Table(header, rows.stream().map(r -> interval
                ? List.of(r.quantity(), r.value(), r.interval(), r.unit())
                : List.of(r.quantity(), r.value(), r.unit())).toList());
    }

    private void showForecast(StudyResult s, SummaryContent content) {
        Forecast f = s.forecast();
        if (f == null) {
            curves.set(WIDTH, null, "This result carries no forecast.");
            curves.set(PEAK, null, "This result carries no forecast.");
            curves.set(STATIONS, null, "This result carries no forecast.");
            forecastTable.show(SummaryContent.Table.EMPTY);
            handbookTable.show(SummaryContent.Table.EMPTY);
            mixing.setText("This result carries no forecast.");
            handbookNotes.setText("No handbook estimate applies without a forecast.");
            return;
        }
        DisplayUnits units = s.scenario().forecast().units();
        curves.set(WIDTH, ChartSpecs.width(f, "Plume width", units), null);
        curves.set(PEAK, ChartSpecs.peak(f, units), null);
        if (s.answers() != null && !s.answers().stations().isEmpty()) {
            curves.set(STATIONS, ChartSpecs.stations(s.answers()), null);
        } else {
            curves.set(STATIONS, null, "No stations: in a channel, list them under forecast.stations (distances "
                    + "downstream) to see the concentration against time at each.");
        }
        forecastTable.show(content.forecastTable());
        StringBuilder sb = new StringBuilder();
        for (SummaryContent.Row row : content.forecast()) {
            sb.append(row.quantity()).append(": ").append(row.value());
            if (!row.unit().isEmpty()) {
                sb.append(' ').append(row.unit());
            }
            if (!row.interval().isEmpty()) {
                sb.append(", 95% interval ").append(row.interval()).append(' ').append(row.unit());
            }
            sb.append('\n');
        }
        sb.append("Widths are ").append(ChartSpecs.measureName(f))
                .append(f.measure() == org.eddycast.forecast.WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM
                        ? " (FWHM)" : "").append("; brackets hold the 95% band.");
        mixing.setText(sb.toString());
        handbookTable.show(content.handbook());
        // on screen: estimate, ratio, agreement and the two values; the long formula and source go to the notes
        if (!content.handbook().isEmpty()) {
            handbookTable.showInOrder(0, 4, 5, 2, 3, 1);
            handbookTable.hide(1);
        }
        List<String> notes = new ArrayList<>(content.handbookNotes());
        for (List<String> row : content.handbook().rows()) {
            notes.add(capitalized(row.get(0)) + ": " + row.get(1) + ".");
        }
        handbookNotes.setText(notes.isEmpty() ? "No handbook estimate applies to this flow route."
                : String.join("\n\n", notes));
    }

    private static String capitalized(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static String cautionsText(List<String> assumptions, List<String> cautions) {
        StringBuilder sb = new StringBuilder();
        if (!assumptions.isEmpty()) {
            sb.append("How this result was obtained\n");
            for (String a : assumptions) {
                sb.append("\u2022 ").append(a).append('\n');
            }
            sb.append('\n');
        }
        sb.append(Cautions.HEADING).append('\n');
        for (String c : cautions) {
            sb.append("\u2022 ").append(c).append('\n');
        }
        return sb.toString();
    }
}
