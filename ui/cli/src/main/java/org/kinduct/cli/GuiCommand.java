package org.kinduct.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.ServiceLoader;
import java.util.concurrent.Callable;
import org.kinduct.demo.Demos;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/**
 * Opens the editor. This module has no JavaFX: the editor module provides an {@link EditorLauncher}
 * as a service, found only when the editor is asked for, so headless commands never load JavaFX.
 */
@Command(name = "gui", mixinStandardHelpOptions = true, description = "Open the editor on FILE or on a demo scene.")
final class GuiCommand implements Callable<Integer> {

    private static volatile boolean started;

    @Parameters(arity = "0..1", paramLabel = "FILE", description = "Scene file to open.")
    Path file;

    @Override
    public Integer call() {
        return open(file, null);
    }

    static boolean guiStarted() {
        return started;
    }

    /** Opens {@code file}, or demo {@code demoName}, or the default demo when both are null. */
    static int open(Path file, String demoName) {
        if (file != null && !Files.isReadable(file)) {
            throw new BadInputException("cannot read scene file " + file);
        }
        if (!displayAvailable()) {
            System.err.println("kinduct: no display found for the editor; without one, try"
                    + " './kinduct solve --demo " + Demos.defaultName() + "' (results) or"
                    + " './kinduct export --demo " + Demos.defaultName() + " --png snapshot.png' (annotated picture).");
            return KinductMain.BAD_INPUT;
        }
        String demo = file != null ? null : Demos.resource(demoName != null ? demoName : Demos.defaultName())
                .orElseThrow(() -> new BadInputException("no demo named '" + demoName + "'"));
        EditorLauncher launcher = ServiceLoader.load(EditorLauncher.class).findFirst()
                .orElseThrow(() -> new IllegalStateException("the editor is missing from this build"));
        started = true;
        try {
            launcher.open(file, demo);
        } catch (RuntimeException | LinkageError e) {
            started = false;
            java.util.Optional<String> advice = missingDesktopLibrary(e);
            if (advice.isPresent()) {
                throw new BadInputException(advice.get());
            }
            throw e;
        }
        return KinductMain.OK;
    }

    /**
     * What to install when the editor's toolkit cannot start for want of a desktop library: on
     * Linux JavaFX needs GTK 3 ("Unable to load glass GTK library", or no rendering pipeline);
     * empty for any other failure.
     */
    static java.util.Optional<String> missingDesktopLibrary(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            String m = String.valueOf(t.getMessage()).toLowerCase(Locale.ROOT);
            if (m.contains("gtk") || m.contains("quantumrenderer") || m.contains("no suitable pipeline")) {
                return java.util.Optional.of("the editor needs the GTK 3 desktop library, which this machine lacks"
                        + " (" + t.getMessage() + "); install it (Debian/Ubuntu: apt-get install libgtk-3-0;"
                        + " Fedora: dnf install gtk3), or use the commands that need no display: './kinduct solve"
                        + " --demo " + Demos.defaultName() + "', './kinduct export --demo " + Demos.defaultName()
                        + " --png snapshot.png'");
            }
        }
        return java.util.Optional.empty();
    }

    /** On Linux and other X11/Wayland systems a display is announced in the environment. */
    private static boolean displayAvailable() {
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        if (os.contains("win") || os.contains("mac")) {
            return true;
        }
        return notBlank(System.getenv("DISPLAY")) || notBlank(System.getenv("WAYLAND_DISPLAY"));
    }

    private static boolean notBlank(String s) {
        return s != null && !s.isBlank();
    }
}
