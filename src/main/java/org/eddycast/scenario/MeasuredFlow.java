package org.eddycast.scenario;

import java.nio.file.Path;

/**
 * A measured velocity record, analysed at run time into turbulence statistics.
 *
 * @param record             the record's path as written in the scenario (relative to the scenario's folder)
 * @param resolved           the record's path resolved against the scenario's folder
 * @param modelSpectrum      true to use the model spectrum with the measured Kolmogorov length, false for the
 *                           fitted power law
 * @param samplingRate       stated sampling rate (Hz) for a record without a time column, NaN otherwise
 * @param despike            replace spikes (Goring and Nikora 2002)
 * @param detrend            remove a linear trend
 * @param kinematicViscosity nu (m^2/s) for the Kolmogorov length
 */
public record MeasuredFlow(String record, Path resolved, boolean modelSpectrum, double samplingRate,
                           boolean despike, boolean detrend, double kinematicViscosity) implements FlowSpec {

    @Override
    public String kind() {
        return "measured";
    }

    @Override
    public int dimensions() {
        return 3;
    }
}
