/**
 * What identification hands back, as immutable values: each run's {@link org.mobident.result.RunResult}
 * with its peaks ({@link org.mobident.result.Peak}, their role and their
 * {@link org.mobident.result.PeakMatch} against the library), the run's mobility scale and the
 * correction of that scale; and the two callbacks through which a batch reports as it goes
 * ({@link org.mobident.result.RunListener}, {@link org.mobident.result.BatchProgress}).
 *
 * <p>These types are part of the engine's interface (the module exports this package); the
 * classes that compute them live in packages it does not export. Units are in the names:
 * times in s, mobilities in 1e-9 m²/(V s).
 */
package org.mobident.result;
