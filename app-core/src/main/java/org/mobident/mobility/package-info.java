/**
 * From migration times to effective electrophoretic mobilities.
 *
 * <p>Units: mobility in 1e-9 m² V⁻¹ s⁻¹, signed (cations positive, anions negative); voltage in
 * kV, signed (positive when the inlet is at the positive potential); lengths in cm; times in s;
 * temperatures in °C; viscosity in mPa·s.
 *
 * <p>Every marker scheme gives μ = a / t' + b with t' the ramp-corrected time
 * ({@link org.mobident.mobility.MobilityMath#rampCorrectedTimeS}). Times passed to a
 * {@link org.mobident.result.MobilityScale} are raw apex times; the ramp correction happens
 * inside. All types are immutable and reject invalid arguments with
 * {@link java.lang.IllegalArgumentException}.
 */
package org.mobident.mobility;
