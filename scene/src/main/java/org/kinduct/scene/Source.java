package org.kinduct.scene;

import java.util.List;
import java.util.Optional;

/**
 * A source of magnetic field. Only B_z, the component normal to the drawing plane, enters the
 * plan-view model (see DEVELOPERS.md, "Physical model"). Positions are as drawn (t = 0); the
 * source rides body {@link #body()}.
 */
public sealed interface Source
        permits Source.FieldPatch, Source.UniformField, Source.BlockMagnet, Source.CylinderMagnet,
                Source.SourceCoil, Source.FieldMap {

    String id();

    /** Id of the body the source rides; {@link Body#FIXED} for the fixed frame. */
    String body();

    /**
     * Dispatches to the case for this kind. Adding a kind adds a method to {@link Cases}, so every
     * place that handles sources fails to compile until it handles the new one (Java 17 has no
     * exhaustive pattern {@code switch} outside preview).
     */
    <R> R match(Cases<R> cases);

    /** True when the source's strength changes with time by itself (an AC-driven coil), whether or not its body moves. */
    default boolean alternates() {
        return this instanceof SourceCoil coil && coil.drive().alternates();
    }

    /** One method per kind of source. */
    interface Cases<R> {
        R patch(FieldPatch patch);

        R uniform(UniformField uniform);

        R block(BlockMagnet block);

        R cylinder(CylinderMagnet cylinder);

        R coil(SourceCoil coil);

        R map(FieldMap map);
    }

    /** An ideal region of uniform B_z (tesla, + out of the screen) bounded by a simple polygon. */
    record FieldPatch(String id, String body, List<Vec2> outline, double bzT) implements Source {
        public FieldPatch {
            Checks.id(id, "Source");
            Checks.id(body, "Body");
            outline = Polygons.requireSimple(outline, "field patch outline");
            Checks.finite(bzT, "B_z");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.patch(this);
        }
    }

    /**
     * Uniform B_z everywhere (tesla), e.g. the normal component of the Earth's field. When made
     * from geomagnetic elements, {@code earth} holds them and B_z is theirs, replacing any
     * {@code bzT} given (so a file can keep and re-edit the elements rather than one number).
     */
    record UniformField(String id, double bzT, Optional<EarthField> earth) implements Source {
        public UniformField {
            Checks.id(id, "Source");
            Checks.nonNull(earth, "earth");
            if (earth.isPresent()) {
                bzT = earth.get().bzT();
            }
            Checks.finite(bzT, "B_z");
        }

        /** A field given by its value alone. */
        public UniformField(String id, double bzT) {
            this(id, bzT, Optional.empty());
        }

        /** The Earth's field normal to the board. */
        public static UniformField earth(String id, EarthField earth) {
            return new UniformField(id, earth.bzT(), Optional.of(earth));
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.uniform(this);
        }

        @Override
        public String body() {
            return Body.FIXED;
        }
    }

    /** Which side of the drawing plane a magnet or coil sits on. */
    enum Side {
        /** z < 0, behind the screen. */
        BELOW,
        /** z > 0, in front of the screen. */
        ABOVE
    }

    /** Direction of a magnet's magnetization: its north face points to +z (out of the screen) or −z. */
    enum Magnetization { PLUS_Z, MINUS_Z }

    /**
     * A rectangular block magnet magnetized along ±z, uniform and rigid (recoil permeability 1).
     *
     * @param sizeXM edge along the magnet's own x axis (before rotation), metres
     * @param sizeYM edge along its own y axis, metres
     * @param heightM thickness along z, metres
     * @param angleRad rotation of the magnet about z, counter-clockwise
     * @param standoffM gap between the drawing plane and the magnet's nearer face, metres (≥ 0)
     */
    record BlockMagnet(String id, String body, Vec2 center, double sizeXM, double sizeYM, double heightM,
                       double angleRad, double standoffM, Side side, double remanenceT,
                       Magnetization magnetization) implements Source {
        public BlockMagnet {
            Checks.id(id, "Source");
            Checks.id(body, "Body");
            Checks.nonNull(center, "center");
            Checks.size(sizeXM, "size x");
            Checks.size(sizeYM, "size y");
            Checks.size(heightM, "height");
            Checks.finite(angleRad, "angle");
            Checks.nonNegative(standoffM, "stand-off");
            Checks.nonNull(side, "side");
            Checks.positive(remanenceT, "remanence");
            Checks.nonNull(magnetization, "magnetization");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.block(this);
        }
    }

    /** A cylindrical magnet, axis along z, magnetized along ±z. Stand-off as for {@link BlockMagnet}. */
    record CylinderMagnet(String id, String body, Vec2 center, double radiusM, double heightM,
                          double standoffM, Side side, double remanenceT, Magnetization magnetization)
            implements Source {
        public CylinderMagnet {
            Checks.id(id, "Source");
            Checks.id(body, "Body");
            Checks.nonNull(center, "center");
            Checks.size(radiusM, "radius");
            Checks.size(heightM, "height");
            Checks.nonNegative(standoffM, "stand-off");
            Checks.nonNull(side, "side");
            Checks.positive(remanenceT, "remanence");
            Checks.nonNull(magnetization, "magnetization");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.cylinder(this);
        }
    }

    /**
     * A thin-filament source coil of {@code turns} turns in the plane z = {@code planeZM}
     * (must not be 0: a filament in the drawing plane has a singular field there). Current is
     * positive counter-clockwise seen from +z, along the polygon's vertex order.
     */
    record SourceCoil(String id, String body, CoilShape shape, int turns, double planeZM, Drive drive)
            implements Source {
        public SourceCoil {
            Checks.id(id, "Source");
            Checks.id(body, "Body");
            Checks.nonNull(shape, "shape");
            if (turns < 1) {
                throw new IllegalArgumentException("turns must be at least 1, got " + turns);
            }
            Checks.finite(planeZM, "plane offset z");
            if (planeZM == 0) {
                throw new IllegalArgumentException("a source coil must sit off the drawing plane (z ≠ 0)");
            }
            Checks.size(Math.abs(planeZM), "a source coil's distance from the drawing plane");
            Checks.nonNull(drive, "drive");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.coil(this);
        }
    }

    /**
     * B_z given as samples on a regular grid (a Hall-probe scan, or a field exported from a detailed
     * simulation or from Kinduct itself), read from a CSV file beside the scene. The grid's own
     * coordinates, shifted by {@code offsetM}, are where it was drawn; it rides {@code body} like
     * any source. Between samples the solver interpolates with a C¹ bicubic; outside the grid
     * {@code outside} says what holds.
     *
     * @param file the CSV file as the scene names it, relative to the scene file's folder
     * @param grid the samples read from it
     * @param offsetM shift of the whole grid from the coordinates in the file, metres
     */
    record FieldMap(String id, String body, String file, FieldGrid grid, Vec2 offsetM, Outside outside)
            implements Source {
        public FieldMap {
            Checks.id(id, "Source");
            Checks.id(body, "Body");
            Checks.nonNull(file, "file");
            if (file.isBlank()) {
                throw new IllegalArgumentException("a field map needs a file name");
            }
            Checks.nonNull(grid, "grid");
            Checks.nonNull(offsetM, "offset");
            Checks.nonNull(outside, "outside");
        }

        /** What B_z is beyond the outermost samples. */
        public enum Outside {
            /** Zero: the map holds all of the field there is. */
            ZERO,
            /** Unknown: a conductor that reaches beyond the map is an error. */
            ERROR
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.map(this);
        }
    }

    /** The outline of a source coil. */
    sealed interface CoilShape permits CoilShape.Polygon, CoilShape.Circle {

        /** Dispatches to the case for this shape (see {@link Source#match}). */
        <R> R match(Cases<R> cases);

        /** One method per coil shape. */
        interface Cases<R> {
            R polygon(Polygon polygon);

            R circle(Circle circle);
        }

        /** Closed polygon, vertex order gives the positive current direction. */
        record Polygon(List<Vec2> vertices) implements CoilShape {
            public Polygon {
                vertices = Polygons.requireSimple(vertices, "coil outline");
            }

            @Override
            public <R> R match(Cases<R> cases) {
                return cases.polygon(this);
            }
        }

        /** Circle; positive current counter-clockwise. */
        record Circle(Vec2 center, double radiusM) implements CoilShape {
            public Circle {
                Checks.nonNull(center, "center");
                Checks.size(radiusM, "radius");
            }

            @Override
            public <R> R match(Cases<R> cases) {
                return cases.circle(this);
            }
        }
    }

    /**
     * Coil current i(t) = dc + amplitude·sin(2πf·t + phase), amperes (per turn).
     */
    record Drive(double dcA, double amplitudeA, double frequencyHz, double phaseRad) {
        public Drive {
            Checks.finite(dcA, "DC current");
            Checks.finite(amplitudeA, "current amplitude");
            Checks.nonNegative(frequencyHz, "frequency");
            Checks.finite(phaseRad, "phase");
        }

        public static Drive dc(double amps) {
            return new Drive(amps, 0, 0, 0);
        }

        /** True when the current changes with time: a nonzero amplitude at a nonzero frequency. */
        public boolean alternates() {
            return amplitudeA != 0 && frequencyHz > 0;
        }

        public double currentAt(double tS) {
            return dcA + amplitudeA * Math.sin(2 * Math.PI * frequencyHz * tS + phaseRad);
        }

        public double rateAt(double tS) {
            double w = 2 * Math.PI * frequencyHz;
            return amplitudeA * w * Math.cos(w * tS + phaseRad);
        }
    }
}
