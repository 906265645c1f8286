/**
 * Synthetic CZE traces from known mobilities ({@link org.mobident.simulate.TraceSimulator}), for
 * end-to-end tests and the demo data, the speed archive ({@link org.mobident.simulate.ArchiveGenerator})
 * and the lab-day bench with its truth tables ({@link org.mobident.simulate.LabDayBench}). Units as
 * everywhere in Mobident: mobilities in 1e-9 m²/(V s) (signed), lengths in cm, signed voltage in kV,
 * times in s. Every value produced here is invented.
 */
package org.mobident.simulate;
