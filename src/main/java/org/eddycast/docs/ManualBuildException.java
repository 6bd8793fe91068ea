package org.eddycast.docs;

/** The manual cannot be built: a chapter, an image or the validation record is missing or unreadable. */
public final class ManualBuildException extends IllegalStateException {

    private static final long serialVersionUID = 1L;

    public ManualBuildException(String message) {
        super(message);
    }

    public ManualBuildException(String message, Throwable cause) {
        super(message, cause);
    }
}
