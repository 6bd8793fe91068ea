package org.eddycast.particles;

/**
 * A flag a caller sets to stop a run. Workers look at it every time step, so a run stops within one step of
 * every worker's current group.
 */
public final class Cancellation {

    private volatile boolean cancelled;

    public void cancel() {
        cancelled = true;
    }

    public boolean isCancelled() {
        return cancelled;
    }
}
