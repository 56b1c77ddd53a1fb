package org.kinduct.scene;

/**
 * A rigid carrier of sources and conductors. Everything on a body moves with its {@link Motion};
 * rotation is about {@code pivot} (as drawn).
 */
public record Body(String id, String name, Vec2 pivot, Motion motion) {

    /** Id of the implicit fixed frame, which every scene has. */
    public static final String FIXED = "fixed";

    public Body {
        Checks.id(id, "Body");
        name = name == null ? id : name;
        Checks.nonNull(pivot, "pivot");
        Checks.nonNull(motion, "motion");
        if (FIXED.equals(id) && !(motion instanceof Motion.Still)) {
            throw new IllegalArgumentException("the fixed frame cannot move");
        }
    }

    public static Body fixed() {
        return new Body(FIXED, "fixed frame", Vec2.ZERO, new Motion.Still());
    }

    public Pose poseAt(double tS) {
        return motion.poseAt(pivot, tS);
    }
}
