package org.eddycast.scenario;

/**
 * A complete scenario: a flow, a substance and the simulation settings, in SI units.
 *
 * @param version     the scenario-file format version
 * @param name        a short name
 * @param description what question the scenario answers (may be empty)
 * @param flow        the flow description
 * @param substance   the released substance
 * @param release     what is released and where
 * @param forecast    what the forecast reports
 * @param simulation  the simulation settings
 * @param uncertainty the inputs that carry a range, and the sweep's size (none: the scenario runs once)
 */
public record Scenario(int version, String name, String description, FlowSpec flow, Substance substance,
                       Release release, ForecastSettings forecast, SimulationSettings simulation,
                       UncertaintySettings uncertainty) {

    /** A scenario whose inputs carry no ranges. */
    public Scenario(int version, String name, String description, FlowSpec flow, Substance substance,
                    Release release, ForecastSettings forecast, SimulationSettings simulation) {
        this(version, name, description, flow, substance, release, forecast, simulation,
                UncertaintySettings.none());
    }

    /** The same scenario with other ranges (none to run it once). */
    public Scenario withUncertainty(UncertaintySettings u) {
        return new Scenario(version, name, description, flow, substance, release, forecast, simulation, u);
    }

    /** The format version this build writes and reads. */
    public static final int FORMAT_VERSION = 1;
}
