/**
 * The measured-record route: from a probe velocity record (an acoustic Doppler velocimeter in a channel or
 * tank, say) to the turbulence statistics the engine needs, with every rule and its source shown.
 *
 * <p>Entry point: {@link org.eddycast.measure.RecordAnalyzer#analyze(java.nio.file.Path, AnalysisOptions)}
 * (or the {@link java.io.Reader} and {@link VelocityRecord} forms) gives a {@link RecordAnalysis}; its
 * {@link RecordAnalysis#statistics()} is the {@link org.eddycast.scenario.TurbulenceStatistics} for the engine,
 * {@link RecordAnalysis#derivations()} and {@link RecordAnalysis#warnings()} what to show the user, and the
 * spectrum, fit, autocorrelation and cleaning report what to plot. Faults in the record raise a
 * {@link RecordFormatException} with the line and column.
 *
 * <p>Steps and their classes: reading ({@link RecordReader}), cleaning ({@link PhaseSpaceDespiker},
 * {@link LinearDetrender}, {@link RecordCleaner}), statistics ({@link AutocorrelationEstimator},
 * {@link WelchSpectrumEstimator}, {@link InertialRangeFitter}, {@link KolmogorovScales}) and scales. Invented
 * signals for tests and the demo record come from {@link SyntheticRecord}.
 */
package org.eddycast.measure;
