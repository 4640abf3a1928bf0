package org.gyreplan.app.scenario;

import java.util.List;
import java.util.stream.Collectors;

/** A scenario that cannot be used: every problem found, each with file, line and key. */
public final class ScenarioException extends Exception {
    private final List<ScenarioProblem> problems;

    public ScenarioException(List<ScenarioProblem> problems) {
        super(problems.stream().map(ScenarioProblem::toString).collect(Collectors.joining("\n")));
        if (problems.isEmpty()) throw new IllegalArgumentException("no problems given");
        this.problems = List.copyOf(problems);
    }

    public ScenarioException(ScenarioProblem problem) { this(List.of(problem)); }

    /** All problems, in file order where known. */
    public List<ScenarioProblem> problems() { return problems; }
}
