/**
 * Renderers of the predictions for a new buffer ({@code mobident predict}): the table of predicted
 * mobilities, and the mobility-against-pH scan as text and as CSV. Apart from {@code report} because
 * they render {@code recheck} values, and {@code recheck} writes its peak tables through {@code report}.
 */
package org.mobident.report.prediction;
