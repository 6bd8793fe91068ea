package org.eddycast.ui;

import java.awt.Component;
import javax.swing.JOptionPane;

/** How the panel asks the user a question or tells them something; tests supply their own answers. */
interface Dialogs {

    /** Yes, no or cancel for unsaved changes. */
    enum Answer { SAVE, DISCARD, CANCEL }

    Answer askUnsaved(String documentName);

    void tell(String title, String message);

    /** Tells of a fault in plain words, with the technical details one step away. */
    void fault(String title, String message, String details);

    /** Makes Esc close a dialog of the tool's own, as it closes the standard ones. */
    static void closeOnEscape(javax.swing.JDialog d) {
        javax.swing.JRootPane root = d.getRootPane();
        root.getInputMap(javax.swing.JComponent.WHEN_IN_FOCUSED_WINDOW).put(javax.swing.KeyStroke.getKeyStroke(
                java.awt.event.KeyEvent.VK_ESCAPE, 0), "close");
        root.getActionMap().put("close", new javax.swing.AbstractAction() {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                d.dispatchEvent(new java.awt.event.WindowEvent(d, java.awt.event.WindowEvent.WINDOW_CLOSING));
            }
        });
    }

    /** Dialogs shown with JOptionPane over a parent. */
    static Dialogs over(java.util.function.Supplier<Component> parent) {
        return new Dialogs() {
            @Override
            public Answer askUnsaved(String name) {
                int a = JOptionPane.showConfirmDialog(parent.get(), "\"" + name + "\" has changes that are not "
                        + "saved. Save them first?", "Unsaved changes", JOptionPane.YES_NO_CANCEL_OPTION);
                return a == JOptionPane.YES_OPTION ? Answer.SAVE : a == JOptionPane.NO_OPTION ? Answer.DISCARD
                        : Answer.CANCEL;
            }

            @Override
            public void tell(String title, String message) {
                JOptionPane.showMessageDialog(parent.get(), message, title, JOptionPane.WARNING_MESSAGE);
            }

            @Override
            public void fault(String title, String message, String details) {
                javax.swing.JTextArea text = new javax.swing.JTextArea(details, 14, 70);
                text.setEditable(false);
                javax.swing.JScrollPane scroll = new javax.swing.JScrollPane(text);
                scroll.setVisible(false);
                javax.swing.JCheckBox show = new javax.swing.JCheckBox("Show details");
                show.setMnemonic('D');
                show.addActionListener(e -> {
                    scroll.setVisible(show.isSelected());
                    java.awt.Window w = javax.swing.SwingUtilities.getWindowAncestor(show);
                    if (w != null) {
                        w.pack();
                    }
                });
                javax.swing.JPanel p = new javax.swing.JPanel(new net.miginfocom.swing.MigLayout("insets 0, wrap 1",
                        "[grow,fill]"));
                p.add(new javax.swing.JLabel("<html><body style='width: 420px'>" + message.replace("&", "&amp;")
                        .replace("<", "&lt;").replace("\n", "<br>") + "</body></html>"));
                p.add(show);
                p.add(scroll, "hidemode 3");
                JOptionPane.showMessageDialog(parent.get(), p, title, JOptionPane.ERROR_MESSAGE);
            }
        };
    }
}
