/**
 * The analytic forecast layer: pure functions from eddy diffusivities (m^2/s) and design data to physical
 * forecasts, with no simulation and no user interface.
 *
 * <ul>
 *   <li>Widths: {@link org.eddycast.forecast.WidthMeasure}.</li>
 *   <li>Instantaneous point release: {@link org.eddycast.forecast.InstantaneousRelease} built from per-axis
 *       densities {@link org.eddycast.forecast.FreeAxis}, {@link org.eddycast.forecast.OneWallAxis},
 *       {@link org.eddycast.forecast.TwoWallImageAxis} and {@link org.eddycast.forecast.TwoWallCosineAxis}.</li>
 *   <li>Time to mixed (blend time): {@link org.eddycast.forecast.WellMixedTime}.</li>
 *   <li>Channels: {@link org.eddycast.forecast.ChannelPlume} and
 *       {@link org.eddycast.forecast.ChannelMixingDistance}.</li>
 *   <li>Handbook estimates: {@link org.eddycast.forecast.ChannelHandbook},
 *       {@link org.eddycast.forecast.TankBlendCorrelation}, {@link org.eddycast.forecast.TaylorDispersion},
 *       each value a {@link org.eddycast.forecast.HandbookEstimate}.</li>
 *   <li>Modeled flows: {@link org.eddycast.forecast.TankRules} and {@link org.eddycast.forecast.ChannelRules}
 *       turn {@link org.eddycast.scenario.TankDesign} and {@link org.eddycast.scenario.ChannelDesign} into
 *       {@link org.eddycast.scenario.TurbulenceStatistics}.</li>
 *   <li>Forecast beside handbook: {@link org.eddycast.forecast.ForecastComparison}; cautions:
 *       {@link org.eddycast.forecast.Cautions}.</li>
 * </ul>
 */
package org.eddycast.forecast;
