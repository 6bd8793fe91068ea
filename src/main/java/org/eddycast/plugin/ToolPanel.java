package org.eddycast.plugin;

import javax.swing.JComponent;

/** A tool's panel as the host holds it. */
public interface ToolPanel {

    /** The component the host places in its window. */
    JComponent component();

    /**
     * Asks the tool whether it may close now; the tool may ask the user about unsaved work. Called on the event
     * thread. Returns false to keep the panel open.
     */
    boolean confirmClose();

    /** Stops any background work and releases resources; the panel is not used afterwards. */
    void dispose();
}
