package org.eddycast.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Rectangle;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.Scrollable;

/**
 * A page that scrolls down when the window is short and always takes the width it is shown in, so its text
 * wraps and its tables scroll sideways on their own instead of pushing the page wider than the window.
 */
final class ScrollPage extends JPanel implements Scrollable {

    private ScrollPage(JComponent page) {
        super(new BorderLayout());
        add(page, BorderLayout.CENTER);
    }

    /** The page in a vertical scroll pane without a border. */
    static JScrollPane around(JComponent page) {
        JScrollPane s = new JScrollPane(new ScrollPage(page));
        s.setBorder(null);
        s.setHorizontalScrollBarPolicy(JScrollPane.HORIZONTAL_SCROLLBAR_AS_NEEDED);
        s.getVerticalScrollBar().setUnitIncrement(16);
        return s;
    }

    /** Shows the top of the page again once the new content is laid out (after new content replaced old). */
    static void toTop(JScrollPane pane) {
        javax.swing.SwingUtilities.invokeLater(() -> pane.getViewport().setViewPosition(new java.awt.Point(0, 0)));
    }

    @Override
    public Dimension getPreferredScrollableViewportSize() {
        return getPreferredSize();
    }

    @Override
    public int getScrollableUnitIncrement(Rectangle r, int orientation, int direction) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(Rectangle r, int orientation, int direction) {
        return Math.max(16, r.height - 32);
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        // follow the window's width, but never squeeze the page below its minimum: then scroll sideways
        return getParent() == null || getParent().getWidth() >= getMinimumSize().width;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return false;
    }
}
