package org.kinduct.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.kinduct.study.StudyJson;
import org.kinduct.study.StudyMerge;
import org.kinduct.study.StudyTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code kinduct merge}: joins the parts of a sharded study into the whole, as if run in one piece. */
@Command(name = "merge", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Join the JSON parts written by 'kinduct sweep --shard K/N' into the whole study.",
                "Checks that the parts belong to one study and that none is missing, repeated or incomplete."})
final class MergeCommand implements Callable<Integer> {

    /** A part of a million points with a dozen metrics is some 200 MiB; a bigger file is surely not one. */
    private static final long MAX_BYTES = 256L << 20;

    @Parameters(paramLabel = "PART.json", arity = "1..*", description = "The parts' JSON files.")
    List<Path> parts;

    @Mixin
    StudyOutputs outputs;

    @Override
    public Integer call() {
        Map<String, StudyTable> tables = new LinkedHashMap<>();
        StudyTable whole;
        try {
            for (Path p : parts) {
                if (tables.put(p.toString(), StudyJson.read(read(p), p.toString())) != null) {
                    throw new BadInputException(p + " is given twice");
                }
            }
            whole = StudyMerge.merge(tables);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
        for (Path p : outputs.write(whole)) {
            System.err.println("wrote " + p);
        }
        return KinductMain.OK;
    }

    private static String read(Path p) {
        try {
            if (Files.size(p) > MAX_BYTES) {
                throw new BadInputException(p + " is larger than 256 MiB: not a study result");
            }
            return new String(Files.readAllBytes(p), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new BadInputException("cannot read " + p + ": " + e.getMessage());
        }
    }
}
