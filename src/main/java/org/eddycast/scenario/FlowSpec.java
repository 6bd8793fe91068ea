package org.eddycast.scenario;

/** A flow description as the scenario states it, before it is turned into turbulence statistics. */
public sealed interface FlowSpec permits DirectFlow, TankFlow, ChannelFlow, MeasuredFlow, VerificationFlow {

    /** The scenario-file name of this route, for example "direct". */
    String kind();

    /** 2 or 3. */
    int dimensions();
}
