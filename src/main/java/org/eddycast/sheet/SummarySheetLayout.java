package org.eddycast.sheet;

import org.eddycast.report.SummaryContent;
import org.eddycast.report.ChartSpec;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.eddycast.uncertainty.UncertaintySummary;

/**
 * Lays the summary sheet out on A4 pages (points, 1/72 inch) and draws any page into a Graphics2D. The PDF
 * writer and the printer use this one layout, so paper and screen say the same. Page 1 is a complete summary on
 * its own: the question, the answer, the key inputs with the release point, one chart, the key assumptions and
 * the cautions. The detail pages follow: every input and result, the forecast table, the handbook comparison,
 * the other charts, every assumption and the methods; their charts shrink a little rather than leave a last
 * page nearly empty. Text is set in {@link SheetFonts} (embedded in the PDF).
 */
public final class SummarySheetLayout {

    /** A4 page size in points. */
    public static final double PAGE_WIDTH = 595.28;
    public static final double PAGE_HEIGHT = 841.89;
    static final double MARGIN = 48;
    /** A last page filled less than this is nearly empty. */
    static final double NEARLY_EMPTY = 0.25;

    private static final Font TITLE = SheetFonts.bold(16);
    private static final Font ANSWER = SheetFonts.bold(13);
    private static final Font HEADING = SheetFonts.bold(11);
    private static final Font BODY = SheetFonts.regular(9);
    private static final Font SMALL = SheetFonts.regular(8);
    private static final Color INK = new Color(0x22, 0x22, 0x22);
    private static final Color RULE = new Color(0x1f, 0x6f, 0x8b);
    private static final Color ANSWER_BACKGROUND = new Color(0xe8, 0xf1, 0xf5);

    /** Something drawn at a height on a page. */
    private interface Block {
        double height();

        void draw(Graphics2D g, double x, double y, double width);
    }

    private final List<List<Block>> pages = new ArrayList<>();
    private final String footer;
    private final List<String> pageOne = new ArrayList<>();
    private final String title;
    private final String toolVersion;
    /** The inputs' ranking under uncertain inputs, or null. */
    private final Block ranking;
    /**
     * The section on uncertain inputs (heading, the figures' two intervals, the ranking), empty without an
     * uncertainty part: on page 1 when it fits, else at the top of page 2 with the advice left on page 1.
     */
    private final List<Block> uncertaintySection = new ArrayList<>();
    private final String advice;

    /**
     * @param content the sheet's text
     * @param front   what page 1 says
     * @param charts  the charts for the detail pages (at most {@link #MAX_CHARTS})
     */
    public SummarySheetLayout(SummaryContent content, SheetFront front, List<ChartSpec> charts) {
        this(content, front, charts, null);
    }

    /**
     * @param content     the sheet's text
     * @param front       what page 1 says
     * @param charts      the charts for the detail pages (at most {@link #MAX_CHARTS})
     * @param uncertainty the study's uncertainty part, or null; its ranking of the inputs (a
     *                    {@link SensitivityChart} with the advice) goes on page 1 when it fits, else at the top of
     *                    page 2
     */
    public SummarySheetLayout(SummaryContent content, SheetFront front, List<ChartSpec> charts,
                              UncertaintySummary uncertainty) {
        this(content, front, charts, uncertainty, org.eddycast.scenario.DisplayUnits.si());
    }

    /** As the four-argument form, the uncertain figures in the scenario's display units. */
    public SummarySheetLayout(SummaryContent content, SheetFront front, List<ChartSpec> charts,
                              UncertaintySummary uncertainty, org.eddycast.scenario.DisplayUnits units) {
        ranking = uncertainty == null || uncertainty.sensitivity().isEmpty() ? null
                : rankingChart(uncertainty, PAGE_WIDTH - 2 * MARGIN);
        advice = uncertainty == null ? "" : uncertainty.advice();
        if (uncertainty != null) {
            uncertaintySection.add(heading("Uncertain inputs: how wide the answer is, and which input to measure "
                    + "better"));
            uncertaintySection.add(table(UncertaintyTables.figures(uncertainty, units), null, PAGE_WIDTH - 2 * MARGIN,
                    SMALL));
            if (ranking != null) {
                uncertaintySection.add(ranking);
            }
        }
        String name = content.scenarioName().length() > 60 ? content.scenarioName().substring(0, 57) + "..."
                : content.scenarioName();
        footer = "eddycast " + content.toolVersion() + " \u2014 " + name + " \u2014 "
                + content.date() + " \u2014 screening estimate";
        title = content.title() + ": " + content.scenarioName();
        toolVersion = content.toolVersion();
        double width = PAGE_WIDTH - 2 * MARGIN;
        pages.add(frontPage(content, front, width));
        List<ChartSpec> detailCharts = charts.subList(0, Math.min(MAX_CHARTS, charts.size()));
        // charts shrink in steps until the last page is not nearly empty (or they reach their smallest)
        List<List<Block>> detail = List.of();
        List<Block> detailUncertainty = pages.get(0).containsAll(uncertaintySection) ? List.of()
                : uncertaintySection;
        for (double chartHeight = 300; chartHeight >= 180; chartHeight -= 20) {
            detail = paginate(detailBlocks(content, detailCharts, detailUncertainty, width, chartHeight));
            if (detail.isEmpty() || fill(detail.get(detail.size() - 1)) >= NEARLY_EMPTY || detail.size() == 1
                    && detailCharts.isEmpty()) {
                break;
            }
        }
        pages.addAll(detail);
    }

    /** How full a page (0-based) is: its content's height over the usable height. */
    public double pageFill(int page) {
        return fill(pages.get(page));
    }

    /** The page (0-based) that shows the inputs' ranking, or -1 when the sheet has none. */
    public int rankingPage() {
        for (int p = 0; p < pages.size(); p++) {
            if (ranking != null && pages.get(p).contains(ranking)) {
                return p;
            }
        }
        return -1;
    }

    /** The document's title. */
    public String title() {
        return title;
    }

    /** The version of the tool that made the result. */
    public String toolVersion() {
        return toolVersion;
    }

    /** What page 1 says, as text in reading order (for tests). */
    public List<String> pageOneText() {
        return List.copyOf(pageOne);
    }

    private List<Block> frontPage(SummaryContent content, SheetFront front, double width) {
        double usable = PAGE_HEIGHT - 2 * MARGIN;
        List<Block> top = new ArrayList<>();
        top.add(text(content.title(), TITLE, width, 4));
        top.add(text((content.sideBySide().isEmpty() ? "Scenario: " : "Options: ") + content.scenarioName(),
                HEADING, width, 2));
        top.add(text("Flow route: " + content.route() + ".   Computed " + content.date() + " with eddycast "
                + content.toolVersion() + ". Detail from page 2.", BODY, width, 4));
        top.add(heading("Question"));
        top.add(text(front.question(), BODY, width, 4));
        top.add(answerBox(front, width));
        // the advice under the answer, unless the whole section on uncertain inputs fits further down
        Block adviceLine = advice.isBlank() ? null
                : text(advice + " The figures' ranges and the inputs' ranking: page 2.", BODY, width, 4);
        if (adviceLine != null) {
            top.add(adviceLine);
        }
        if (!front.keyInputs().isEmpty()) {
            top.add(heading("Key inputs"));
            top.add(table(pairs(front.keyInputs()), PAIR_COLUMNS, width, BODY));
        } else if (!content.sideBySide().isEmpty()) {
            top.add(heading("Where the options differ (* : 95% interval does not overlap the first option's)"));
            top.add(table(differing(content.sideBySide()), null, width, SMALL));
            top.add(text("What the options share, and every input side by side: page 2.", SMALL, width, 2));
        }
        List<Block> bottom = new ArrayList<>();
        bottom.add(heading("Cautions"));
        for (String c : content.cautions()) {
            bottom.add(text("\u2022 " + c, SMALL, width, 1));
        }
        double used = sum(top) + sum(bottom);
        // the key assumptions: the first ones listed, as many as leave room for a useful chart
        List<Block> assumptions = new ArrayList<>();
        List<String> all = content.assumptions();
        int shown = 0;
        double chartMin = front.chart() == null ? 0 : 130;
        for (String a : all.subList(0, Math.min(KEY_ASSUMPTIONS, all.size()))) {
            Block b = text("\u2022 " + a, SMALL, width, 1);
            if (used + 24 + sum(assumptions) + b.height() + 14 + chartMin > usable) {
                break;
            }
            assumptions.add(b);
            shown++;
        }
        List<Block> page = new ArrayList<>(top);
        if (shown > 0) {
            page.add(heading("Key assumptions"));
            page.addAll(assumptions);
            page.add(text(all.size() > shown ? "All " + all.size() + " assumptions and how each value was obtained:"
                    + " page 2 on." : "How each value was obtained: page 2 on.", SMALL, width, 2));
        }
        double room = usable - sum(page) - sum(bottom);
        double frontChartMin = front.chart() == null ? 0 : 130;
        double freed = adviceLine == null ? 0 : adviceLine.height();
        if (!uncertaintySection.isEmpty() && room + freed - sum(uncertaintySection) >= frontChartMin) {
            page.remove(adviceLine);
            page.addAll(uncertaintySection);
            room += freed - sum(uncertaintySection);
        }

        if (front.chart() != null && room >= 120) {
            page.add(chart(front.chart(), width, Math.min(260, room - 8)));
        }
        page.addAll(bottom);
        pageOne.add(front.question());
        pageOne.add(front.answer());
        pageOne.addAll(front.figures());
        if (!advice.isBlank()) {
            pageOne.add(advice);
        }
        pageOne.addAll(content.cautions());
        return page;
    }

    /** The answer in large type on a tinted band, its figures below it. */
    private static Block answerBox(SheetFront front, double width) {
        List<Block> inner = new ArrayList<>();
        inner.add(text(front.answer(), ANSWER, width - 16, 3));
        for (String f : front.figures()) {
            inner.add(text(f, BODY, width - 16, 1));
        }
        double h = sum(inner) + 14;
        return new Block() {
            @Override
            public double height() {
                return h + 6;
            }

            @Override
            public void draw(Graphics2D g, double x, double y, double w) {
                g.setColor(ANSWER_BACKGROUND);
                g.fill(new Rectangle2D.Double(x, y + 4, w, h));
                g.setColor(RULE);
                g.fill(new Rectangle2D.Double(x, y + 4, 3, h));
                double at = y + 11;
                for (Block b : inner) {
                    b.draw(g, x + 10, at, w - 16);
                    at += b.height();
                }
            }
        };
    }

    /** The rows of a side-by-side table whose cells are not the same for every option. */
    private static SummaryContent.Table differing(SummaryContent.Table sideBySide) {
        List<List<String>> rows = sideBySide.rows().stream()
                .filter(r -> r.subList(1, r.size()).stream().distinct().count() > 1).toList();
        return new SummaryContent.Table(sideBySide.header(), rows);
    }

    /** Rows of (input, value) set two to a line: (input, value, input, value). */
    private static SummaryContent.Table pairs(List<List<String>> rows) {
        List<List<String>> out = new ArrayList<>();
        int half = (rows.size() + 1) / 2;
        for (int i = 0; i < half; i++) {
            List<String> line = new ArrayList<>(rows.get(i));
            line.addAll(i + half < rows.size() ? rows.get(i + half) : List.of("", ""));
            out.add(line);
        }
        return new SummaryContent.Table(List.of("input", "value", "input", "value"), out);
    }

    private static List<Block> detailBlocks(SummaryContent content, List<ChartSpec> charts, List<Block> uncertainty,
                                            double width, double chartHeight) {
        // the section on uncertain inputs, when it did not fit on page 1, opens page 2
        List<Block> blocks = new ArrayList<>(uncertainty);
        if (!content.sideBySide().isEmpty()) {
            blocks.add(heading("Verdict in full"));
            blocks.add(text(content.verdict(), BODY, width, 4));
            blocks.add(heading("Options side by side (* : 95% interval does not overlap the first option's)"));
            blocks.add(table(content.sideBySide(), null, width, BODY));
        }
        if (!content.inputs().isEmpty()) {
            blocks.add(heading("Inputs"));
            blocks.add(table(rows(List.of("input", "value", "", "unit"), content.inputs()), ROW_COLUMNS, width,
                    BODY));
        }
        if (!content.results().isEmpty()) {
            blocks.add(heading("Results (95% intervals over independent groups of particles)"));
            blocks.add(table(rows(List.of("quantity", "value", "95% interval", "unit"), content.results()),
                    ROW_COLUMNS, width, BODY));
        }
        if (content.sideBySide().isEmpty()) {
            blocks.add(heading("Forecast"));
            if (content.forecast().isEmpty()) {
                blocks.add(text("Plume width, peak concentration and time or distance to mixed are not part of "
                        + "this sheet: this result carries no forecast.", BODY, width, 4));
            } else {
                blocks.add(table(rows(List.of("forecast", "value", "95% interval", "unit"), content.forecast()),
                        ROW_COLUMNS, width, BODY));
                blocks.add(new Caption(text("Forecast at selected points (widths in the measure named above, FWHM "
                        + "standing for full width at half maximum; the full grid is in the JSON output):", BODY, width, 2)));
                blocks.add(table(content.forecastTable(), content.forecastTable().header().size() == 7
                        ? DISTANCE_TABLE_COLUMNS : TIME_TABLE_COLUMNS, width, SMALL));
            }
        }
        if (!content.handbook().isEmpty()) {
            blocks.add(heading("Handbook comparison (neither value adjusted to match the other)"));
            blocks.add(table(content.handbook(), HANDBOOK_COLUMNS, width, SMALL));
            for (String n : content.handbookNotes()) {
                blocks.add(text("\u2022 " + n, BODY, width, 2));
            }
        } else if (content.sideBySide().isEmpty() && !content.forecast().isEmpty()) {
            blocks.add(heading("Handbook comparison"));
            blocks.add(text("No handbook estimate applies to this flow route.", BODY, width, 4));
        }
        for (ChartSpec c : charts) {
            blocks.add(chart(c, width, chartHeight));
        }
        blocks.add(heading("Assumptions and how values were obtained"));
        for (String a : content.assumptions()) {
            blocks.add(text("\u2022 " + a, BODY, width, 2));
        }
        blocks.add(heading("Methods"));
        for (String r : content.references()) {
            blocks.add(text(r, SMALL, width, 1));
        }
        return blocks;
    }

    private static double sum(List<Block> blocks) {
        return blocks.stream().mapToDouble(Block::height).sum();
    }

    private static double fill(List<Block> page) {
        return sum(page) / (PAGE_HEIGHT - 2 * MARGIN);
    }

    /** The key assumptions page 1 shows at most: the general ones every forecast lists first. */
    static final int KEY_ASSUMPTIONS = 5;

    /** Column starts for (input, value, input, value). */
    private static final double[] PAIR_COLUMNS = {0, 0.25, 0.52, 0.77};

    /** The most charts a sheet draws. */
    public static final int MAX_CHARTS = 3;

    /** Column starts (fractions of the text width) for quantity, value, interval, unit rows. */
    private static final double[] ROW_COLUMNS = {0, 0.42, 0.62, 0.86};

    /** Column starts for the handbook table: the formula and source get the most room. */
    private static final double[] HANDBOOK_COLUMNS = {0, 0.15, 0.38, 0.56, 0.74, 0.86};

    /** Column starts for a forecast table over distance (distance, time, three widths, peak, source). */
    private static final double[] DISTANCE_TABLE_COLUMNS = {0, 0.13, 0.22, 0.39, 0.55, 0.71, 0.87};

    /** Column starts for a forecast table over time (time, three widths, peak, source). */
    private static final double[] TIME_TABLE_COLUMNS = {0, 0.1, 0.29, 0.48, 0.67, 0.85};

    /** A block kept on the same page as the block after it. */
    private record Caption(Block inner) implements Block {
        @Override
        public double height() {
            return inner.height();
        }

        @Override
        public void draw(Graphics2D g, double x, double y, double w) {
            inner.draw(g, x, y, w);
        }
    }

    private static SummaryContent.Table rows(List<String> header, List<SummaryContent.Row> rows) {
        return new SummaryContent.Table(header, rows.stream()
                .map(r -> List.of(r.quantity(), r.value(), r.interval(), r.unit())).toList());
    }

    /** The number of pages. */
    public int pageCount() {
        return pages.size();
    }

    /** Draws one page (0-based) with its top-left corner at the origin, in points. */
    public void drawPage(Graphics2D g, int page) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        double width = PAGE_WIDTH - 2 * MARGIN;
        double y = MARGIN;
        for (Block b : pages.get(page)) {
            b.draw(g, MARGIN, y, width);
            y += b.height();
        }
        g.setFont(SMALL);
        g.setColor(INK);
        g.drawString(footer + " \u2014 page " + (page + 1) + " of " + pages.size(), (float) MARGIN,
                (float) (PAGE_HEIGHT - MARGIN / 2));
    }

    private static List<List<Block>> paginate(List<Block> blocks) {
        List<List<Block>> pages = new ArrayList<>();
        double usable = PAGE_HEIGHT - 2 * MARGIN;
        List<Block> page = new ArrayList<>();
        double used = 0;
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            // keep a heading with what follows it: blocks are never split, so with all of it when that fits a page
            double need = b.height() + ((b instanceof Heading || b instanceof Caption) && i + 1 < blocks.size()
                    ? Math.min(blocks.get(i + 1).height(), usable - b.height()) : 0);
            if (used + need > usable && !page.isEmpty()) {
                pages.add(page);
                page = new ArrayList<>();
                used = 0;
            }
            page.add(b);
            used += b.height();
        }
        if (!page.isEmpty()) {
            pages.add(page);
        }
        return pages;
    }

    private static FontMetrics metrics(Font f) {
        Graphics2D g = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
        try {
            return g.getFontMetrics(f);
        } finally {
            g.dispose();
        }
    }

    /** Wraps text into lines no wider than the width. */
    static List<String> wrap(String text, FontMetrics fm, double width) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.isEmpty() ? word : line + " " + word;
            if (fm.stringWidth(candidate) > width && !line.isEmpty()) {
                lines.add(line.toString());
                line = new StringBuilder("  " + word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        lines.add(line.toString());
        return lines;
    }

    private static Block text(String s, Font font, double width, double after) {
        FontMetrics fm = metrics(font);
        List<String> lines = wrap(s, fm, width);
        double lineHeight = fm.getHeight();
        return new Block() {
            @Override
            public double height() {
                return lines.size() * lineHeight + after;
            }

            @Override
            public void draw(Graphics2D g, double x, double y, double w) {
                g.setFont(font);
                g.setColor(INK);
                for (int i = 0; i < lines.size(); i++) {
                    g.drawString(lines.get(i), (float) x, (float) (y + fm.getAscent() + i * lineHeight));
                }
            }
        };
    }

    private record Heading(String text) implements Block {
        @Override
        public double height() {
            return 24;
        }

        @Override
        public void draw(Graphics2D g, double x, double y, double w) {
            g.setColor(RULE);
            g.fill(new Rectangle2D.Double(x, y + 6, w, 1.2));
            g.setFont(HEADING);
            g.setColor(INK);
            g.drawString(text, (float) x, (float) (y + 20));
        }
    }

    private static Block heading(String s) {
        return new Heading(s);
    }

    /**
     * A table whose cells wrap onto as many lines as they need, so nothing is cut off. Column starts are
     * fractions of the width; null spreads the columns evenly, the first one a little wider.
     */
    private static Block table(SummaryContent.Table table, double[] starts, double width, Font font) {
        int columns = table.header().size();
        double[] at = starts != null ? starts : evenColumns(columns);
        FontMetrics fm = metrics(font);
        FontMetrics bold = metrics(SheetFonts.bold(font.getSize2D()));
        double lineHeight = fm.getHeight();
        List<List<List<String>>> cells = new ArrayList<>();
        List<List<String>> header = new ArrayList<>();
        int headerLines = 1;
        for (int c = 0; c < columns; c++) {
            List<String> lines = wrapCell(table.header().get(c), bold, columnWidth(at, c, width));
            header.add(lines);
            headerLines = Math.max(headerLines, lines.size());
        }
        List<Integer> heights = new ArrayList<>();
        for (List<String> row : table.rows()) {
            List<List<String>> wrapped = new ArrayList<>();
            int lines = 1;
            for (int c = 0; c < columns; c++) {
                List<String> l = wrapCell(row.get(c), fm, columnWidth(at, c, width));
                wrapped.add(l);
                lines = Math.max(lines, l.size());
            }
            cells.add(wrapped);
            heights.add(lines);
        }
        int totalLines = heightsSum(heights) + headerLines;
        int finalHeaderLines = headerLines;
        return new Block() {
            @Override
            public double height() {
                return totalLines * lineHeight + 2 * table.rows().size() + 8;
            }

            @Override
            public void draw(Graphics2D g, double x, double y, double w) {
                g.setColor(INK);
                g.setFont(SheetFonts.bold(font.getSize2D()));
                for (int c = 0; c < columns; c++) {
                    List<String> lines = header.get(c);
                    for (int i = 0; i < lines.size(); i++) {
                        g.drawString(lines.get(i), (float) (x + at[c] * w),
                                (float) (y + fm.getAscent() + i * lineHeight));
                    }
                }
                g.setFont(font);
                double top = y + finalHeaderLines * lineHeight + 2;
                for (int r = 0; r < cells.size(); r++) {
                    double rowHeight = heights.get(r) * lineHeight + 2;
                    if (r % 2 == 0) {
                        g.setColor(new Color(0xf1, 0xf4, 0xf6));
                        g.fill(new Rectangle2D.Double(x, top, w, rowHeight));
                    }
                    g.setColor(INK);
                    for (int c = 0; c < columns; c++) {
                        List<String> lines = cells.get(r).get(c);
                        for (int i = 0; i < lines.size(); i++) {
                            g.drawString(lines.get(i), (float) (x + at[c] * w),
                                    (float) (top + 1 + fm.getAscent() + i * lineHeight));
                        }
                    }
                    top += rowHeight;
                }
            }
        };
    }

    private static int heightsSum(List<Integer> heights) {
        return heights.stream().mapToInt(Integer::intValue).sum();
    }

    private static double[] evenColumns(int n) {
        double[] at = new double[n];
        double first = n > 1 ? 1.4 / (n + 0.4) : 1;
        for (int c = 1; c < n; c++) {
            at[c] = first + (c - 1) * (1 - first) / (n - 1);
        }
        return at;
    }

    private static double columnWidth(double[] at, int c, double width) {
        return ((c + 1 < at.length ? at[c + 1] : 1) - at[c]) * width - 5;
    }

    /** Wraps a cell at spaces; a word longer than the column is broken where it must be. */
    static List<String> wrapCell(String text, FontMetrics fm, double width) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            while (fm.stringWidth(word) > width && word.length() > 1) {
                int cut = word.length() - 1;
                while (cut > 1 && fm.stringWidth(word.substring(0, cut)) > width) {
                    cut--;
                }
                if (!line.isEmpty()) {
                    lines.add(line.toString());
                    line = new StringBuilder();
                }
                lines.add(word.substring(0, cut));
                word = word.substring(cut);
            }
            String candidate = line.isEmpty() ? word : line + " " + word;
            if (fm.stringWidth(candidate) > width && !line.isEmpty()) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        lines.add(line.toString());
        return lines;
    }

    /** The inputs' ranking with the advice under it, sized to the number of inputs. */
    private static Block rankingChart(UncertaintySummary u, double width) {
        return drawing(Math.min(340, 150 + 28 * u.sensitivity().size()),
                (g, area) -> SensitivityChart.draw(u, ChartRendering.PAPER, BODY, g, area));
    }

    private static Block chart(ChartSpec spec, double width, double height) {
        return drawing(height, (g, area) -> ChartRendering.draw(spec, ChartRendering.PAPER, BODY, g, area));
    }

    /** A chart of a height, drawn across the text width on its own copy of the graphics. */
    private static Block drawing(double height,
                                 java.util.function.BiConsumer<Graphics2D, Rectangle2D> painter) {
        return new Block() {
            @Override
            public double height() {
                return height + 8;
            }

            @Override
            public void draw(Graphics2D g, double x, double y, double w) {
                Graphics2D c = (Graphics2D) g.create();
                try {
                    painter.accept(c, new Rectangle2D.Double(x, y, w, height));
                } finally {
                    c.dispose();
                }
            }
        };
    }
}
