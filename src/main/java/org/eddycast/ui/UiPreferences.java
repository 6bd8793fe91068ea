package org.eddycast.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

/** The panel's remembered settings, in one preferences node for the tool. */
final class UiPreferences {

    private static final String RECENT = "recent.";
    private static final int MAX_RECENT = 6;

    private final Preferences node;

    UiPreferences(Preferences node) {
        this.node = node;
    }

    static UiPreferences user() {
        return new UiPreferences(Preferences.userRoot().node("org/eddycast/ui"));
    }

    private static final String LAST_FOLDER = "lastFolder";

    /** The folder a file was last opened from or saved to, if it still exists. */
    java.util.Optional<Path> lastFolder() {
        String s = node.get(LAST_FOLDER, null);
        return s == null ? java.util.Optional.empty()
                : java.util.Optional.of(Path.of(s)).filter(java.nio.file.Files::isDirectory);
    }

    /** Remembers the folder of a file just opened or saved. */
    void setLastFolder(Path file) {
        Path folder = file.toAbsolutePath().getParent();
        if (folder != null) {
            node.put(LAST_FOLDER, folder.toString());
        }
    }

    /** The recently used scenario files, newest first. */
    List<Path> recentFiles() {
        List<Path> list = new ArrayList<>();
        for (int i = 0; i < MAX_RECENT; i++) {
            String s = node.get(RECENT + i, null);
            if (s != null) {
                list.add(Path.of(s));
            }
        }
        return list;
    }

    /** Puts a file first in the recent list. */
    void addRecent(Path file) {
        List<Path> list = recentFiles();
        Path abs = file.toAbsolutePath().normalize();
        list.remove(abs);
        list.add(0, abs);
        for (int i = 0; i < MAX_RECENT; i++) {
            if (i < list.size()) {
                node.put(RECENT + i, list.get(i).toString());
            } else {
                node.remove(RECENT + i);
            }
        }
    }
}
