/**
 * Renderers of the scores of {@code mobident assess} ({@link org.mobident.assess.Assessment}): the
 * terminal text, the long CSV table and the HTML page with its reliability diagram. Apart from
 * {@code report} because {@code assess} reads peak tables through {@code recheck}, which writes
 * them through {@code report}.
 */
package org.mobident.report.assess;
