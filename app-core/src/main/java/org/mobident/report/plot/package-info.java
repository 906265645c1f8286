/**
 * Electropherogram plots: a {@link org.mobident.report.plot.PlotModel} (data units) built from
 * traces and run results, one {@link org.mobident.report.plot.PlotLayout} (pixels) and two
 * renderers drawing from it, {@link org.mobident.report.plot.SvgPlot} (text) and
 * {@link org.mobident.report.plot.PngPlot} (Java2D, headless).
 *
 * <p>Units: time in s; mobility in 1e-9 m² V⁻¹ s⁻¹, signed; signal in detector units; layout
 * in pixels with the origin at the top left and y pointing down. All public types are
 * immutable; no renderer keeps state between calls.
 */
package org.mobident.report.plot;
