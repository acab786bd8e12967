package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.util.Properties;

import org.eclipse.core.runtime.Platform;
import org.junit.jupiter.api.Test;
import org.osgi.framework.Bundle;
import org.osgi.framework.Version;

/** The version the About dialog shows is the application bundle's release version. */
class AboutVersionTest {

    @Test
    void aboutDialogVersionMatchesTheBundleVersion() throws IOException {
        Bundle app = Platform.getBundle("dev.penduline.app");
        assertNotNull(app, "dev.penduline.app is not in the test runtime");
        URL mappings = app.getEntry("about.mappings");
        assertNotNull(mappings, "about.mappings is missing from the application bundle");
        Properties p = new Properties();
        try (InputStream in = mappings.openStream()) {
            p.load(in);
        }
        Version v = app.getVersion();
        assertEquals(v.getMajor() + "." + v.getMinor() + "." + v.getMicro(), p.getProperty("0"));
    }
}
