/**
 * Input uncertainty: distributions of uncertain inputs, Saltelli's sampling design, Sobol sensitivity indices and
 * the summary of a propagated sample. Pure mathematics: nothing here knows the physics that is being sampled.
 */
package org.eddycast.uncertainty;
