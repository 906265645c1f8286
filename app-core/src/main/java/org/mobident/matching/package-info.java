/**
 * Matching peaks to library analytes by effective mobility.
 *
 * <p>Units: mobilities, residuals, spreads and windows in 1e-9 m²/(V s), signed (cations +,
 * anions −). Probabilities in [0, 1].
 *
 * <p>Invariants of every result of {@link org.mobident.matching.LibraryMatcher#matchRun}: one
 * {@link org.mobident.result.PeakMatch} per input peak, in input order; no analyte is assigned to
 * two peaks; the candidate probabilities of a peak and its probability of being none of them sum
 * to 1; candidates are listed most probable first.
 */
package org.mobident.matching;
