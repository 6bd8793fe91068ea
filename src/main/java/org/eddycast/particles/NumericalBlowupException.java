package org.eddycast.particles;

/** Thrown when particle positions stop being finite numbers: the time step is far too large for the flow. */
public final class NumericalBlowupException extends RuntimeException {

    public NumericalBlowupException(String message) {
        super(message);
    }
}
