package org.kinduct.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.Optional;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.AlternatingPickup;
import org.kinduct.solver.run.RunResult;

/**
 * Machine-readable results: one object per wire or loop per time under {@code samples}, one per
 * plate or channel per time under {@code plates}, one per free body per time under {@code bodies},
 * the run's {@code energy_audit}, and what each self-crossing loop picks up from alternating coils
 * under {@code alternating_pickup}; schema in README.md ("Results JSON"). Shared by
 * {@code kinduct solve --format json} and the export.
 */
public final class ResultsJson {

    /** Format name written at the top of every results file. */
    public static final String FORMAT = "kinduct-results";
    public static final int VERSION = 1;

    private ResultsJson() {
    }

    public static void write(RunResult results, Writer out) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeNumberField("version", VERSION);
            g.writeStringField("scene", results.scene().name());
            g.writeStringField("method", Labels.method(results.plan()));
            g.writeStringField("circuit_model", Labels.circuitModel(results.plan().circuit()));
            g.writeArrayFieldStart("samples");
            for (Snapshot s : results.samples()) {
                for (ConductorState c : s.conductors()) {
                    writeSample(g, s.tS(), c);
                }
            }
            g.writeEndArray();
            g.writeArrayFieldStart("plates");
            for (Snapshot s : results.samples()) {
                for (SheetState p : s.sheets()) {
                    writeSheet(g, s.tS(), p);
                }
            }
            g.writeEndArray();
            g.writeArrayFieldStart("bodies");
            for (Snapshot s : results.samples()) {
                for (FreeBody b : FreeBody.of(results.scene(), s)) {
                    writeBody(g, s.tS(), b);
                }
            }
            g.writeEndArray();
            writeAudit(g, results.audit().orElse(null));
            g.writeArrayFieldStart("alternating_pickup");
            for (Conductor c : results.scene().conductors()) {
                Optional<AlternatingPickup> pickup = results.alternatingPickup(c.id());
                if (pickup.isPresent()) {
                    writePickup(g, pickup.get());
                }
            }
            g.writeEndArray();
            g.writeEndObject();
        }
    }

    private static void writeBody(JsonGenerator g, double tS, FreeBody b) throws IOException {
        g.writeStartObject();
        g.writeNumberField("t", tS);
        g.writeStringField("id", b.id());
        pair(g, "position_m", b.positionM());
        g.writeNumberField("angle_rad", b.angleRad());
        pair(g, "velocity_mps", b.velocityMps());
        g.writeNumberField("omega_radps", b.omegaRadPerS());
        g.writeEndObject();
    }

    /** A self-crossing loop's pickup from the alternating coils alone over the run, and one lobe's. */
    private static void writePickup(JsonGenerator g, AlternatingPickup p) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", p.loopId());
        g.writeNumberField("frequency_Hz", p.frequencyHz());
        g.writeNumberField("loop_peak_V", p.loopPeakV(0));
        g.writeNumberField("lobe_peak_V", p.lobePeakV(0));
        // Lobes that cancel exactly leave no finite figure, and JSON has no infinity.
        double db = p.rejectionDb(0);
        if (Double.isFinite(db)) {
            g.writeNumberField("rejection_dB", db);
        } else {
            g.writeNullField("rejection_dB");
        }
        g.writeEndObject();
    }

    private static void writeAudit(JsonGenerator g, EnergyAudit a) throws IOException {
        if (a == null) {
            g.writeNullField("energy_audit");
            return;
        }
        g.writeObjectFieldStart("energy_audit");
        g.writeNumberField("work_J", a.suppliedJ());
        g.writeNumberField("applied_J", a.appliedJ());
        g.writeNumberField("holding_J", a.holdingJ());
        g.writeNumberField("drive_J", a.driveJ());
        g.writeNumberField("joule_J", a.jouleJ());
        g.writeNumberField("eddy_J", a.eddyJ());
        g.writeNumberField("damping_J", a.dampingJ());
        g.writeNumberField("delta_kinetic_J", a.deltaKineticJ());
        g.writeNumberField("delta_potential_J", a.deltaPotentialJ());
        g.writeNumberField("delta_magnetic_J", a.deltaMagneticJ());
        g.writeNumberField("residual_J", a.residualJ());
        g.writeEndObject();
    }

    private static void pair(JsonGenerator g, String name, Vec2 v) throws IOException {
        g.writeArrayFieldStart(name);
        g.writeNumber(v.x());
        g.writeNumber(v.y());
        g.writeEndArray();
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
        number(g, "inductance_H", c.inductanceH());
        g.writeBooleanField("induced_e_included", c.inducedFieldIncluded());
        g.writeEndObject();
    }

    private static void writeSheet(JsonGenerator g, double tS, SheetState p) throws IOException {
        g.writeStartObject();
        g.writeNumberField("t", tS);
        g.writeStringField("id", p.id());
        g.writeStringField("kind", Labels.sheetKind(p.kind()));
        pair(g, "drag_N", p.forceN());
        g.writeNumberField("torque_Nm", p.torqueNm());
        pair(g, "pivot_m", p.pivotM());
        g.writeNumberField("joule_W", p.joulePowerW());
        g.writeNumberField("peak_current_density_A_per_m2", p.peakCurrentDensityAPerM2());
        g.writeNumberField("reynolds_magnetic", p.magneticReynolds());
        g.writeBooleanField("resistive_limit", p.magneticReynolds() <= SheetState.REYNOLDS_WARNING);
        g.writeStringField("eddy_model", Labels.eddyModel(p));
        number(g, "mean_velocity_mps", p.meanVelocityMPerS());
        g.writeNumberField("cell_m", p.cellM());
        g.writeBooleanField("induced_e_included", p.inducedFieldIncluded());
        g.writeArrayFieldStart("electrodes");
        for (SheetState.Electrode e : p.electrodes()) {
            g.writeStartObject();
            g.writeStringField("name", e.name());
            pair(g, "position_m", e.atM());
            g.writeNumberField("potential_V", e.potentialV());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("pairs");
        for (SheetState.Pair pair : p.pairs()) {
            g.writeStartObject();
            g.writeStringField("plus", pair.plus());
            g.writeStringField("minus", pair.minus());
            g.writeNumberField("voltage_V", pair.voltageV());
            g.writeStringField("positive", Labels.positiveName(pair.positive()));
            number(g, "ideal_voltage_V", pair.idealVoltageV());
            number(g, "end_shorting", pair.endShortingRatio());
            g.writeEndObject();
        }
        g.writeEndArray();
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
