package org.halyard.ui;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/** Writes a rendered view to PNG, through a temporary file so a failed write leaves nothing half-written. */
public final class ViewExport {

    private ViewExport() {
    }

    /** @throws UncheckedIOException naming the file when it cannot be written */
    public static void writePng(BufferedImage image, Path out) {
        try {
            Path dir = out.toAbsolutePath().getParent();
            Files.createDirectories(dir);
            Path tmp = Files.createTempFile(dir, ".halyard-view", ".png");
            if (!ImageIO.write(image, "png", tmp.toFile())) {
                throw new IOException("no PNG writer available");
            }
            Files.move(tmp, out, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException e) {
            throw new UncheckedIOException(out + ": cannot write PNG: " + e.getMessage(), e);
        }
    }
}
