package org.kinduct.study;

import java.util.List;

/**
 * The rows of a study or of one part of it, with what the file says about the study.
 *
 * @param shard the part these rows are, null for the whole study
 * @param complete false when the run stopped before every point of its part had a row
 */
public record StudyTable(Header header, Shard shard, boolean complete, List<Row> rows) {

    public StudyTable {
        rows = List.copyOf(rows);
    }

    /** How many points this table's part has: the study's, or those of its shard. */
    public int expectedRows() {
        if (shard == null) {
            return header.points();
        }
        int n = 0;
        for (int k = 0; k < header.points(); k++) {
            if (shard.contains(k)) {
                n++;
            }
        }
        return n;
    }
}
