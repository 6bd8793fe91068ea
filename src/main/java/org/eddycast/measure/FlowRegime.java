package org.eddycast.measure;

/**
 * How far Taylor's frozen-turbulence hypothesis can be trusted for a record, judged from the turbulence
 * intensity u'/U (the limits are in {@link AnalysisOptions}).
 */
public enum FlowRegime {
    /** u'/U at or below the warning limit (0.2 by default, common practice): frozen turbulence applies. */
    FROZEN_TURBULENCE,
    /** u'/U between the warning and small-speed limits: frozen turbulence used, with a warning. */
    FROZEN_TURBULENCE_QUESTIONABLE,
    /** u'/U above the small-speed limit (0.5 by default, our own choice): the fallback rules apply. */
    SMALL_MEAN_SPEED;

    /** True when the scales rest on Taylor's hypothesis with the mean speed as convection speed. */
    public boolean frozen() {
        return this != SMALL_MEAN_SPEED;
    }
}
