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

/**
 * Lays the summary sheet out on A4 pages (points, 1/72 inch) and draws any page into a Graphics2D. The PDF
 * writer and the printer use this one layout, so paper and screen say the same. Text uses the logical fonts
 * SansSerif and Serif, which the PDF writer maps to the standard PDF fonts.
 */
public final class SummarySheetLayout {

    /** A4 page size in points. */
    public static final double PAGE_WIDTH = 595.28;
    public static final double PAGE_HEIGHT = 841.89;
    static final double MARGIN = 48;

    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 16);
    private static final Font HEADING = new Font(Font.SANS_SERIF, Font.BOLD, 11);
    private static final Font BODY = new Font(Font.SANS_SERIF, Font.PLAIN, 9);
    private static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 8);
    private static final Color INK = new Color(0x22, 0x22, 0x22);
    private static final Color RULE = new Color(0x1f, 0x6f, 0x8b);

    /** Something drawn at a height on a page. */
    private interface Block {
        double height();

        void draw(Graphics2D g, double x, double y, double width);
    }

    private final List<List<Block>> pages = new ArrayList<>();
    private final String footer;

    /**
     * @param content the sheet's text
     * @param charts  the charts to include (at most two are drawn)
     */
    public SummarySheetLayout(SummaryContent content, List<ChartSpec> charts) {
        footer = "eddycast " + content.toolVersion() + " \u2014 " + content.scenarioName() + " \u2014 "
                + content.date() + " \u2014 screening estimate";
        FontMetrics body = metrics(BODY);
        double width = PAGE_WIDTH - 2 * MARGIN;
        List<Block> blocks = new ArrayList<>();
        blocks.add(text(content.title(), TITLE, width, 4));
        blocks.add(text("Scenario: " + content.scenarioName(), HEADING, width, 2));
        blocks.add(text("Flow route: " + content.route() + ".   Computed " + content.date() + " with eddycast "
                + content.toolVersion() + ".", BODY, width, 6));
        blocks.add(heading("Inputs"));
        blocks.add(table(List.of("input", "value", "", "unit"), content.inputs(), width, body));
        blocks.add(heading("Results (95% intervals over independent groups of particles)"));
        blocks.add(table(List.of("quantity", "value", "95% interval", "unit"), content.results(), width, body));
        blocks.add(heading("Forecast"));
        if (content.forecast().isEmpty()) {
            blocks.add(text("Plume width, peak concentration and time or distance to mixed are not part of this "
                    + "sheet: this build computes the eddy diffusivity only.", BODY, width, 4));
        } else {
            blocks.add(table(List.of("forecast", "value", "95% interval", "unit"), content.forecast(), width, body));
        }
        blocks.add(heading("Handbook comparison"));
        if (content.handbook().isEmpty()) {
            blocks.add(text("No handbook estimate is listed for this scenario in this build.", BODY, width, 4));
        } else {
            blocks.add(table(List.of("handbook estimate", "value", "range", "unit"), content.handbook(), width,
                    body));
        }
        for (ChartSpec c : charts.subList(0, Math.min(2, charts.size()))) {
            blocks.add(chart(c, width, 250));
        }
        blocks.add(heading("Assumptions and how values were obtained"));
        for (String a : content.assumptions()) {
            blocks.add(text("\u2022 " + a, BODY, width, 2));
        }
        blocks.add(heading("Cautions"));
        for (String c : content.cautions()) {
            blocks.add(text("\u2022 " + c, BODY, width, 2));
        }
        blocks.add(heading("Methods"));
        for (String r : content.references()) {
            blocks.add(text(r, SMALL, width, 1));
        }
        paginate(blocks);
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

    private void paginate(List<Block> blocks) {
        double usable = PAGE_HEIGHT - 2 * MARGIN;
        List<Block> page = new ArrayList<>();
        double used = 0;
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            // keep a heading with what follows it
            double need = b.height() + (b instanceof Heading && i + 1 < blocks.size()
                    ? Math.min(blocks.get(i + 1).height(), 60) : 0);
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

    private static Block table(List<String> header, List<SummaryContent.Row> rows, double width, FontMetrics fm) {
        double[] columns = {0, 0.42, 0.62, 0.86};
        double lineHeight = fm.getHeight() + 1;
        List<List<String>> cells = new ArrayList<>();
        for (SummaryContent.Row r : rows) {
            cells.add(List.of(r.quantity(), r.value(), r.interval(), r.unit()));
        }
        return new Block() {
            @Override
            public double height() {
                return (rows.size() + 1) * lineHeight + 6;
            }

            @Override
            public void draw(Graphics2D g, double x, double y, double w) {
                g.setColor(INK);
                g.setFont(BODY.deriveFont(Font.BOLD));
                for (int c = 0; c < header.size(); c++) {
                    g.drawString(header.get(c), (float) (x + columns[c] * w), (float) (y + fm.getAscent()));
                }
                g.setFont(BODY);
                for (int r = 0; r < cells.size(); r++) {
                    double baseline = y + (r + 1) * lineHeight + fm.getAscent();
                    if (r % 2 == 0) {
                        g.setColor(new Color(0xf1, 0xf4, 0xf6));
                        g.fill(new Rectangle2D.Double(x, baseline - fm.getAscent(), w, lineHeight));
                        g.setColor(INK);
                    }
                    for (int c = 0; c < 4; c++) {
                        String s = cells.get(r).get(c);
                        double limit = (c < 3 ? columns[c + 1] - columns[c] : 1 - columns[c]) * w - 4;
                        while (fm.stringWidth(s) > limit && s.length() > 4) {
                            s = s.substring(0, s.length() - 4) + "...";
                        }
                        g.drawString(s, (float) (x + columns[c] * w), (float) baseline);
                    }
                }
            }
        };
    }

    private static Block chart(ChartSpec spec, double width, double height) {
        return new Block() {
            @Override
            public double height() {
                return height + 8;
            }

            @Override
            public void draw(Graphics2D g, double x, double y, double w) {
                Graphics2D c = (Graphics2D) g.create();
                try {
                    ChartRendering.draw(spec, ChartRendering.PAPER, BODY, c,
                            new Rectangle2D.Double(x, y, w, height));
                } finally {
                    c.dispose();
                }
            }
        };
    }
}
