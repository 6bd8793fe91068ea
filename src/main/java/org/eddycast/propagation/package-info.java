/**
 * Runs a scenario many times over its inputs' ranges: the sampled scenarios, the headline figures read from each
 * run, the sweep split into shards that merge bit for bit, and the summary the outputs show.
 */
package org.eddycast.propagation;
