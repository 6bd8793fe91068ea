package org.eddycast.scenario;

/**
 * One step in turning a flow description into turbulence statistics: which quantity, its value, the rule
 * that gave it and where that rule comes from. Shown to the user so every number can be audited.
 *
 * @param quantity what was derived, for example "rms velocity"
 * @param value    its value in SI units
 * @param unit     its SI unit, for example "m/s" (empty for dimensionless values)
 * @param rule     the formula or rule in words, for example "u' = 0.5 N D (common practice)"
 * @param source   where the rule comes from (author, year, title), or "common practice", or "measured"
 */
public record Derivation(String quantity, double value, String unit, String rule, String source) {
}
