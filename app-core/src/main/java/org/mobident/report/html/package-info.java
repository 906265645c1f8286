/**
 * The shareable report: one self-contained HTML5 file (inline CSS and SVG, no scripts, no
 * network) written by {@link org.mobident.report.html.HtmlReport}. Markup is XHTML-compatible
 * (every element closed), and all user-provided text goes through
 * {@link org.mobident.report.plot.Markup#escape}.
 *
 * <p>Units: time in s; mobility in 1e-9 m² V⁻¹ s⁻¹, signed.
 */
package org.mobident.report.html;
