package dev.odetab.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The tool version, read from the resource the build writes. */
public final class ToolVersion {
    private ToolVersion() {
    }

    public static String get() {
        try (InputStream in = ToolVersion.class.getResourceAsStream("/odetab-version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }
}
