/**
 * What a batch says as a whole, beyond each run's peak table: which library analytes were found
 * in which sample ({@link org.mobident.summary.SampleCalls}), how each analyte behaved over the
 * batch ({@link org.mobident.summary.AnalyteStats}) and which unassigned peaks recur at one mobility
 * ({@link org.mobident.summary.RecurringUnknowns}). Plain functions of the batch's results; the
 * writers in {@code org.mobident.report} turn them into text, CSV and a workbook.
 */
package org.mobident.summary;
