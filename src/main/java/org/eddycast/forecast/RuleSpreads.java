package org.eddycast.forecast;

import java.util.Map;

/**
 * The spread a design rule's source states for a value it gives, so that a range can say "the rule's own
 * spread" instead of a number the user must find. Only values whose source states one are here.
 */
public final class RuleSpreads {

    /**
     * A rule's stated spread.
     *
     * @param fraction the plus-or-minus fraction of the rule's value
     * @param basis    where it comes from, marked sourced, from memory or common practice
     */
    public record Spread(double fraction, String basis) {
    }

    private static final Map<String, Spread> TANK = Map.of(
            "flow.powerNumber", new Spread(0.15, "the impeller type's typical power number; published values vary "
                    + "with blade thickness, clearance and D/T by 10 to 20% (Hemrajani & Tatterson 2004, Handbook of "
                    + "Industrial Mixing, ch. 6, from memory)"),
            "flow.pumpingNumber", new Spread(0.15, "the impeller type's typical pumping number; published values "
                    + "vary with D/T and clearance by 10 to 20% (Hemrajani & Tatterson 2004, Handbook of Industrial "
                    + "Mixing, ch. 6, from memory)"));

    private RuleSpreads() {
    }

    /** The stated spread of a tank's rule value, or null when its source states none. */
    public static Spread tank(String input) {
        return TANK.get(input);
    }

    /** The inputs whose rule states a spread. */
    public static java.util.Set<String> tankInputs() {
        return TANK.keySet();
    }
}
