package org.kinduct.scene.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Locale;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * Field-map files (docs/scene-format.md, "Field-map files"): B_z samples on a regular grid as
 * UTF-8 comma-separated text, in one of two layouts.
 *
 * <ul>
 * <li>{@link FieldGrid.Layout#POINTS}: a header naming the columns {@code x}, {@code y} and
 * {@code Bz}, each with its unit ({@code x_mm}, {@code y [mm]}, {@code Bz (mT)}), then one row
 * per sample, x fastest, rows from the lowest y, as {@code kinduct export --field-csv} writes.
 * <li>{@link FieldGrid.Layout#MATRIX}: B_z only, one file row per y from the lowest, one column
 * per x from the lowest; origin, spacing and unit come from the scene.
 * </ul>
 *
 * Spacing must be uniform: each coordinate may differ from {@code first + k·step} by at most
 * {@link #SPACING_TOLERANCE} of the step (exported files are uniform to rounding). The first
 * problem is reported with file, line and column, and reading stops there.
 */
public final class FieldMapCsv {

    /** Allowed departure from uniform spacing, as a fraction of the step: far above rounding, far below a real gap. */
    static final double SPACING_TOLERANCE = 1e-6;

    private FieldMapCsv() {
    }

    /** The samples of a points-layout file; {@code name} is how messages call the file. */
    public static FieldGrid readPoints(InputStream in, String name) throws IOException, FieldMapFormatException {
        return new PointsReader(new CsvScanner(in, name)).read();
    }

    /**
     * The samples of a matrix-layout file.
     *
     * @param originM position of the first sample of the first row, metres
     * @param spacingM distance between columns (x) and between rows (y), metres
     * @param unitT tesla per number in the file
     */
    public static FieldGrid readMatrix(InputStream in, String name, Vec2 originM, Vec2 spacingM, double unitT)
            throws IOException, FieldMapFormatException {
        CsvScanner csv = new CsvScanner(in, name);
        Samples samples = new Samples(csv);
        int nx = -1;
        int ny = 0;
        int firstLine = 0;
        while (csv.nextRecord()) {
            int columns = 0;
            while (csv.nextField()) {
                samples.add(csv.number("B_z") * unitT);
                columns++;
            }
            if (nx < 0) {
                nx = columns;
                firstLine = csv.line();
            } else if (columns != nx) {
                throw csv.error(csv.line(), 0, "this row has " + columns + " values, the first row (line " + firstLine
                        + ") has " + nx + "; every row of a matrix needs the same number");
            }
            ny++;
        }
        return grid(csv, FieldGrid.Layout.MATRIX, Math.max(nx, 0), ny, originM.x(), originM.y(), spacingM.x(),
                spacingM.y(), unitT, samples);
    }

    private static FieldGrid grid(CsvScanner csv, FieldGrid.Layout layout, int nx, int ny, double x0, double y0,
                                  double dx, double dy, double unitT, Samples samples)
            throws FieldMapFormatException {
        try {
            return new FieldGrid(layout, nx, ny, x0, y0, dx, dy, unitT, samples.toArray());
        } catch (IllegalArgumentException e) {
            throw csv.error(0, 0, e.getMessage());
        }
    }

    /** B_z values as they are read, refused beyond {@link FieldGrid#MAX_SAMPLES}. */
    private static final class Samples {
        private final CsvScanner csv;
        private double[] values = new double[1 << 12];
        private int count;

        Samples(CsvScanner csv) {
            this.csv = csv;
        }

        void add(double v) throws FieldMapFormatException {
            if (count == values.length) {
                if (count >= FieldGrid.MAX_SAMPLES) {
                    throw csv.error("more than " + FieldGrid.MAX_SAMPLES + " samples; a field map may hold at most"
                            + " that many (thin the grid out, or cut it to the region the conductors cross)");
                }
                values = Arrays.copyOf(values, (int) Math.min(FieldGrid.MAX_SAMPLES, 2L * count));
            }
            values[count++] = v;
        }

        double[] toArray() {
            return count == values.length ? values : Arrays.copyOf(values, count);
        }
    }

    /** The coordinate just read: its SI value, its text as written (a number, so ASCII), and its column; reused row after row. */
    private static final class Cell {
        private double value;
        private byte[] written;
        private int column;

        void set(double atValue, byte[] text, int atColumn) {
            value = atValue;
            written = text;
            column = atColumn;
        }

        double value() {
            return value;
        }

        int column() {
            return column;
        }

        /** The bytes as written, shared: never changed. */
        byte[] written() {
            return written;
        }

        String text() {
            return ascii(written);
        }
    }

    private static String ascii(byte[] text) {
        return new String(text, StandardCharsets.US_ASCII);
    }

    /** One column of a points file: its index and the factor from its unit to SI. */
    private record Column(int index, double toSi) {
    }

    /** Reads a points-layout file, checking the grid row by row as it goes. */
    private static final class PointsReader {
        private final CsvScanner csv;
        private final Samples samples;
        private Column x;
        private Column y;
        private Column bz;
        private int fieldCount;
        /** The first row's x texts and values; later rows usually repeat the texts exactly. */
        private byte[][] xWritten = new byte[64][];
        private double[] xs = new double[64];
        private int nx = -1;
        private int ny;
        private double y0;
        private double dy;
        private byte[] rowYWritten;
        private final Cell xCell = new Cell();
        private final Cell yCell = new Cell();
        private double rowY;
        private int rowCount;
        private int rowLine;
        /** The line of the last sample placed: where a short row ends. */
        private int lastLine;

        PointsReader(CsvScanner csv) {
            this.csv = csv;
            this.samples = new Samples(csv);
        }

        FieldGrid read() throws IOException, FieldMapFormatException {
            if (!csv.nextRecord()) {
                throw csv.error(0, 0, "the file holds no data: expected a header such as 'x_m,y_m,Bz_T' and rows");
            }
            header();
            while (csv.nextRecord()) {
                row();
            }
            endRow();
            if (nx < 0) {
                throw csv.error(0, 0, "the file holds a header but no samples");
            }
            double dx = (xs[nx - 1] - xs[0]) / (nx - 1);
            double dyAll = ny > 1 ? (rowY - y0) / (ny - 1) : 0;
            return grid(csv, FieldGrid.Layout.POINTS, nx, ny, xs[0], y0, dx, dyAll, bz.toSi(), samples);
        }

        /**
         * Reads one data line. A method of its own so that the compiler optimises it as a whole early
         * on, instead of compiling the loop that calls it on the fly: the first load of a large map ran
         * three times slower than later ones that way.
         */
        private void row() throws IOException, FieldMapFormatException {
            double bzValue = Double.NaN;
            int f = 0;
            while (csv.nextField()) {
                if (f == fieldCount) {
                    throw csv.error("more values than the header's " + fieldCount + " columns");
                }
                if (f == x.index()) {
                    boolean known = nx > 0 && rowCount < nx;
                    read(xCell, known ? xWritten[rowCount] : null, known ? xs[rowCount] : 0, "x", x.toSi());
                } else if (f == y.index()) {
                    read(yCell, rowYWritten, rowY, "y", y.toSi());
                } else if (f == bz.index()) {
                    bzValue = csv.number("B_z") * bz.toSi();
                }
                f++;
            }
            if (f < fieldCount) {
                throw csv.error(csv.line(), 0, "this row has " + f + " values, the header has " + fieldCount);
            }
            sample(csv.line(), bzValue);
        }

        /** Reads a coordinate into {@code cell}: the value known for {@code knownText} when the field repeats it exactly. */
        private void read(Cell cell, byte[] knownText, double knownValue, String axis, double toSi)
                throws FieldMapFormatException {
            if (knownText != null && csv.sameBytes(knownText)) {
                cell.set(knownValue, knownText, csv.column());
            } else {
                cell.set(csv.number(axis) * toSi, csv.bytes(), csv.column());
            }
        }

        private void header() throws IOException, FieldMapFormatException {
            while (csv.nextField()) {
                headerColumn(fieldCount);
                fieldCount++;
            }
            if (x == null || y == null || bz == null) {
                throw csv.error(1, 0, "the header must name the columns x, y and Bz, each with its unit, e.g."
                        + " 'x_m,y_m,Bz_T' or 'x [mm],y [mm],Bz [mT]'; missing: "
                        + (x == null ? "x " : "") + (y == null ? "y " : "") + (bz == null ? "Bz" : "").strip());
            }
        }

        /** Reads one header name; other columns are allowed and skipped (they keep rows aligned). */
        private void headerColumn(int index) throws FieldMapFormatException {
            String text = csv.text();
            String lower = text.toLowerCase(Locale.ROOT);
            for (String name : new String[] {"b_z", "bz", "x", "y"}) {
                if (!lower.startsWith(name)) {
                    continue;
                }
                String rest = text.substring(name.length()).strip();
                String unit;
                if (rest.startsWith("_")) {
                    unit = rest.substring(1).strip();
                } else if ((rest.startsWith("[") && rest.endsWith("]")) || (rest.startsWith("(") && rest.endsWith(")"))) {
                    unit = rest.substring(1, rest.length() - 1).strip();
                } else if (rest.isEmpty()) {
                    throw csv.error("column '" + text + "' has no unit; write it as '" + text + "_"
                            + (name.startsWith("b") ? "T" : "m") + "' or '" + text + " [" + (name.startsWith("b")
                            ? "mT" : "mm") + "]'");
                } else {
                    continue;
                }
                boolean field = name.startsWith("b");
                double toSi;
                try {
                    toSi = Units.parse("1 " + unit, field ? Dimension.FLUX_DENSITY : Dimension.LENGTH);
                } catch (IllegalArgumentException e) {
                    throw csv.error("column '" + text + "': unit '" + unit + "' is not "
                            + (field ? "a flux density unit such as T, mT, uT or G" : "a length unit such as m or mm"));
                }
                Column column = new Column(index, toSi);
                Column previous = field ? bz : name.equals("x") ? x : y;
                if (previous != null) {
                    throw csv.error("column '" + text + "' repeats column " + (previous.index() + 1));
                }
                if (field) {
                    bz = column;
                } else if (name.equals("x")) {
                    x = column;
                } else {
                    y = column;
                }
                return;
            }
        }

        /** Places one sample: the next in the current row, or the first of a new row. */
        private void sample(int line, double bzValue) throws FieldMapFormatException {
            if (rowYWritten == null || yCell.value() != rowY) {
                endRow();
                startRow(line);
            }
            if (nx < 0) {
                if (rowCount > 0 && !(xCell.value() > xs[rowCount - 1])) {
                    throw csv.error(line, xCell.column(), "x must increase along a row (x fastest, rows from the"
                            + " lowest y, as Kinduct writes); x = " + xCell.text() + " follows " + ascii(xWritten[rowCount - 1]));
                }
                if (rowCount >= 2) {
                    checkUniform(line, xCell, "x", xs[0], xs[1] - xs[0], rowCount);
                }
                if (rowCount == xs.length) {
                    xs = Arrays.copyOf(xs, 2 * rowCount);
                    xWritten = Arrays.copyOf(xWritten, 2 * rowCount);
                }
                xs[rowCount] = xCell.value();
                xWritten[rowCount] = xCell.written();
            } else if (rowCount >= nx) {
                throw csv.error(line, xCell.column(), "the row at y = " + ascii(rowYWritten) + " (from line " + rowLine
                        + ") has more than " + nx + " samples, the number in the first row");
            } else if (Math.abs(xCell.value() - xs[rowCount]) > SPACING_TOLERANCE * (xs[1] - xs[0])) {
                throw csv.error(line, xCell.column(), "x = " + xCell.text() + " is not the grid's column "
                        + (rowCount + 1) + " (x = " + ascii(xWritten[rowCount]) + " in the first row); every row needs the"
                        + " same x positions");
            }
            samples.add(bzValue);
            rowCount++;
            lastLine = line;
        }

        private void startRow(int line) throws FieldMapFormatException {
            if (ny == 0) {
                y0 = yCell.value();
            } else if (!(yCell.value() > rowY)) {
                throw csv.error(line, yCell.column(), "y must increase from row to row (x fastest, rows from the"
                        + " lowest y, as Kinduct writes); y = " + yCell.text() + " follows " + ascii(rowYWritten));
            } else if (ny == 1) {
                dy = yCell.value() - y0;
            } else {
                checkUniform(line, yCell, "y", y0, dy, ny);
            }
            rowY = yCell.value();
            rowYWritten = yCell.written();
            rowCount = 0;
            rowLine = line;
            ny++;
        }

        private void endRow() throws FieldMapFormatException {
            if (rowYWritten == null) {
                return;
            }
            if (nx < 0) {
                nx = rowCount;
            } else if (rowCount != nx) {
                throw csv.error(lastLine, 0, "the row at y = " + ascii(rowYWritten) + " (from line " + rowLine + ") has " + rowCount
                        + " samples, the first row has " + nx + "; every row needs the same x positions");
            }
        }

        private void checkUniform(int line, Cell cell, String axis, double first, double step, int k)
                throws FieldMapFormatException {
            double expected = first + k * step;
            if (Math.abs(cell.value() - expected) > SPACING_TOLERANCE * step) {
                throw csv.error(line, cell.column(), "spacing is not uniform: " + axis + " = " + cell.text()
                        + " where the first two steps give " + expected + " m (step " + step + " m); a field map"
                        + " needs a regular grid");
            }
        }
    }
}
