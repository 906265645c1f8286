package org.mobident.assess;

/**
 * One reported peak with the known row it belongs to and the verdict; or a known row that no peak
 * belongs to ({@code peak} null, verdict {@link Verdict#NOT_FOUND}).
 *
 * @param run     run name
 * @param peak    the reported peak, or null
 * @param known   the row of the known-identities table, or null when the peak belongs to none
 * @param how     how they were tied (null when either is missing)
 * @param verdict the verdict
 */
public record PeakVerdict(String run, ReportedPeak peak, KnownIdentity known, MatchedBy how, Verdict verdict) {
}
