package org.eddycast.ui;

import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.report.Headline;

/**
 * The answer at the top of the results: the headline in large type, its figures with intervals and units below
 * it, and a one-line reminder that it is a screening estimate with cautions.
 */
final class HeadlinePanel extends JPanel {

    private final WrappingText answer = new WrappingText("headline");
    private final WrappingText figures = new WrappingText("headlineFigures");
    private final WrappingText caution = new WrappingText("headlineCaution");

    HeadlinePanel() {
        super(new MigLayout("insets 6 10 6 10, wrap 1, fillx, gapy 2", "[grow,fill]"));
        answer.putClientProperty("FlatLaf.styleClass", "h2");
        figures.putClientProperty("FlatLaf.styleClass", "medium");
        caution.putClientProperty("FlatLaf.styleClass", "small");
        caution.setText("Screening estimate: read its assumptions and cautions (tab Inputs and cautions) before "
                + "acting on it.");
        add(answer, "wmin 10");
        add(figures, "wmin 10, hidemode 3");
        add(caution, "wmin 10");
        show(null, "No result yet: fill in the form and press Run (Ctrl+R).");
    }

    /** Shows a headline, or the line given when there is none. */
    void show(Headline h, String none) {
        if (h == null) {
            answer.setText(none);
            figures.setText("");
            figures.setVisible(false);
            caution.setVisible(false);
        } else {
            answer.setText(h.text());
            StringBuilder sb = new StringBuilder(h.howSure());
            for (Headline.Figure f : h.figures()) {
                if (sb.length() > 0) {
                    sb.append('\n');
                }
                sb.append(capitalized(f.label())).append(": ").append(f.valueText());
            }
            figures.setText(sb.toString());
            figures.setVisible(true);
            caution.setVisible(true);
            answer.setToolTipText(Glossary.tooltip(h.text()));
        }
        revalidate();
        repaint();
    }

    String text() {
        return answer.getText();
    }

    private static String capitalized(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
