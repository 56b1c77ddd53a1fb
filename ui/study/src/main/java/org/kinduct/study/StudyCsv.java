package org.kinduct.study;

import java.util.ArrayList;
import java.util.List;

/**
 * A study's rows as CSV: {@code point}, each varied value and each metric with its SI unit in
 * the column name in ASCII ({@code magnet-1.standoff_m}, {@code board-coil.load_Ohm}, {@code peak_emf:pickup_V}),
 * then {@code error};
 * numbers in their shortest exact decimal form, empty where there is none. A run that stopped
 * early ends with the line {@code # incomplete: R of N points}.
 */
public final class StudyCsv {

    private StudyCsv() {
    }

    public static String write(StudyTable table) {
        Header h = table.header();
        List<String> columns = new ArrayList<>(List.of("point"));
        h.varied().forEach(v -> columns.add(named(v.path(), v.unit())));
        h.metrics().forEach(m -> columns.add(named(m.metric(), m.unit())));
        columns.add("error");
        StringBuilder out = new StringBuilder();
        line(out, columns);
        for (Row r : table.rows()) {
            List<String> cells = new ArrayList<>(List.of(Integer.toString(r.point())));
            for (double v : r.values()) {
                cells.add(number(v));
            }
            for (double m : r.metrics()) {
                cells.add(number(m));
            }
            cells.add(r.error() == null ? "" : r.error());
            line(out, cells);
        }
        if (!table.complete()) {
            out.append("# incomplete: ").append(table.rows().size()).append(" of ").append(table.expectedRows())
                    .append(" points\n");
        }
        return out.toString();
    }

    private static String named(String name, String unit) {
        return unit.isEmpty() ? name : name + "_" + ascii(unit);
    }

    /** Unit symbols in column names in ASCII, as the scene format also accepts them: Ohm, degC, m/s^2. */
    private static String ascii(String unit) {
        return unit.replace("Ω", "Ohm").replace("°C", "degC").replace("²", "^2").replace("·", "*");
    }

    private static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    /** RFC 4180: a cell with a comma, quote or line break is quoted, its quotes doubled. */
    private static void line(StringBuilder out, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            String c = cells.get(i);
            if (i > 0) {
                out.append(',');
            }
            if (c.contains(",") || c.contains("\"") || c.contains("\n") || c.contains("\r")) {
                out.append('"').append(c.replace("\"", "\"\"")).append('"');
            } else {
                out.append(c);
            }
        }
        out.append('\n');
    }
}
