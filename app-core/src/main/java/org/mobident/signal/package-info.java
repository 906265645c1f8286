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
 * <p>Invariants: every step is linear in the number of points (selection instead of sorting,
 * running sums, monotone queues, a decimated baseline), except the least-squares fit of a
 * sum of Gaussians, which runs only on the few clusters of overlapping zones and grows with
 * their length; nothing is printed; no state is kept between calls. Named constants are in
 * {@code SignalLimits}.
 */
package org.mobident.signal;
