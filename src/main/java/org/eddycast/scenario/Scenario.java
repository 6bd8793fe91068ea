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
 */
public record Scenario(int version, String name, String description, FlowSpec flow, Substance substance,
                       Release release, ForecastSettings forecast, SimulationSettings simulation) {

    /** The format version this build writes and reads. */
    public static final int FORMAT_VERSION = 1;
}
