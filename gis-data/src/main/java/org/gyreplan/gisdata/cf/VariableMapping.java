package org.gyreplan.gisdata.cf;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/**
 * An explicit, user-given choice of file variable for some roles (e.g. eastward wind → "U_GRD_10"). An explicit
 * choice always wins over automatic detection; a mapped name that the file lacks is an error.
 */
public final class VariableMapping {
    private final Map<VariableRole, String> names;

    private VariableMapping(Map<VariableRole, String> names) {
        this.names = Collections.unmodifiableMap(names);
    }

    /** No explicit choice: detect every role automatically. */
    public static VariableMapping automatic() { return new VariableMapping(new EnumMap<>(VariableRole.class)); }

    /** A mapping from a map (null values ignored). */
    public static VariableMapping of(Map<VariableRole, String> map) {
        Map<VariableRole, String> m = new EnumMap<>(VariableRole.class);
        map.forEach((k, v) -> { if (v != null && !v.isBlank()) m.put(k, v); });
        return new VariableMapping(m);
    }

    /** A copy with one more explicit choice. */
    public VariableMapping with(VariableRole role, String variableName) {
        Map<VariableRole, String> m = new EnumMap<>(VariableRole.class);
        m.putAll(names);
        m.put(role, variableName);
        return new VariableMapping(m);
    }

    /** The explicit variable name for a role, or {@code null}. */
    public String get(VariableRole role) { return names.get(role); }

    public Map<VariableRole, String> asMap() { return names; }

    @Override
    public String toString() { return names.isEmpty() ? "automatic" : names.toString(); }
}
