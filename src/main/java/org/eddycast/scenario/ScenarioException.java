package org.eddycast.scenario;

import java.util.List;

/**
 * A scenario that cannot be used, with every problem found: each names the field (as a path such as
 * {@code flow.rmsVelocity}) or the line, and says what would be valid.
 */
public final class ScenarioException extends IllegalArgumentException {

    private final List<String> problems;

    public ScenarioException(List<String> problems) {
        super(String.join("\n", problems));
        this.problems = List.copyOf(problems);
    }

    public ScenarioException(String problem) {
        this(List.of(problem));
    }

    public List<String> problems() {
        return problems;
    }
}
