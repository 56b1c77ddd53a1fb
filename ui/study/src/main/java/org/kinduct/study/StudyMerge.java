package org.kinduct.study;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Joins the parts of a sharded study into the whole, checking that they belong together (one
 * study hash and header), that every part is there once and finished, and that every point has
 * exactly one row. The whole is the same table, to the byte once written, as the study run in
 * one piece.
 */
public final class StudyMerge {

    private StudyMerge() {
    }

    /**
     * Joins the parts of a study run in shards into one table.
     *
     * @param parts each part's table by its file name (for messages)
     * @throws IllegalArgumentException naming the file and what does not fit
     */
    public static StudyTable merge(Map<String, StudyTable> parts) {
        if (parts.isEmpty()) {
            throw new IllegalArgumentException("nothing to merge: give the parts' JSON files");
        }
        String firstName = parts.keySet().iterator().next();
        StudyTable first = parts.get(firstName);
        Map<Integer, String> byIndex = new TreeMap<>();
        for (Map.Entry<String, StudyTable> e : parts.entrySet()) {
            String name = e.getKey();
            StudyTable t = e.getValue();
            if (!t.header().study().equals(first.header().study())) {
                throw new IllegalArgumentException(name + " belongs to study " + t.header().study().substring(0, 12)
                        + "…, " + firstName + " to study " + first.header().study().substring(0, 12) + "…");
            }
            if (!t.header().equals(first.header())) {
                throw new IllegalArgumentException(name + " and " + firstName
                        + " carry one study hash but describe the study differently: a file was edited");
            }
            if (t.shard() == null) {
                throw new IllegalArgumentException(name + " holds a whole study, not a part of one");
            }
            if (t.shard().count() != first.shard().count()) {
                throw new IllegalArgumentException(name + " is part " + t.shard() + ", " + firstName + " part "
                        + first.shard() + ": the parts of one merge come from one split");
            }
            String twice = byIndex.put(t.shard().index(), name);
            if (twice != null) {
                throw new IllegalArgumentException("part " + t.shard() + " is given twice: " + twice + " and " + name);
            }
            if (!t.complete() || t.rows().size() != t.expectedRows()) {
                throw new IllegalArgumentException(name + " (part " + t.shard() + ") is incomplete: " + t.rows().size()
                        + " of " + t.expectedRows() + " points; run that part again");
            }
            for (Row r : t.rows()) {
                if (r.point() < 0 || r.point() >= t.header().points() || !t.shard().contains(r.point())) {
                    throw new IllegalArgumentException(name + ": point " + r.point() + " is not in part " + t.shard());
                }
            }
        }
        List<Integer> missing = new ArrayList<>();
        for (int k = 1; k <= first.shard().count(); k++) {
            if (!byIndex.containsKey(k)) {
                missing.add(k);
            }
        }
        if (!missing.isEmpty()) {
            throw new IllegalArgumentException("missing part" + (missing.size() > 1 ? "s " : " ")
                    + String.join(", ", missing.stream().map(k -> k + "/" + first.shard().count()).toList())
                    + " of study " + first.header().study().substring(0, 12) + "…");
        }
        List<Row> rows = new ArrayList<>();
        parts.values().forEach(t -> rows.addAll(t.rows()));
        rows.sort(Comparator.comparingInt(Row::point));
        for (int k = 0; k < rows.size(); k++) {
            if (rows.get(k).point() != k) {
                throw new IllegalArgumentException("point " + k + " has " + (rows.get(k).point() < k ? "two rows" : "no row"));
            }
        }
        return new StudyTable(first.header(), null, true, rows);
    }
}
