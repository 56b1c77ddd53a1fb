package org.kinduct.render.export;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.report.Labels;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;
import org.kinduct.render.paint.EditorMarks;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.LineChart;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.paint.Quantities;
import org.kinduct.render.paint.ScenePainter;
import org.kinduct.render.paint.SheetTexts;
import org.kinduct.render.paint.Surface;
import org.kinduct.render.paint.TextMetrics;
import org.kinduct.render.view.ViewTransform;

/**
 * An annotated snapshot as one page: title block, the painter's map (field, conductors, polarity,
 * callouts, legend, scale bar), a results table per conductor, sign conventions and cautions.
 *
 * <p>The page is laid out in units on a fixed width of {@link #WIDTH}; outputs scale it to their
 * pixel width. The width is chosen for legibility in print: placed 16 cm wide, one unit is
 * 0.267 mm, so the 12-unit body text is 9.1 pt, the painter's 12-unit callouts the same and its
 * 11-unit legend text 8.3 pt (1 pt = 0.3528 mm).
 */
final class SnapshotPage {

    static final double WIDTH = 600;
    static final double MARGIN = 16;
    static final double BODY = 12;
    private static final double TITLE = 17;
    /** Smallest table text: still 8 pt when the page is printed 16 cm wide. */
    static final double MIN_TABLE_FONT = 10.6;
    private static final double LINE = 16;
    private static final double COLUMN_GAP = 10;
    /** Rounding room when a shrunk table is checked against the width it was shrunk to, units. */
    private static final double FIT_SLACK = 0.5;
    private static final double MIN_MAP_HEIGHT = 340;
    private static final double CHART_HEIGHT = 170;
    private static final double MAX_MAP_HEIGHT = 600;
    /** A chosen box is drawn at its own aspect down to this height (a very wide strip gets more above and below). */
    private static final double MIN_BOX_HEIGHT = 100;
    /**
     * Room a fitted scene (or a chosen box, when the legend is shown) leaves free in the map for
     * the painter's overlays: its legend on the right, the time box and axis labels on top.
     */
    private static final double FIT_LEFT = 30;
    private static final double FIT_RIGHT = 204;
    private static final double FIT_TOP = 46;
    private static final double FIT_BOTTOM = 30;

    private static final int PAPER = 0xFFFFFFFF;
    private static final int INK = 0xFF1E1E1E;
    private static final int MUTED = 0xFF555555;
    private static final int RULE = 0xFF8C8C8C;
    private static final int STRIPE = 0xFFF1F1EC;
    private static final int WARNING = 0xFFB00020;

    /** A table cell for a quantity that does not apply to a conductor (wire flux, open-loop current). */
    static final String NOT_APPLICABLE = "—";
    static final String SIGNS = "Signs: x right, y up; B_z > 0 out of the page (⊙), < 0 into it (⊗). EMF and"
            + " current are positive along each conductor's vertex order (loops: counter-clockwise); a wire's"
            + " EMF > 0 makes its last vertex the + end.";
    static final String PATCH_POTENTIALS = "* A field patch moves: currents, forces and heat in plates and channels are"
            + " exact, but electrode voltages lack the patch's w·A, unknown from B_z alone.";
    /** Said after the warning of a state beyond the resistive limit. */
    static final String RESISTIVE_LIMIT = "; its own field, neglected here, weakens the currents: drag and heat are"
            + " overestimated.";
    /** Gap between two tables, units. */
    private static final double TABLE_GAP = 8;
    static final String MOTIONAL_ONLY = "* v × B part only: a moving field patch has no known induced electric"
            + " field.";

    private final Scene scene;
    private final Snapshot snapshot;
    private final SnapshotOptions options;
    private final ViewTransform mapView;
    private final List<String> description;
    private final double mapTop;
    private final double mapHeight;
    /** Conductors, plates and channels, electrode pairs: those that have rows. */
    private final List<Table> tables;
    private final ResultScales scales;
    /** The EMF over the run with the shown instant marked, or null for a page without one. */
    private final LineChart.Content waveform;
    private final double chartTop;
    private final double tableTop;
    private final List<Note> notes = new ArrayList<>();
    private final double height;

    /** One wrapped line of text under the table. */
    private record Note(String text, int colour, boolean bold) {
    }

    /** Cells per row, the header first; numeric columns are right-aligned. */
    private record Table(List<String[]> rows, double[] left, double[] width, boolean[] right, double font) {
    }

    private SnapshotPage(Scene scene, Snapshot snapshot, List<String> remarks, List<String> cautions,
                         ResultScales scales, LineChart.Content waveform, SnapshotOptions options) {
        this.scene = scene;
        this.snapshot = snapshot;
        this.options = options;
        double text = WIDTH - 2 * MARGIN;
        description = wrap(scene.description(), BODY, false, text);
        mapTop = MARGIN + TITLE + 8 + description.size() * LINE + LINE + 8;
        ViewChoice.Box box = ViewChoice.box(options.view(), scene, snapshot.tS(), snapshot.freeBodies());
        double aspect = (box.y1() - box.y0()) / (box.x1() - box.x0());
        // A fitted scene stays clear of the overlays; a chosen box is the map, edge to edge (exactly
        // that box while it is no taller than wide; a taller one is shown whole with more on its sides).
        if (options.view() instanceof ViewChoice.Fit) {
            double room = WIDTH - FIT_LEFT - FIT_RIGHT;
            mapHeight = clampMapHeight(room * aspect + FIT_TOP + FIT_BOTTOM);
            mapView = fitInto(box, FIT_LEFT, FIT_TOP, WIDTH - FIT_RIGHT, mapHeight - FIT_BOTTOM);
        } else {
            mapHeight = Math.max(MIN_BOX_HEIGHT, Math.min(MAX_MAP_HEIGHT, WIDTH * aspect));
            mapView = new ViewTransform(0, 0, 1, WIDTH, mapHeight).fitting(box.x0(), box.y0(), box.x1(), box.y1(), 0);
        }
        tables = tables(scene, snapshot, scales, text);
        this.scales = scales;
        this.waveform = waveform;
        chartTop = mapTop + mapHeight + 8;
        tableTop = chartTop + (waveform == null ? 4 : CHART_HEIGHT + 8);
        boolean motionalOnly = false;
        for (ConductorState c : snapshot.conductors()) {
            motionalOnly |= c.kind() == ConductorState.Kind.WIRE && !c.inducedFieldIncluded();
        }
        boolean patchPotentials = snapshot.sheets().stream().anyMatch(p -> !p.inducedFieldIncluded());
        List<String> limits = snapshot.sheets().stream().filter(SheetState::beyondResistiveLimit)
                .map(p -> p.id() + ": " + Labels.reynoldsWarning(p.magneticReynolds()) + RESISTIVE_LIMIT).toList();
        for (String line : wrap(SIGNS, BODY, false, text)) {
            notes.add(new Note(line, MUTED, false));
        }
        if (motionalOnly) {
            for (String line : wrap(MOTIONAL_ONLY, BODY, false, text)) {
                notes.add(new Note(line, MUTED, false));
            }
        }
        if (patchPotentials) {
            for (String line : wrap(PATCH_POTENTIALS, BODY, false, text)) {
                notes.add(new Note(line, MUTED, false));
            }
        }
        for (String limit : limits) {
            for (String line : wrap(limit, BODY, true, text)) {
                notes.add(new Note(line, WARNING, true));
            }
        }
        for (String remark : remarks) {
            for (String line : wrap(remark, BODY, false, text)) {
                notes.add(new Note(line, MUTED, false));
            }
        }
        for (String caution : cautions) {
            for (String line : wrap(caution, BODY, true, text)) {
                notes.add(new Note(line, WARNING, true));
            }
        }
        height = Math.ceil(tableTop + tablesHeight() + 10 + notes.size() * LINE + MARGIN);
    }

    private static double clampMapHeight(double h) {
        return Math.max(MIN_MAP_HEIGHT, Math.min(MAX_MAP_HEIGHT, Math.rint(h)));
    }

    /** A map view showing {@code box} as large as fits in the map region [left, right] × [top, bottom], centred. */
    private ViewTransform fitInto(ViewChoice.Box box, double left, double top, double right, double bottom) {
        double s = Math.min((right - left) / (box.x1() - box.x0()), (bottom - top) / (box.y1() - box.y0()));
        double cx = (box.x0() + box.x1()) / 2 - ((left + right) / 2 - WIDTH / 2) / s;
        double cy = (box.y0() + box.y1()) / 2 + ((top + bottom) / 2 - mapHeight / 2) / s;
        return new ViewTransform(cx, cy, s, WIDTH, mapHeight);
    }

    static SnapshotPage layout(Scene scene, Snapshot snapshot, List<String> cautions, SnapshotOptions options) {
        return layout(scene, snapshot, List.of(), cautions, ResultScales.of(List.of(snapshot)), null, options);
    }

    /**
     * A page with {@code remarks} (e.g. the run's energy audit) under the sign conventions, and
     * table values read against {@code scales} (those of the run, so that rounding noise reads 0),
     * and under the map the {@code waveform} chart (null: none); free bodies are drawn where the
     * snapshot has them.
     */
    static SnapshotPage layout(Scene scene, Snapshot snapshot, List<String> remarks, List<String> cautions,
                               ResultScales scales, LineChart.Content waveform, SnapshotOptions options) {
        return new SnapshotPage(scene, snapshot, remarks, cautions, scales, waveform, options);
    }

    double height() {
        return height;
    }

    /** The map's view transform in page units (origin at the map's top-left corner). */
    ViewTransform mapView() {
        return mapView;
    }

    double mapTop() {
        return mapTop;
    }

    double mapHeight() {
        return mapHeight;
    }

    /** Draws the page on {@code s}, which must be {@link #WIDTH} × {@link #height()} units. */
    void draw(Surface s, FieldRaster raster) {
        s.save();
        s.fill(PAPER);
        s.fillRect(0, 0, WIDTH, height);
        titleBlock(s);
        s.save();
        s.translate(0, mapTop);
        // The title block states the time, so the map does not repeat it.
        EnumSet<Layer> layers = EnumSet.copyOf(options.layers());
        layers.remove(Layer.TIME);
        ScenePainter.draw(new Viewport(s, WIDTH, mapHeight), new Picture(scene, snapshot.tS(), snapshot, raster, mapView,
                layers, options.range(), EditorMarks.none(), "", scales));
        s.restore();
        s.stroke(RULE);
        s.lineWidth(1);
        s.dash();
        s.strokeRect(0.5, mapTop, WIDTH - 1, mapHeight);
        if (waveform != null) {
            LineChart.draw(s, MARGIN - 8, chartTop, WIDTH - 2 * MARGIN + 8, CHART_HEIGHT, waveform);
        }
        double top = tableTop;
        for (Table table : tables) {
            drawTable(s, table, top);
            top += table.rows().size() * LINE + TABLE_GAP;
        }
        double y = tableTop + tablesHeight() + 10;
        for (Note n : notes) {
            s.fill(n.colour());
            s.text(n.text(), MARGIN, y + LINE / 2, BODY, n.bold(), Surface.Anchor.LEFT);
            y += LINE;
        }
        s.restore();
    }

    private void titleBlock(Surface s) {
        s.fill(INK);
        String name = scene.name().isEmpty() ? "(unnamed scene)" : scene.name();
        s.text(name, MARGIN, MARGIN, TITLE, true, Surface.Anchor.TOP_LEFT);
        double y = MARGIN + TITLE + 8;
        s.fill(MUTED);
        for (String line : description) {
            s.text(line, MARGIN, y + LINE / 2, BODY, false, Surface.Anchor.LEFT);
            y += LINE;
        }
        s.fill(INK);
        s.text("t = " + Quantities.time(snapshot.tS()), MARGIN, y + LINE / 2, BODY, true, Surface.Anchor.LEFT);
        s.fill(MUTED);
        s.text(viewText() + " · " + options.date() + " · Kinduct " + options.version(), WIDTH - MARGIN,
                y + LINE / 2, BODY, false, Surface.Anchor.RIGHT);
    }

    private String viewText() {
        if (options.view() instanceof ViewChoice.Fit) {
            return "whole scene";
        }
        return "view " + Quantities.length(mapView.maxX() - mapView.minX()) + " × "
                + Quantities.length(mapView.maxY() - mapView.minY());
    }

    /** The tables' height with the gaps between them, units. */
    private double tablesHeight() {
        double h = 0;
        for (Table table : tables) {
            h += table.rows().size() * LINE;
        }
        return h + TABLE_GAP * Math.max(0, tables.size() - 1);
    }

    private static void drawTable(Surface s, Table table, double top) {
        double y = top;
        List<String[]> rows = table.rows();
        for (int r = 0; r < rows.size(); r++) {
            if (r > 0 && r % 2 == 0) {
                s.fill(STRIPE);
                s.fillRect(MARGIN - 4, y, WIDTH - 2 * MARGIN + 8, LINE);
            }
            s.fill(INK);
            String[] cells = rows.get(r);
            for (int c = 0; c < cells.length; c++) {
                double x = table.right()[c] ? table.left()[c] + table.width()[c] : table.left()[c];
                s.text(cells[c], x, y + LINE / 2, table.font(), r == 0,
                        table.right()[c] ? Surface.Anchor.RIGHT : Surface.Anchor.LEFT);
            }
            if (r == 0) {
                s.stroke(RULE);
                s.lineWidth(1);
                s.beginPath();
                s.moveTo(MARGIN - 4, y + LINE);
                s.lineTo(WIDTH - MARGIN + 4, y + LINE);
                s.strokePath();
            }
            y += LINE;
        }
    }

    /**
     * The results tables at the snapshot time: wires and loops, plates and channels, and electrode
     * pairs, each where it has rows.
     */
    private static List<Table> tables(Scene scene, Snapshot snap, ResultScales scales, double avail) {
        List<Table> tables = new ArrayList<>();
        List<String[]> conductors = new ArrayList<>();
        for (ConductorState st : snap.conductors()) {
            conductors.add(row(scene.conductor(st.id()).orElseThrow(), st, scales));
        }
        if (!conductors.isEmpty()) {
            tables.add(table(new String[] {"conductor", "Φ per turn", "EMF", "methods agree", "I",
                "polarity / sense", "force, direction"}, new boolean[] {false, true, true, false, true, false, false},
                    conductors, avail));
        }
        List<String[]> sheets = new ArrayList<>();
        List<String[]> pairs = new ArrayList<>();
        for (SheetState st : snap.sheets()) {
            sheets.add(sheetRow(st, scales));
            for (SheetState.Pair p : st.pairs()) {
                pairs.add(pairRow(st, p, scales));
            }
        }
        if (!sheets.isEmpty()) {
            tables.add(table(new String[] {"plate/channel", "force, direction", "torque", "Joule heat", "peak |J|",
                "Rm"}, new boolean[] {false, false, true, true, true, true}, sheets, avail));
        }
        if (!pairs.isEmpty()) {
            tables.add(table(new String[] {"electrodes", "U = φ+ − φ−", "polarity", "of B·w·v̄"},
                    new boolean[] {false, true, false, true}, pairs, avail));
        }
        return tables;
    }

    /**
     * A table of {@code all} under {@code header}. Columns that apply to no row are left out; a
     * table still too wide for {@code avail} units gets a smaller font, then shortened ids.
     */
    private static Table table(String[] header, boolean[] numeric, List<String[]> all, double avail) {
        List<Integer> kept = new ArrayList<>();
        for (int col = 0; col < header.length; col++) {
            final int c = col;
            if (col == 0 || all.stream().anyMatch(r -> !NOT_APPLICABLE.equals(r[c]))) {
                kept.add(col);
            }
        }
        int n = kept.size();
        List<String[]> rows = new ArrayList<>();
        for (int r = -1; r < all.size(); r++) {
            String[] src = r < 0 ? header : all.get(r);
            String[] cells = new String[n];
            for (int i = 0; i < n; i++) {
                cells[i] = src[kept.get(i)];
            }
            rows.add(cells);
        }
        boolean[] right = new boolean[n];
        for (int i = 0; i < n; i++) {
            right[i] = numeric[kept.get(i)];
        }
        double gaps = COLUMN_GAP * (n - 1);
        double font = BODY;
        double[] width = widths(rows, font);
        double total = sum(width) + gaps;
        if (total > avail) {
            font = Math.max(MIN_TABLE_FONT, font * (avail - gaps) / (total - gaps));
            width = widths(rows, font);
            double idRoom = avail - gaps - (sum(width) - width[0]);
            if (width[0] > idRoom + FIT_SLACK) {
                for (int r = 1; r < rows.size(); r++) {
                    rows.get(r)[0] = ellipsize(rows.get(r)[0], font, idRoom);
                }
                width[0] = idRoom;
            }
        }
        double[] left = new double[n];
        double x = MARGIN;
        for (int col = 0; col < n; col++) {
            left[col] = x;
            x += width[col] + COLUMN_GAP;
        }
        return new Table(rows, left, width, right, font);
    }

    /** A plate's or channel's row: id, force with its direction, torque, Joule power, peak |J|, Rm. */
    private static String[] sheetRow(SheetState st, ResultScales scales) {
        return new String[] {st.id(), SheetTexts.drag(st, scales), SheetTexts.torque(st, scales),
            SheetTexts.joule(st, scales), SheetTexts.peakCurrentDensity(st),
            SheetTexts.reynolds(st) + Labels.reynoldsMark(st)};
    }

    /** An electrode pair's row: conductor and electrodes, voltage, + electrode, share of B·w·v̄ (channels). */
    private static String[] pairRow(SheetState st, SheetState.Pair p, ResultScales scales) {
        return new String[] {st.id() + ": " + SheetTexts.pair(p), SheetTexts.voltage(st, p, scales),
            Labels.positiveElectrode(p.positive()), SheetTexts.endShorting(p)};
    }

    /** Widest cell per column, header in bold. */
    private static double[] widths(List<String[]> rows, double font) {
        double[] w = new double[rows.get(0).length];
        for (int r = 0; r < rows.size(); r++) {
            for (int c = 0; c < w.length; c++) {
                w[c] = Math.max(w[c], TextMetrics.width(rows.get(r)[c], font, r == 0));
            }
        }
        return w;
    }

    private static double sum(double[] values) {
        double s = 0;
        for (double v : values) {
            s += v;
        }
        return s;
    }

    /** {@code text}, cut and ended with "…" so that it fits {@code max} units. */
    static String ellipsize(String text, double font, double max) {
        if (TextMetrics.width(text, font, false) <= max) {
            return text;
        }
        int end = text.length();
        while (end > 1 && TextMetrics.width(text.substring(0, end) + "…", font, false) > max) {
            end--;
        }
        return text.substring(0, end) + "…";
    }

    private static String[] row(Conductor c, ConductorState st, ResultScales scales) {
        boolean closedLoop = c instanceof Conductor.Loop loop && !loop.open();
        boolean wire = st.kind() == ConductorState.Kind.WIRE;
        String flux = wire ? NOT_APPLICABLE : Quantities.flux(scales.flux(st.fluxWb()));
        String emf = Quantities.voltage(scales.emf(st.emfV())) + (wire && !st.inducedFieldIncluded() ? " *" : "");
        String agree = wire ? NOT_APPLICABLE : Labels.agreement(st.disagreement());
        String current = closedLoop ? Quantities.current(scales.current(st.currentA())) : NOT_APPLICABLE;
        String sense = closedLoop ? Labels.sense(st.direction()) : Labels.polarity(st.positiveEnd(), !wire);
        Vec2 forceN = scales.force(st.forceN());
        double f = forceN.length();
        // A closed loop's force is a result even when it is zero; only its direction is then undefined.
        String force = closedLoop ? Quantities.force(f) + (f > 0 ? " ∠ " + Labels.direction(forceN) : "") : NOT_APPLICABLE;
        return new String[] {c.id(), flux, emf, agree, current, sense, force};
    }

    /** Greedy word wrap to {@code width} units. */
    static List<String> wrap(String text, double size, boolean bold, double width) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.strip().split("\\s+", -1)) {
            if (word.isEmpty()) {
                continue;
            }
            String tried = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && TextMetrics.width(tried, size, bold) > width) {
                lines.add(line.toString());
                line.setLength(0);
                line.append(word);
            } else {
                line.setLength(0);
                line.append(tried);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
