package org.eddycast.plugin;

/**
 * The service a host finds with {@link java.util.ServiceLoader}: list the implementation in
 * {@code META-INF/services/org.eddycast.plugin.ToolPlugin}. An implementation has a public no-argument
 * constructor that does no user-interface work, so a host can read {@link #info()} anywhere, even with no
 * display; only {@link #createPanel(HostContext)} builds Swing components, and only on the event thread.
 */
public interface ToolPlugin {

    /** The tool's metadata; cheap, builds no user interface. */
    PluginInfo info();

    /**
     * Builds the tool's panel. Called on the event thread. The tool contributes menus and status text through
     * the host context only; the host owns the frame.
     */
    ToolPanel createPanel(HostContext host);
}
