package org.kinduct.solver.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.kinduct.scene.Body;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.io.FieldMapCsv;
import org.kinduct.scene.io.FieldMapFormatException;
import org.kinduct.solver.SourceFields;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Loading a 2000 × 2000 field map (4 million samples, 212 MB in the export's form with full-precision
 * numbers): reading and checking the CSV, and that plus the interpolation tables the first solve
 * builds. The goal is under a second for both.
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Benchmark)
@Fork(value = 1, jvmArgs = "-Xmx2g")
@Warmup(iterations = 2)
@Measurement(iterations = 5)
public class FieldMapLoadBenchmark {

    private static final int N = 2000;

    private Path file;

    @Setup(Level.Trial)
    public void write() throws IOException {
        file = Files.createTempFile("kinduct-map", ".csv");
        double h = 1e-4;
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            out.write("x_m,y_m,Bz_T\n");
            for (int j = 0; j < N; j++) {
                double y = -0.1 + (j + 0.5) * h;
                for (int i = 0; i < N; i++) {
                    double x = -0.1 + (i + 0.5) * h;
                    out.write(Double.toString(x) + ',' + y + ',' + 0.3 * Math.sin(300 * x) * Math.cos(200 * y) + '\n');
                }
            }
        }
    }

    @TearDown(Level.Trial)
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    private FieldGrid read() throws IOException, FieldMapFormatException {
        try (InputStream in = Files.newInputStream(file)) {
            return FieldMapCsv.readPoints(in, file.toString());
        }
    }

    @Benchmark
    public FieldGrid readCsv() throws IOException, FieldMapFormatException {
        return read();
    }

    @Benchmark
    public double readAndFirstEvaluation() throws IOException, FieldMapFormatException {
        Source.FieldMap map = new Source.FieldMap("scan", Body.FIXED, "scan.csv", read(), Vec2.ZERO,
                Source.FieldMap.Outside.ZERO);
        return SourceFields.place(map, Pose.rest(Vec2.ZERO), 0).flux(new double[] {0, 0.01, 0.01, 0},
                new double[] {0, 0, 0.01, 0.01});
    }
}
