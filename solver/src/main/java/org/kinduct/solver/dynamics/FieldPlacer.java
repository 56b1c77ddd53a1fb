package org.kinduct.solver.dynamics;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.solver.field.PlaneField;

/** The field of a scene source when its body is at a pose, at a time (coil currents follow their drive). */
@FunctionalInterface
public interface FieldPlacer {

    PlaneField place(Source source, Pose pose, double tS);
}
