package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * Everything cleaning changed in a record, per component: replaced spikes (with their lines) and removed
 * trends. A step that was switched off is listed as such, so nothing changes silently.
 *
 * @param components one entry per velocity component, in record order
 */
public record CleaningReport(List<ComponentCleaning> components) {

    public CleaningReport {
        components = List.copyOf(components);
    }

    /** The report in words, one line per step and component. */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        for (ComponentCleaning c : components) {
            out.addAll(List.of(c.describe().split("\n")));
        }
        return out;
    }

    /** Total number of samples replaced as spikes, all components together. */
    public int totalSpikes() {
        int total = 0;
        for (ComponentCleaning c : components) {
            total += c.spikeSamples().length;
        }
        return total;
    }
}
