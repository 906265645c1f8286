/**
 * Signal processing of one electropherogram: smoothing, baseline, noise, peak detection and
 * the measures of each peak. The entry point is
 * {@link org.mobident.signal.PeakDetector#analyse PeakDetector.analyse}; its result is a
 * {@link org.mobident.signal.TraceAnalysis}.
 *
 * <p>Units: times in s (the trace's own time axis, taken as time since injection), signal in
 * the detector's units, areas in signal units × s. Heights and areas are magnitudes: dips of
 * indirect detection are measured on the sign-flipped signal. Every measure uses sample times,
 * never indices, so irregular sampling is allowed (the smoothing alone works on the index).
 *
 * <p>Noise: every SD that decides about peaks is measured on the baseline-corrected signal itself
 * (not on its first differences, which understate correlated noise), where the peak sits
 * ({@code LocalNoise}); S/N = 2H/h with h the pharmacopoeial peak-to-peak noise over 5 widths at
 * half height, reported from the lower end of the ICH Q2 detection limit (2) up and marked at the
 * detection limit (below 3) and below the quantitation limit (10)
 * ({@link org.mobident.result.SignalToNoiseClass}). Spikes are removed before anything is measured. Each peak carries two migration times: the apex (pharmacopoeial) and the zone centre
 * (first moment), which stays put when electromigration dispersion skews a zone.
 *
 * <p>Invariants: every step is linear in the number of points (selection instead of sorting,
 * running sums, monotone queues, a decimated baseline, strided subsets for robust scales), except
 * the least-squares fits of a sum of Gaussians or of one skewed zone, which run only on the few
 * clusters of overlapping zones and grow with their length; nothing is printed; no state is kept
 * between calls. Named constants are in {@code SignalLimits}.
 */
package org.mobident.signal;
