package org.kinduct.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.kinduct.scene.io.SceneFiles;

/** Sends a command's text to standard output, or atomically to a file. */
final class Output {

    private Output() {
    }

    static void deliver(String text, Path file) {
        if (file == null) {
            PrintStream out = System.out;
            out.print(text);
            out.flush();
            return;
        }
        try {
            SceneFiles.writeAtomically(file, text.getBytes(StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new BadInputException("cannot write " + file + ": " + e.getMessage());
        }
    }
}
