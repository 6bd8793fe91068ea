package org.eddycast.ui;

import java.awt.Container;
import java.awt.Dimension;
import java.awt.Insets;
import javax.swing.JTextArea;

/**
 * Read-only text that wraps at word boundaries to the width its container gives it and asks for the height the
 * wrapped lines need, so a long message grows downwards instead of widening the form or being cut off.
 */
final class WrappingText extends JTextArea {

    WrappingText(String name) {
        setName(name);
        setEditable(false);
        setLineWrap(true);
        setWrapStyleWord(true);
        setOpaque(false);
        setFocusable(false);
        setBorder(null);
        // new text must not scroll the page it sits on to its end
        if (getCaret() instanceof javax.swing.text.DefaultCaret c) {
            c.setUpdatePolicy(javax.swing.text.DefaultCaret.NEVER_UPDATE);
        }
    }

    @Override
    public Dimension getPreferredSize() {
        Container parent = getParent();
        int width = getWidth();
        if (width <= 0 && parent != null) {
            Insets in = parent.getInsets();
            width = parent.getWidth() - in.left - in.right;
        }
        if (width > 0) {
            // the text view measures its wrapped height for the width it was last given
            setSize(width, Short.MAX_VALUE);
            return new Dimension(width, super.getPreferredSize().height);
        }
        return super.getPreferredSize();
    }

    @Override
    public Dimension getMinimumSize() {
        return new Dimension(10, super.getMinimumSize().height);
    }
}
