package org.eddycast.forecast;

/** How sure this project is of a value or rule taken from outside. */
public enum Confidence {

    /** The source was seen and the value checked against it. */
    CONFIRMED("confirmed"),

    /** Follows from stated assumptions by a short derivation or quadrature. */
    DERIVED("derived"),

    /** Recalled from the cited source but not checked against it. */
    FROM_MEMORY("from memory"),

    /** A fact or habit of the trade with no single source. */
    COMMON_PRACTICE("common practice");

    private final String label;

    Confidence(String label) {
        this.label = label;
    }

    /** The words used in outputs, for example "from memory". */
    public String label() {
        return label;
    }
}
