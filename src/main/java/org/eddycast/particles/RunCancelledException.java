package org.eddycast.particles;

/** Thrown out of a run whose {@link Cancellation} was set. */
public final class RunCancelledException extends RuntimeException {

    public RunCancelledException() {
        super("the run was cancelled");
    }
}
