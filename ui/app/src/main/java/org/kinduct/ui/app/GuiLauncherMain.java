package org.kinduct.ui.app;

import java.nio.file.Path;

/** Runs the editor directly: {@code GuiLauncherMain [scene.json | --demo /org/kinduct/demo/x.json]}. */
public final class GuiLauncherMain {

    private GuiLauncherMain() {
    }

    public static void main(String[] args) {
        if (args.length == 2 && args[0].equals("--demo")) {
            GuiLauncher.launch(null, args[1]);
        } else {
            GuiLauncher.launch(args.length == 1 ? Path.of(args[0]) : null, null);
        }
    }
}
