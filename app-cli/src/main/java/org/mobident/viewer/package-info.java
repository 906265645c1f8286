/**
 * The minimal desktop viewer: electropherograms on the time or the effective-mobility axis,
 * detected peaks with their assignments, library windows, and the candidates of a selected peak.
 *
 * <p>Model and view are apart. {@link org.mobident.viewer.ViewState} (what is shown: axis, x range,
 * ticked runs, selected peak, bands) and {@link org.mobident.viewer.ViewerData} (the loaded runs)
 * are immutable values; {@link org.mobident.viewer.PlotScene} turns them into a plot model and
 * answers "which peak is under this pixel" through the plot layout. The Swing classes only hold
 * the current values, redraw them and turn gestures into new values. Identification runs on
 * background threads ({@link org.mobident.viewer.RunLoader}); the window shows at once and fills
 * in as runs finish.
 *
 * <p>Units: time in s; mobility in 1e-9 m² V⁻¹ s⁻¹, signed; x ranges are in the units of the
 * current axis; pixels with the origin at the top left of the plot component.
 */
package org.mobident.viewer;
