package org.eddycast.plugin;

import java.util.Objects;

/**
 * What a host may learn about a tool before building any of its user interface.
 *
 * @param id           a stable identifier, lower case, for example "eddycast"
 * @param name         the name to show in menus and window titles
 * @param version      the tool's version
 * @param description  one sentence on what the tool does
 * @param iconResource a class-path resource (PNG) with the tool's icon, loaded by the host when it wants one
 * @param runsHeadless true when the tool can do its main job with no display (from its own command line)
 */
public record PluginInfo(String id, String name, String version, String description, String iconResource,
                         boolean runsHeadless) {

    public PluginInfo {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(version, "version");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(iconResource, "iconResource");
    }
}
