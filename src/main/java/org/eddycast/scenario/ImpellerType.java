package org.eddycast.scenario;

/**
 * Common impeller families, used to look up a typical turbulent power number when none is given. The values
 * and their sources live with the tank rules in the forecast package.
 */
public enum ImpellerType {

    /** Six flat blades on a disc (the Rushton turbine): radial flow. */
    DISC_TURBINE("disc-turbine", "six-blade disc turbine (Rushton turbine)"),

    /** Four flat blades pitched at 45 degrees: mixed flow. */
    PITCHED_BLADE_TURBINE("pitched-blade", "four-blade 45-degree pitched-blade turbine"),

    /** Three-blade marine propeller: axial flow. */
    MARINE_PROPELLER("propeller", "three-blade marine propeller"),

    /** Three narrow cambered blades: axial flow, low power. */
    HYDROFOIL("hydrofoil", "three-blade narrow hydrofoil");

    private final String key;
    private final String description;

    ImpellerType(String key, String description) {
        this.key = key;
        this.description = description;
    }

    /** The name used in scenario files. */
    public String key() {
        return key;
    }

    /** Words for outputs. */
    public String description() {
        return description;
    }

    /** The type for a scenario-file name, or null if there is none. */
    public static ImpellerType fromKey(String key) {
        for (ImpellerType t : values()) {
            if (t.key.equals(key)) {
                return t;
            }
        }
        return null;
    }
}
