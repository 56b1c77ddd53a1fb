package org.kinduct.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.List;
import org.kinduct.scene.Scene;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;

/**
 * Machine-readable results: one object per conductor per time under {@code samples}; schema in
 * README.md ("Results JSON"). Shared by {@code kinduct solve --format json} and the export.
 */
public final class ResultsJson {

    /** Format name written at the top of every results file. */
    public static final String FORMAT = "kinduct-results";
    public static final int VERSION = 1;

    private ResultsJson() {
    }

    public static void write(Scene scene, List<Snapshot> series, Writer out) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeNumberField("version", VERSION);
            g.writeStringField("scene", scene.name());
            g.writeArrayFieldStart("samples");
            for (Snapshot s : series) {
                for (ConductorState c : s.conductors()) {
                    writeSample(g, s.tS(), c);
                }
            }
            g.writeEndArray();
            g.writeEndObject();
        }
    }

    private static void writeSample(JsonGenerator g, double tS, ConductorState c) throws IOException {
        boolean loop = c.kind() == ConductorState.Kind.LOOP;
        g.writeStartObject();
        g.writeNumberField("t", tS);
        g.writeStringField("id", c.id());
        g.writeStringField("kind", loop ? "loop" : "wire");
        number(g, "flux_Wb", c.fluxWb());
        number(g, "linkage_Wb", c.linkageWb());
        number(g, "emf_flux_V", c.emfFluxV());
        number(g, "emf_motional_V", c.emfMotionalV());
        number(g, "emf_V", c.emfV());
        number(g, "disagreement", c.disagreement());
        g.writeStringField("positive_end", Labels.terminal(c.positiveEnd()));
        number(g, "current_A", c.currentA());
        g.writeStringField("direction", loop ? Labels.circulation(c.direction()) : "none");
        g.writeArrayFieldStart("force_N");
        g.writeNumber(c.forceN().x());
        g.writeNumber(c.forceN().y());
        g.writeEndArray();
        number(g, "resistance_Ohm", c.resistanceOhm());
        g.writeBooleanField("induced_e_included", c.inducedFieldIncluded());
        g.writeEndObject();
    }

    /** NaN (a quantity that does not apply, e.g. flux of a wire) is written as null. */
    private static void number(JsonGenerator g, String name, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumberField(name, v);
        } else {
            g.writeNullField(name);
        }
    }
}
