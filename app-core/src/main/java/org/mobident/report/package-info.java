/**
 * Reports of processed runs: the peak table as CSV ({@link org.mobident.report.PeakTableCsv})
 * and JSON ({@link org.mobident.report.PeakTableJson}), a terminal summary
 * ({@link org.mobident.report.RunSummaryText}) and spreadsheet-safe text cells
 * ({@link org.mobident.report.CsvCells}).
 *
 * <p>Units: times in s, mobilities in 1e-9 m²/(V s) (signed), heights in signal units, areas in
 * signal units × s, corrected areas (A/t) in signal units. Numbers are formatted with
 * {@link java.util.Locale#ROOT} so the same results always give the same bytes.
 */
package org.mobident.report;
