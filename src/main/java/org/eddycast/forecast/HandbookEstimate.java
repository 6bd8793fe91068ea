package org.eddycast.forecast;

import java.util.List;

/**
 * One handbook estimate, shown beside the simulation's result: what it is, its value, the formula, the
 * source, how sure we are of the source, where it holds, its stated uncertainty and any warnings raised for
 * the case at hand (for example a design outside the formula's validity range).
 *
 * @param name        what is estimated, for example "transverse mixing coefficient (straight channel)"
 * @param process     which mixing process the estimate describes
 * @param value       the value in SI units
 * @param unit        its SI unit
 * @param formula     the formula in words, for example "eps_t = 0.15 h u*"
 * @param source      the published source
 * @param confidence  how sure we are of the formula's constants
 * @param validity    where the formula holds, in words
 * @param uncertainty the stated uncertainty
 * @param warnings    case-specific warnings (empty when none)
 */
public record HandbookEstimate(String name, MixingProcess process, double value, String unit, String formula,
                               Reference source, Confidence confidence, String validity, Uncertainty uncertainty,
                               List<String> warnings) {

    public HandbookEstimate {
        if (name == null || process == null || unit == null || formula == null || source == null
                || confidence == null || validity == null || uncertainty == null) {
            throw new IllegalArgumentException("a handbook estimate needs every field but warnings");
        }
        warnings = warnings == null ? List.of() : List.copyOf(warnings);
    }

    /** Low end of the stated uncertainty band. */
    public double low() {
        return uncertainty.low(value);
    }

    /** High end of the stated uncertainty band. */
    public double high() {
        return uncertainty.high(value);
    }

    /** True when the case lies inside the formula's validity range (no warnings). */
    public boolean withinValidity() {
        return warnings.isEmpty();
    }

    /** "source (confidence)", for outputs. */
    public String sourceText() {
        return source.cite() + " (" + confidence.label() + ")";
    }
}
