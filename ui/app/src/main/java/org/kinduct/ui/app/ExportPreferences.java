package org.kinduct.ui.app;

import org.kinduct.render.export.SnapshotOptions;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import org.kinduct.scene.io.SceneFiles;

/**
 * The export dialog's last choices, kept in a small properties file in the editor's home folder.
 * A missing file or an unreadable value falls back to the default for that value.
 *
 * @param folder where the last export went, or null
 */
public record ExportPreferences(Format format, int widthPx, int dpi, boolean wholeScene, Path folder) {

    /** What one export writes. */
    public enum Format {
        PNG("PNG image", "png"),
        SVG("SVG drawing", "svg"),
        PDF("PDF page", "pdf"),
        SERIES_CSV("Time series (CSV)", "csv"),
        FIELD_CSV("Field map of the view (CSV)", "csv"),
        JSON("Results (JSON)", "json");

        private final String label;
        private final String extension;

        Format(String label, String extension) {
            this.label = label;
            this.extension = extension;
        }

        public String extension() {
            return extension;
        }

        @Override
        public String toString() {
            return label;
        }
    }

    static final String FILE_NAME = "export.properties";

    public ExportPreferences {
        if (format == null) {
            throw new IllegalArgumentException("format is required");
        }
    }

    public static ExportPreferences defaults() {
        return new ExportPreferences(Format.PNG, SnapshotOptions.DEFAULT_WIDTH_PX, SnapshotOptions.DEFAULT_DPI, false,
                null);
    }

    /** The preferences stored in {@code home}, or the defaults for what is missing or unreadable. */
    public static ExportPreferences load(Path home) {
        Path file = home.resolve(FILE_NAME);
        ExportPreferences d = defaults();
        if (!Files.isReadable(file)) {
            return d;
        }
        Properties p = new Properties();
        try {
            p.load(new StringReader(Files.readString(file, StandardCharsets.UTF_8)));
        } catch (IOException e) {
            System.err.println("Kinduct: could not read export settings " + file + ": " + e.getMessage());
            return d;
        }
        Format format = d.format();
        try {
            format = Format.valueOf(p.getProperty("format", format.name()));
        } catch (IllegalArgumentException e) {
            // keep the default for an unknown name
        }
        int width = integer(p, "width", d.widthPx(), SnapshotOptions.MIN_WIDTH_PX, SnapshotOptions.MAX_WIDTH_PX);
        int dpi = integer(p, "dpi", d.dpi(), SnapshotOptions.MIN_DPI, SnapshotOptions.MAX_DPI);
        boolean whole = Boolean.parseBoolean(p.getProperty("wholeScene", Boolean.toString(d.wholeScene())));
        String folder = p.getProperty("folder");
        return new ExportPreferences(format, width, dpi, whole, folder == null || folder.isBlank() ? null
                : Path.of(folder));
    }

    private static int integer(Properties p, String key, int fallback, int min, int max) {
        try {
            int v = Integer.parseInt(p.getProperty(key, Integer.toString(fallback)).strip());
            return v >= min && v <= max ? v : fallback;
        } catch (NumberFormatException e) {
            return fallback;
        }
    }

    /** Stores these preferences in {@code home}, creating the folder if needed. */
    public void save(Path home) throws IOException {
        Properties p = new Properties();
        p.setProperty("format", format.name());
        p.setProperty("width", Integer.toString(widthPx));
        p.setProperty("dpi", Integer.toString(dpi));
        p.setProperty("wholeScene", Boolean.toString(wholeScene));
        if (folder != null) {
            p.setProperty("folder", folder.toString());
        }
        StringWriter w = new StringWriter();
        p.store(w, "Kinduct export dialog");
        Files.createDirectories(home);
        SceneFiles.writeAtomically(home.resolve(FILE_NAME), w.toString().getBytes(StandardCharsets.UTF_8));
    }
}
