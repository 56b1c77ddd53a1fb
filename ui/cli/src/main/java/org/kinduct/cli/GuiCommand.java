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
        launcher.open(file, demo);
        return KinductMain.OK;
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
