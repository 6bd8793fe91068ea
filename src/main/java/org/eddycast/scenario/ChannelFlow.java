package org.eddycast.scenario;

/** An open channel described by its design data; turned into turbulence statistics at run time. */
public record ChannelFlow(ChannelDesign design) implements FlowSpec {

    @Override
    public String kind() {
        return "channel";
    }

    @Override
    public int dimensions() {
        return 3;
    }
}
