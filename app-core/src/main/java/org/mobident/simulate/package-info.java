/**
 * Synthetic CZE traces from known mobilities ({@link org.mobident.simulate.TraceSimulator}), for
 * end-to-end tests and the demo data. Units as everywhere in Mobident: mobilities in
 * 1e-9 m²/(V s) (signed), lengths in cm, signed voltage in kV, times in s.
 */
package org.mobident.simulate;
