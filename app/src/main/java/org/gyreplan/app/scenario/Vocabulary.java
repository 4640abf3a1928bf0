package org.gyreplan.app.scenario;

import java.util.List;

/** Names a scenario may use that are defined by the solver (drag laws). */
public final class Vocabulary {
    private Vocabulary() {}

    /** Drag-law names known to the solver; empty while no drag law is available (the check is then skipped). */
    public static List<String> dragLawNames() {
        return List.of();
    }
}
