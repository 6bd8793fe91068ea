package org.eddycast.ui;

import org.eddycast.scenario.BundledPresets;
import org.eddycast.engine.ToolVersion;
import org.eddycast.plugin.HostContext;
import org.eddycast.plugin.PluginInfo;
import org.eddycast.plugin.ToolPanel;
import org.eddycast.plugin.ToolPlugin;

/** eddycast as a plug-in: metadata without any user interface, and the panel on request. */
public final class EddycastPlugin implements ToolPlugin {

    /** The tool's id. */
    public static final String ID = "eddycast";

    @Override
    public PluginInfo info() {
        return new PluginInfo(ID, "eddycast", ToolVersion.get(),
                "Screening forecasts of tracer spreading in turbulent tanks and channels.",
                "org/eddycast/ui/eddycast-icon.png", true);
    }

    @Override
    public ToolPanel createPanel(HostContext host) {
        EddycastPanel panel = new EddycastPanel(host);
        panel.showScenario(BundledPresets.standard(), BundledPresets.folder(), BundledPresets.STANDARD_NAME);
        return panel;
    }
}
