package org.eddycast.forecast;

/** What a handbook estimate describes, so that comparisons can say what a disagreement likely means. */
public enum MixingProcess {

    /** Mixing over the depth of a channel (a diffusivity). */
    VERTICAL_MIXING("vertical mixing", true),

    /** Mixing across the width of a channel (a diffusivity). */
    TRANSVERSE_MIXING("transverse mixing", true),

    /** Spreading along a channel, including shear dispersion (a diffusivity). */
    LONGITUDINAL_DISPERSION("longitudinal dispersion", true),

    /** Time for a stirred tank to blend (a time: longer means slower mixing). */
    TANK_BLEND_TIME("blend time", false),

    /** Spread of particles by homogeneous turbulence (a variance or diffusivity). */
    TURBULENT_DISPERSION("turbulent dispersion", true);

    private final String label;
    private final boolean largerIsFaster;

    MixingProcess(String label, boolean largerIsFaster) {
        this.label = label;
        this.largerIsFaster = largerIsFaster;
    }

    /** Words for outputs. */
    public String label() {
        return label;
    }

    /** True when a larger value means faster mixing (a diffusivity), false for a time. */
    public boolean largerIsFaster() {
        return largerIsFaster;
    }
}
