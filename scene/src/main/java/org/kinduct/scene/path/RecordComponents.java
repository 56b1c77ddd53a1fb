package org.kinduct.scene.path;

import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;

/**
 * Reads one component of a record by name, or makes a copy with it replaced through the
 * record's canonical constructor, so the copy is validated exactly as a new record would be.
 * One generic copy instead of a hand-written "with" for every field of every record.
 */
final class RecordComponents {

    private RecordComponents() {
    }

    static Object get(Object record, String component) {
        try {
            return find(record, component).getAccessor().invoke(record);
        } catch (IllegalAccessException | InvocationTargetException e) {
            throw new IllegalStateException("cannot read " + component + " of " + record.getClass().getSimpleName(), e);
        }
    }

    /**
     * A copy of {@code record} with {@code component} set to {@code value}.
     *
     * @throws IllegalArgumentException with the record's own message when the copy breaks one of its rules
     */
    static Object with(Object record, String component, Object value) {
        RecordComponent[] parts = record.getClass().getRecordComponents();
        Object[] args = new Object[parts.length];
        Class<?>[] types = new Class<?>[parts.length];
        boolean found = false;
        try {
            for (int i = 0; i < parts.length; i++) {
                types[i] = parts[i].getType();
                boolean target = parts[i].getName().equals(component);
                found |= target;
                args[i] = target ? value : parts[i].getAccessor().invoke(record);
            }
            if (!found) {
                throw new IllegalArgumentException(record.getClass().getSimpleName() + " has no " + component);
            }
            Constructor<?> canonical = record.getClass().getDeclaredConstructor(types);
            return canonical.newInstance(args);
        } catch (InvocationTargetException e) {
            if (e.getCause() instanceof IllegalArgumentException rule) {
                throw rule;
            }
            throw new IllegalStateException("cannot copy " + record.getClass().getSimpleName(), e.getCause());
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot copy " + record.getClass().getSimpleName(), e);
        }
    }

    private static RecordComponent find(Object record, String component) {
        RecordComponent[] parts = record.getClass().getRecordComponents();
        if (parts != null) {
            for (RecordComponent c : parts) {
                if (c.getName().equals(component)) {
                    return c;
                }
            }
        }
        throw new IllegalArgumentException(record.getClass().getSimpleName() + " has no " + component);
    }
}
