package org.kinduct.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Refuses outputs that would overwrite the scene being read, or each other: a file is the same
 * by identity, not by name ({@link Files#isSameFile}, through links and relative paths alike).
 */
final class OutputTargets {

    private OutputTargets() {
    }

    /**
     * @param input the scene file read, or null for a demo
     * @param outputs each output option's file, in the order given (null entries are left out)
     * @throws BadInputException naming the options and the file
     */
    static void requireDistinct(Path input, Map<String, Path> outputs) {
        List<Map.Entry<String, Path>> given = new ArrayList<>();
        outputs.forEach((option, file) -> {
            if (file != null) {
                given.add(Map.entry(option, file));
            }
        });
        for (int i = 0; i < given.size(); i++) {
            Map.Entry<String, Path> a = given.get(i);
            if (input != null && same(input, a.getValue())) {
                throw new BadInputException(a.getKey() + " " + a.getValue() + " is the scene file being read ("
                        + input + "); writing there would replace the scene: choose another file");
            }
            for (int j = i + 1; j < given.size(); j++) {
                Map.Entry<String, Path> b = given.get(j);
                if (same(a.getValue(), b.getValue())) {
                    throw new BadInputException(a.getKey() + " and " + b.getKey() + " name the same file ("
                            + b.getValue() + "); give each output its own file");
                }
            }
        }
    }

    /** The outputs as option → file, keeping their order. */
    static Map<String, Path> of(Object... optionsAndFiles) {
        Map<String, Path> map = new LinkedHashMap<>();
        for (int i = 0; i < optionsAndFiles.length; i += 2) {
            map.put((String) optionsAndFiles[i], (Path) optionsAndFiles[i + 1]);
        }
        return map;
    }

    /** Whether writing {@code a} and {@code b} reaches one file. */
    static boolean same(Path a, Path b) {
        if (Files.exists(a) && Files.exists(b)) {
            try {
                return Files.isSameFile(a, b);
            } catch (IOException unreadable) {
                // Compare where they lead instead.
            }
        }
        return destination(a).equals(destination(b));
    }

    /** Where a write to {@code p} lands: the real path of the file, or of its folder when the file is new. */
    private static Path destination(Path p) {
        Path absolute = p.toAbsolutePath().normalize();
        try {
            return absolute.toRealPath();
        } catch (IOException notThereYet) {
            Path folder = absolute.getParent();
            try {
                return folder == null ? absolute : folder.toRealPath().resolve(absolute.getFileName());
            } catch (IOException noFolder) {
                return absolute;
            }
        }
    }
}
