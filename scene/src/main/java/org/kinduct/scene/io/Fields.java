package org.kinduct.scene.io;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;

/**
 * The members of one JSON object as a reader consumes them. Every name the reader asks for
 * becomes known; {@link #build} then rejects the others as unknown fields and makes the record
 * only if nothing inside this object went wrong.
 */
final class Fields {

    private final ReadContext ctx;
    private final String path;
    private final Json.Obj obj;
    private final Map<String, Json.Member> members = new LinkedHashMap<>();
    private final Set<String> known = new LinkedHashSet<>();
    private final int problemsBefore;

    Fields(ReadContext ctx, String path, Json.Obj obj) {
        this.ctx = ctx;
        this.path = path;
        this.obj = obj;
        this.problemsBefore = ctx.problemCount();
        for (Json.Member m : obj.members()) {
            Json.Member first = members.putIfAbsent(m.name(), m);
            if (first != null) {
                ctx.problem(ReadContext.child(path, m.name()), m.value(), "field '" + m.name()
                        + "' appears twice (first on line " + first.line() + ")");
            }
        }
    }

    /** True when the object has {@code name}; marks it known. */
    boolean has(String name) {
        known.add(name);
        return members.containsKey(name);
    }

    /** The value of member {@code name} as written, or null when the object lacks it. */
    Json node(String name) {
        Json.Member m = members.get(name);
        return m == null ? null : m.value();
    }

    /** The value of a required field, or null after reporting it missing or wrong. */
    <T> T req(String name, ReadContext.Conv<T> conv) {
        if (!has(name)) {
            ctx.problem(path, obj, "missing required field '" + name + "'");
            return null;
        }
        return conv.read(ReadContext.child(path, name), members.get(name).value());
    }

    /** The value of an optional field: {@code absent} when missing, null after reporting it wrong. */
    <T> T opt(String name, ReadContext.Conv<T> conv, T absent) {
        return has(name) ? conv.read(ReadContext.child(path, name), members.get(name).value()) : absent;
    }

    /** Reports a rule that involves several fields, at this object. */
    void problem(String message) {
        ctx.problem(path, obj, message);
    }

    /**
     * Reports unknown fields, then makes the record if this object (and everything read inside it)
     * had no problem; a rule violation thrown by the record's constructor is reported here.
     */
    <T> T build(Supplier<T> make) {
        for (Json.Member m : members.values()) {
            if (!known.contains(m.name())) {
                String closest = Suggestions.closest(m.name(), known).map(k -> " (did you mean '" + k + "'?)")
                        .orElse("; the fields here are " + String.join(", ", known));
                ctx.problem(ReadContext.child(path, m.name()), m.line(), m.column(),
                        "unknown field '" + m.name() + "'" + closest);
            }
        }
        return ctx.problemCount() > problemsBefore ? null : ctx.attempt(path, obj, make);
    }
}
