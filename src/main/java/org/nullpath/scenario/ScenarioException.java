package org.nullpath.scenario;

import java.util.List;
import java.util.stream.Collectors;

/** A scenario that cannot be used, with every problem found. */
public final class ScenarioException extends Exception {
    private final List<Problem> problems;

    public ScenarioException(List<Problem> problems) {
        super(problems.stream().map(Problem::render).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }
}
