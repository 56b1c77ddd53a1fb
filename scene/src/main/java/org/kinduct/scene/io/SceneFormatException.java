package org.kinduct.scene.io;

import java.util.List;
import java.util.stream.Collectors;

/**
 * A scene text that cannot be read, with every problem found in it. Checked: a bad file is an
 * expected outcome that callers must report, not a bug.
 */
public class SceneFormatException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String sourceName;
    private final List<Problem> problems;

    public SceneFormatException(String sourceName, List<Problem> problems) {
        super(describe(sourceName, problems));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a format error needs at least one problem");
        }
        this.sourceName = sourceName;
        this.problems = List.copyOf(problems);
    }

    /** The name the problems are reported against (usually the file name). */
    public String sourceName() {
        return sourceName;
    }

    /** The problems in document order. */
    public List<Problem> problems() {
        return problems;
    }

    private static String describe(String sourceName, List<Problem> problems) {
        return problems.stream().map(p -> p.describe(sourceName)).collect(Collectors.joining("\n"));
    }
}
