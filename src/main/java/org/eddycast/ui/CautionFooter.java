package org.eddycast.ui;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JPanel;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;
import org.eddycast.forecast.Cautions;

/**
 * The one-line reminder at the foot of every results tab ({@link Cautions#IN_ONE_LINE}), with a button that
 * shows the full list of cautions.
 */
final class CautionFooter extends JPanel {

    static final String NAME = "cautionFooter";

    private final WrappingText line = new WrappingText("cautionFooterText");
    private final JButton all = new JButton("All cautions");

    /** @param showAll what the button does: bring the full list into view */
    CautionFooter(Runnable showAll) {
        super(new MigLayout("insets 4 10 4 10, fillx", "[grow,fill]8[]", "[center]"));
        setName(NAME);
        line.setText(Cautions.IN_ONE_LINE);
        line.putClientProperty("FlatLaf.styleClass", "small");
        all.setName("cautionFooterLink");
        all.putClientProperty("JButton.buttonType", "borderless");
        all.putClientProperty("FlatLaf.styleClass", "small");
        all.setToolTipText("Show every caution with the assumptions of this result (tab Inputs and cautions)");
        all.addActionListener(e -> showAll.run());
        add(line, "wmin 10");
        // after the theme's update of the button, so its colour and underline survive a change of theme
        all.addPropertyChangeListener("UI", e -> styleBorder());
        add(all);
        styleBorder();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (line != null) {
            styleBorder();
        }
    }

    /** A rule above the footer; the button drawn as a link in the theme's link colour, underlined. */
    private void styleBorder() {
        java.awt.Color sep = UIManager.getColor("Separator.foreground");
        setBorder(BorderFactory.createMatteBorder(1, 0, 0, 0, sep == null ? java.awt.Color.GRAY : sep));
        java.awt.Color link = UIManager.getColor("Component.linkColor");
        if (link != null) {
            all.setForeground(link);
        }
        java.util.Map<java.awt.font.TextAttribute, Object> underline = new java.util.HashMap<>();
        underline.put(java.awt.font.TextAttribute.UNDERLINE, java.awt.font.TextAttribute.UNDERLINE_ON);
        all.setFont(all.getFont().deriveFont(underline));
        all.setCursor(java.awt.Cursor.getPredefinedCursor(java.awt.Cursor.HAND_CURSOR));
    }

    /** The reminder's text (for tests). */
    String text() {
        return line.getText();
    }

    /** The button that shows the full list (for tests). */
    JButton link() {
        return all;
    }
}
