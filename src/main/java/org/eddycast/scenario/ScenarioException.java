package org.eddycast.scenario;

import java.util.List;

/**
 * A scenario that cannot be used, with every problem found: each names the field (as a path such as
 * {@code flow.rmsVelocity}) or the line, and says what would be valid.
 */
public final class ScenarioException extends IllegalArgumentException {

    private final List<String> problems;

    public ScenarioException(List<String> problems) {
        super(capped(problems));
        this.problems = List.copyOf(problems);
    }

    public ScenarioException(String problem) {
        this(List.of(problem));
    }

    /** The most problems a message lists; the rest are counted. */
    public static final int MAX_LISTED = 20;

    /** The first {@link #MAX_LISTED} problems, one a line, then "and N more problems". */
    static String capped(List<String> problems) {
        if (problems.size() <= MAX_LISTED) {
            return String.join("\n", problems);
        }
        return String.join("\n", problems.subList(0, MAX_LISTED)) + "\nand " + (problems.size() - MAX_LISTED)
                + " more problems";
    }

    public List<String> problems() {
        return problems;
    }
}
