package org.kinduct.study;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;

/**
 * A study's results as JSON (format {@value #FORMAT}, schema in README.md, "Design studies"):
 * the header, the shard (null for a whole study), whether the run finished, and one row per
 * point with the varied values and metrics (null where a metric does not apply) and the error
 * of a point that could not be run. Numbers are written in their shortest exact decimal form,
 * so a file read back gives the same doubles, and a merged study the same bytes as one run whole.
 */
public final class StudyJson {

    public static final String FORMAT = "kinduct-study";
    public static final int VERSION = 1;

    private StudyJson() {
    }

    public static String write(StudyTable table) {
        StringWriter out = new StringWriter();
        try (JsonGenerator g = new JsonFactory().createGenerator(out)) {
            g.useDefaultPrettyPrinter();
            Header h = table.header();
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeNumberField("version", VERSION);
            g.writeStringField("study", h.study());
            g.writeStringField("scene", h.scene());
            g.writeStringField("mode", h.mode());
            number(g, "from_s", h.fromS());
            g.writeStringField("circuit_model", h.circuit());
            g.writeNumberField("points", h.points());
            if (table.shard() == null) {
                g.writeNullField("shard");
            } else {
                g.writeObjectFieldStart("shard");
                g.writeNumberField("index", table.shard().index());
                g.writeNumberField("count", table.shard().count());
                g.writeEndObject();
            }
            g.writeBooleanField("complete", table.complete());
            g.writeArrayFieldStart("vary");
            for (Header.Varied v : h.varied()) {
                g.writeStartObject();
                g.writeStringField("path", v.path());
                g.writeStringField("unit", v.unit());
                g.writeBooleanField("log", v.log());
                g.writeArrayFieldStart("values");
                for (double x : v.values()) {
                    g.writeNumber(x);
                }
                g.writeEndArray();
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeArrayFieldStart("metrics");
            for (Header.Read m : h.metrics()) {
                g.writeStartObject();
                g.writeStringField("metric", m.metric());
                g.writeStringField("unit", m.unit());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeArrayFieldStart("rows");
            for (Row r : table.rows()) {
                g.writeStartObject();
                g.writeNumberField("point", r.point());
                numbers(g, "values", r.values());
                numbers(g, "metrics", r.metrics());
                if (r.error() == null) {
                    g.writeNullField("error");
                } else {
                    g.writeStringField("error", r.error());
                }
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        } catch (IOException e) {
            throw new IllegalStateException("writing JSON to memory failed", e);
        }
        return out.toString() + "\n";
    }

    /**
     * Reads what {@link #write} wrote.
     *
     * @param source the file's name, for messages
     * @throws IllegalArgumentException naming the file and what is wrong with it
     */
    public static StudyTable read(String text, String source) {
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(text);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            int line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
            throw new IllegalArgumentException(source + (line > 0 ? ":" + line : "") + ": not JSON: "
                    + e.getOriginalMessage());
        }
        if (root == null || !root.isObject() || !FORMAT.equals(root.path("format").asText(null))) {
            throw new IllegalArgumentException(source + ": not a Kinduct study result (\"format\": \"" + FORMAT + "\")");
        }
        if (root.path("version").asInt(-1) != VERSION) {
            throw new IllegalArgumentException(source + ": study result version " + root.path("version")
                    + " is not supported (this Kinduct reads version " + VERSION + ")");
        }
        try {
            List<Header.Varied> varied = new ArrayList<>();
            for (JsonNode v : array(root, "vary")) {
                varied.add(new Header.Varied(text(v, "path"), text(v, "unit"), v.path("log").asBoolean(),
                        doubles(v.path("values"))));
            }
            List<Header.Read> metrics = new ArrayList<>();
            for (JsonNode m : array(root, "metrics")) {
                metrics.add(new Header.Read(text(m, "metric"), text(m, "unit")));
            }
            Header header = new Header(text(root, "study"), text(root, "scene"), text(root, "mode"),
                    root.path("from_s").isNumber() ? root.path("from_s").asDouble() : Double.NEGATIVE_INFINITY,
                    text(root, "circuit_model"), root.path("points").asInt(), varied, metrics);
            if (header.points() < 1 || header.points() > Design.MAX_POINTS) {
                throw new IllegalArgumentException("\"points\" must be 1 to " + Design.MAX_POINTS + ", got "
                        + root.path("points"));
            }
            JsonNode s = root.path("shard");
            Shard shard = s.isObject() ? new Shard(s.path("index").asInt(), s.path("count").asInt()) : null;
            List<Row> rows = new ArrayList<>();
            for (JsonNode r : array(root, "rows")) {
                double[] values = toArray(doubles(r.path("values")));
                double[] read = toArray(doubles(r.path("metrics")));
                if (values.length != varied.size() || read.length != metrics.size()) {
                    throw new IllegalArgumentException("row of point " + r.path("point") + " has "
                            + values.length + " values and " + read.length + " metrics, the header "
                            + varied.size() + " and " + metrics.size());
                }
                rows.add(new Row(r.path("point").asInt(), values, read,
                        r.path("error").isTextual() ? r.path("error").asText() : null));
            }
            return new StudyTable(header, shard, root.path("complete").asBoolean(), rows);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(source + ": " + e.getMessage(), e);
        }
    }

    private static Iterable<JsonNode> array(JsonNode node, String field) {
        JsonNode a = node.path(field);
        if (!a.isArray()) {
            throw new IllegalArgumentException("\"" + field + "\" must be a list");
        }
        return a;
    }

    private static String text(JsonNode node, String field) {
        JsonNode t = node.path(field);
        if (!t.isTextual()) {
            throw new IllegalArgumentException("\"" + field + "\" must be text");
        }
        return t.asText();
    }

    private static List<Double> doubles(JsonNode array) {
        List<Double> out = new ArrayList<>();
        for (JsonNode x : array) {
            out.add(x.isNumber() ? x.asDouble() : Double.NaN);
        }
        return out;
    }

    private static double[] toArray(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static void numbers(JsonGenerator g, String name, double[] values) throws IOException {
        g.writeArrayFieldStart(name);
        for (double v : values) {
            if (Double.isFinite(v)) {
                g.writeNumber(v);
            } else {
                g.writeNull();
            }
        }
        g.writeEndArray();
    }

    private static void number(JsonGenerator g, String name, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumberField(name, v);
        } else {
            g.writeNullField(name);
        }
    }
}
