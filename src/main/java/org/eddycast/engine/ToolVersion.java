package org.eddycast.engine;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The version of this build, written into every output. */
public final class ToolVersion {

    private static final String VERSION = load();

    private ToolVersion() {
    }

    public static String get() {
        return VERSION;
    }

    private static String load() {
        try (InputStream in = ToolVersion.class.getResourceAsStream("/org/eddycast/version.properties")) {
            if (in == null) {
                return "development";
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "development");
            return v.startsWith("${") ? "development" : v;
        } catch (IOException e) {
            return "development";
        }
    }
}
