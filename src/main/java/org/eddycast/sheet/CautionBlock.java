package org.eddycast.sheet;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.eddycast.forecast.Cautions;

/**
 * The cautions drawn under an exported picture (PNG, SVG), wrapped to its width, so a chart that leaves the tool
 * alone still carries them. The text is {@link Cautions#lines}, not a list of its own.
 */
public final class CautionBlock {

    private static final int MARGIN = 12;

    private final Font font;
    private final int width;
    private final List<String> wrapped;
    private final int lineHeight;

    /** The block for a picture {@code width} pixels wide, set in {@code font}. */
    public CautionBlock(Font font, int width) {
        this.font = font;
        this.width = width;
        Graphics2D probe = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
        try {
            FontMetrics fm = probe.getFontMetrics(font);
            lineHeight = fm.getHeight();
            List<String> lines = new ArrayList<>();
            for (String line : Cautions.lines("")) {
                lines.addAll(wrap(line, fm, width - 2 * MARGIN));
            }
            wrapped = List.copyOf(lines);
        } finally {
            probe.dispose();
        }
    }

    /** The height the block takes, margins included. */
    public int height() {
        return wrapped.size() * lineHeight + 2 * MARGIN;
    }

    /** The wrapped lines, top to bottom (for tests). */
    public List<String> lines() {
        return wrapped;
    }

    /** Draws the block with its top edge at {@code top}, dark text on the white of paper. */
    public void draw(Graphics2D g, int top) {
        g.setColor(Color.WHITE);
        g.fillRect(0, top, width, height());
        g.setColor(ChartRendering.PAPER.foreground());
        g.setFont(font);
        FontMetrics fm = g.getFontMetrics();
        int y = top + MARGIN + fm.getAscent();
        for (String line : wrapped) {
            g.drawString(line, MARGIN, y);
            y += lineHeight;
        }
    }

    /** Greedy word wrap to a pixel width; a word longer than the width stands on its own line. */
    static List<String> wrap(String text, FontMetrics fm, int maxWidth) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && fm.stringWidth(candidate) > maxWidth) {
                out.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (line.length() > 0) {
            out.add(line.toString());
        }
        return out;
    }
}
