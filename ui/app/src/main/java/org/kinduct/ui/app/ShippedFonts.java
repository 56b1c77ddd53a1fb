package org.kinduct.ui.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

/**
 * Points JavaFX at the DejaVu Sans files Kinduct ships ({@code ui/render}) instead of the
 * machine's fonts: JavaFX looks its fonts up through fontconfig, and on a machine with no font
 * installed every text layout fails; with its own fonts the editor looks the same everywhere, as
 * the exported pages do. JavaFX reads fonts from files only, so the three files (the two fonts and
 * {@code logicalfonts.properties}, which maps every logical family and style to them) are copied
 * into a fresh temporary directory, removed when the editor exits. A {@code prism.fontdir} set
 * by the user is left alone.
 */
final class ShippedFonts {

    /** Class-path resources, each copied under its file name. */
    private static final List<String> FILES = List.of("/org/kinduct/render/fonts/DejaVuSans.ttf",
            "/org/kinduct/render/fonts/DejaVuSans-Bold.ttf", "/org/kinduct/ui/app/fonts/logicalfonts.properties");

    private ShippedFonts() {
    }

    /**
     * Sets JavaFX's font properties; call before the toolkit starts. Where the files cannot be
     * written (no writable temporary directory) the machine's fonts are used, as before.
     */
    static void use() {
        if (System.getProperty("prism.fontdir") != null) {
            return;
        }
        try {
            System.setProperty("prism.fontdir", copied().toString());
            System.setProperty("prism.useFontConfig", "false");
        } catch (IOException | IllegalStateException e) {
            System.err.println("kinduct: the editor uses the system's fonts: " + e.getMessage());
        }
    }

    static Path copied() throws IOException {
        Path dir = Files.createTempDirectory("kinduct-fonts");
        dir.toFile().deleteOnExit();
        for (String resource : FILES) {
            Path file = dir.resolve(resource.substring(resource.lastIndexOf('/') + 1));
            try (InputStream in = ShippedFonts.class.getResourceAsStream(resource)) {
                if (in == null) {
                    throw new IllegalStateException("the font resource " + resource + " is missing from the jar");
                }
                Files.copy(in, file, StandardCopyOption.REPLACE_EXISTING);
            }
            file.toFile().deleteOnExit();
        }
        return dir;
    }
}
