/**
 * Scoring an identification against what is known to be in the runs: spiked samples and standards
 * of a lab, or the runs of a synthetic bench.
 *
 * <p>A known-identities table ({@link org.mobident.assess.KnownIdentitiesReader}) lists, per run,
 * the library analytes present, foreign zones, the neutral marker and electrical spikes, with their
 * true times, mobilities and heights. {@link org.mobident.assess.ZoneMatching} ties the reported
 * peaks to those rows (nearest time within a tolerance, one-to-one; by name where no time is given),
 * and {@link org.mobident.assess.Assessor} turns the verdicts into an
 * {@link org.mobident.assess.Assessment}: precision and recall of the calls, results by zone height,
 * per analyte scores, calibration of the confidences (reliability table, expected calibration error,
 * Brier score), mobility error and detection. The scores are rendered as text, a long CSV table and
 * HTML in {@code report.assess} ({@link org.mobident.report.assess.AssessmentText}, {@link org.mobident.report.assess.AssessmentCsv},
 * {@link org.mobident.report.assess.AssessmentHtml}).
 *
 * <p>Units: times in s, mobilities in 1e-9 m² V⁻¹ s⁻¹ (signed), heights over the noise SD
 * dimensionless, probabilities and scores as fractions. All types are immutable; nothing here prints.
 */
package org.mobident.assess;
