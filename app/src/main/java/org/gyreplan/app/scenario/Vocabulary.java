package org.gyreplan.app.scenario;

import org.gyreplan.solver.stress.DragLaw;
import org.gyreplan.solver.stress.DragLaws;

import java.util.ArrayList;
import java.util.List;

/** Names a scenario may use that are defined by the solver (drag laws). */
public final class Vocabulary {
    private Vocabulary() {}

    /** Drag-law names: the solver's speed-dependent laws by id, and {@code constant} (with {@code dragCoefficient}). */
    public static List<String> dragLawNames() {
        List<String> names = new ArrayList<>();
        for (DragLaw law : DragLaws.speedDependent()) names.add(law.id());
        names.add("constant");
        return names;
    }
}
