package org.eddycast.scenario;

/** A stirred tank described by its design data; turned into turbulence statistics at run time. */
public record TankFlow(TankDesign design) implements FlowSpec {

    @Override
    public String kind() {
        return "tank";
    }

    @Override
    public int dimensions() {
        return 3;
    }
}
