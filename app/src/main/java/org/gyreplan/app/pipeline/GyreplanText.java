package org.gyreplan.app.pipeline;

/** Small text helpers for messages. */
final class GyreplanText {
    private GyreplanText() {}

    static String oneLine(Throwable t) {
        String m = t.getMessage();
        if (m == null || m.isBlank()) m = t.getClass().getSimpleName();
        return m.replace('\n', ' ');
    }
}
