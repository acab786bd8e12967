package dev.penduline.cli;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.util.Enumeration;
import java.util.jar.Attributes;
import java.util.jar.Manifest;

/** The version of Penduline, read from this bundle's manifest so that it is never out of step. */
public final class Version {

    private static final String BUNDLE = "dev.penduline.cli";

    private Version() {
    }

    /**
     * The bundle version of the command line, e.g. {@code 0.1.0.202612012130}.
     *
     * @return the version, or {@code "unknown"} when run from loose class folders
     */
    public static String current() {
        try {
            Enumeration<URL> manifests = Version.class.getClassLoader().getResources("META-INF/MANIFEST.MF");
            while (manifests.hasMoreElements()) {
                try (InputStream in = manifests.nextElement().openStream()) {
                    Attributes main = new Manifest(in).getMainAttributes();
                    String name = main.getValue("Bundle-SymbolicName");
                    if (name != null && name.split(";")[0].trim().equals(BUNDLE)) {
                        return main.getValue("Bundle-Version");
                    }
                }
            }
        } catch (IOException e) {
            return "unknown";
        }
        return "unknown";
    }
}
