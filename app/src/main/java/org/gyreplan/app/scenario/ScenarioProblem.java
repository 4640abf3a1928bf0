package org.gyreplan.app.scenario;

import java.nio.file.Path;

/**
 * One thing wrong with a scenario file.
 *
 * @param file    the scenario file (or null when the scenario was built in memory)
 * @param line    1-based line of the offending key or value, or 0 when unknown
 * @param column  1-based column, or 0 when unknown
 * @param key     dotted key path, e.g. {@code gyre.depth}, or empty for the whole file
 * @param message what is wrong and what is expected (allowed values, range)
 */
public record ScenarioProblem(Path file, int line, int column, String key, String message) {

    /** {@code file:line:column: key: message}, the form editors and terminals link to. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        sb.append(file == null ? "<scenario>" : file.toString());
        if (line > 0) sb.append(':').append(line);
        if (line > 0 && column > 0) sb.append(':').append(column);
        sb.append(": ");
        if (key != null && !key.isEmpty()) sb.append(key).append(": ");
        sb.append(message);
        return sb.toString();
    }
}
