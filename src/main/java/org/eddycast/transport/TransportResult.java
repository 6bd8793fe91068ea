package org.eddycast.transport;

/** What the transport stage found: in a channel or in a tank. */
public sealed interface TransportResult permits ChannelStageResult, TankStageResult {

    /** Particles followed. */
    long particles();

    /** Wall time of the stage (s). */
    double elapsedSeconds();
}
