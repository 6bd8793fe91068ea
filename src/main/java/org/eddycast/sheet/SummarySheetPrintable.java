package org.eddycast.sheet;

import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.print.PageFormat;
import java.awt.print.Printable;

/**
 * The summary sheet for {@code java.awt.print}: the same layout as the PDF, scaled to fit the printer's
 * imageable area.
 */
public final class SummarySheetPrintable implements Printable {

    private final SummarySheetLayout layout;

    public SummarySheetPrintable(SummarySheetLayout layout) {
        this.layout = layout;
    }

    @Override
    public int print(Graphics graphics, PageFormat format, int pageIndex) {
        if (pageIndex >= layout.pageCount()) {
            return NO_SUCH_PAGE;
        }
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            g.translate(format.getImageableX(), format.getImageableY());
            double scale = Math.min(format.getImageableWidth() / SummarySheetLayout.PAGE_WIDTH,
                    format.getImageableHeight() / SummarySheetLayout.PAGE_HEIGHT);
            g.scale(scale, scale);
            layout.drawPage(g, pageIndex);
        } finally {
            g.dispose();
        }
        return PAGE_EXISTS;
    }
}
