package org.eddycast.forecast;

import java.util.List;

/** The cautions every forecast carries, in the order outputs show them. */
public final class Cautions {

    /** The cautions, one sentence or two each. */
    public static final List<String> ALL = List.of(
            "This is a screening estimate for planning and comparison. It is not a design, permit or compliance"
                    + " calculation.",
            "It rests on the assumptions stated with it (homogeneous turbulence, a passive tracer that does not"
                    + " settle and decays only as stated, and the rules listed for every value); real flows can mix faster or"
                    + " slower.",
            "Decisions that affect people or the environment belong with licensed professionals, following local"
                    + " codes and the conditions of any permit.",
            "Before releasing dye or any other tracer, tell the authority responsible for the water and obtain"
                    + " the permits it requires. Limits on concentrations (a detection limit, a cap at an intake)"
                    + " come from the local authority: the tool carries none of its own.",
            "Whether a tracer is harmful at the planned dose, and the protection of drinking-water intakes and"
                    + " other users downstream, are outside this tool: check them separately.");

    /**
     * The cautions in one line, for a place with room for no more (a results tab's footer); it always sits beside
     * a way to the full list.
     */
    public static final String IN_ONE_LINE = "Screening estimate only, resting on stated assumptions: decisions"
            + " belong with licensed professionals under local codes and permits.";

    /** The heading a full list of the cautions carries. */
    public static final String HEADING = "Cautions";

    /** The full list as plain lines, each behind a prefix (say "# " in a CSV file): the heading, then one a line. */
    public static List<String> lines(String prefix) {
        java.util.ArrayList<String> out = new java.util.ArrayList<>();
        out.add(prefix + HEADING + ":");
        for (String c : ALL) {
            out.add(prefix + "- " + c);
        }
        return List.copyOf(out);
    }

    private Cautions() {
    }
}
