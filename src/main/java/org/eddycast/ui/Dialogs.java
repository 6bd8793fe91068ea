package org.eddycast.ui;

import java.awt.Component;
import javax.swing.JOptionPane;

/** How the panel asks the user a question or tells them something; tests supply their own answers. */
interface Dialogs {

    /** Yes, no or cancel for unsaved changes. */
    enum Answer { SAVE, DISCARD, CANCEL }

    Answer askUnsaved(String documentName);

    void tell(String title, String message);

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
        };
    }
}
