/**
 * Renderers of a recheck after a buffer change ({@link org.mobident.recheck.RecheckResult}): the
 * per-analyte terminal summary and the per-peak CSV. Apart from {@code report} because
 * {@code recheck} reads and writes peak tables through {@code report}.
 */
package org.mobident.report.recheck;
