package dev.penduline.ui.tests;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.util.Set;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/**
 * Saves what a shell shows as a PNG under {@code penduline.screenshotDir} (default {@code
 * target/screenshots}); the shots named in {@code penduline.readmeShots} (comma separated) are
 * also copied to {@code penduline.readmeDir} (unless it is {@code off}), the README's pictures, when
 * they are regenerated ({@code -Dreadme.pictures=true}).
 */
final class Screenshots {

    private final Path dir;
    private final Path readmeDir;
    private final Set<String> readmeShots;

    Screenshots() {
        dir = Paths.get(System.getProperty("penduline.screenshotDir", "target/screenshots"));
        String readme = System.getProperty("penduline.readmeDir", "");
        readmeDir = readme.isBlank() || "off".equals(readme) ? null : Paths.get(readme);
        readmeShots = Set.of(System.getProperty("penduline.readmeShots", "").split("\\s*,\\s*"));
    }

    /**
     * Copies the shell's area of the screen into a PNG file.
     *
     * @param shell the shell (on top, painted)
     * @param name  the file name
     * @return the file written
     * @throws IOException when the folder cannot be created
     */
    Path take(Shell shell, String name) throws IOException {
        Files.createDirectories(dir);
        Path file = dir.resolve(name);
        Display display = shell.getDisplay();
        Rectangle bounds = shell.getBounds();
        Image image = new Image(display, bounds.width, bounds.height);
        GC gc = new GC(display);
        try {
            gc.copyArea(image, bounds.x, bounds.y);
            ImageData data = image.getImageData();
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {data};
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            gc.dispose();
            image.dispose();
        }
        if (readmeDir != null && readmeShots.contains(name)) {
            Files.createDirectories(readmeDir);
            Files.copy(file, readmeDir.resolve(name), StandardCopyOption.REPLACE_EXISTING);
        }
        return file;
    }
}
