/**
 * How identification is tuned, as immutable values with documented defaults: peak finding
 * ({@link org.mobident.settings.PeakSettings}), matching against the library
 * ({@link org.mobident.settings.MatchSettings}, with the prior on a run's scale correction,
 * {@link org.mobident.settings.ScalePrior}) and both together with the reading of traces
 * ({@link org.mobident.settings.IdentifySettings}).
 *
 * <p>Part of the engine's interface (the module exports this package).
 */
package org.mobident.settings;
