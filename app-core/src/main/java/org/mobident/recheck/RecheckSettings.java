package org.mobident.recheck;

import org.mobident.settings.MatchSettings;

/**
 * Settings of a recheck. Immutable; start from {@link #DEFAULT} and change with the
 * {@code with…} methods, which validate.
 *
 * @param match               how moved peaks are re-matched against library B
 * @param separation          when two analytes count as resolved (pairs)
 * @param lostBelowUnits      an analyte whose new |μ| is below this is {@link Verdict#LOST}: it
 *                            would migrate with the electro-osmotic flow (its charge is gone),
 *                            mobility units, ≥ 0
 * @param observableMinUnits  lower end of the effective-mobility range the runs can observe (NaN: no limit)
 * @param observableMaxUnits  upper end of that range (NaN: no limit); with both ends, min ≤ max
 */
public record RecheckSettings(MatchSettings match, SeparationRule separation, double lostBelowUnits,
                              double observableMinUnits, double observableMaxUnits) {

    /**
     * Default near-zero limit: 2.0 mobility units. A modelling choice: a zone within about 2 units
     * of the EOF arrives within a few per cent of the neutral marker in a typical run, where it is
     * hardly separated from the marker and from system peaks.
     */
    public static final double DEFAULT_LOST_BELOW_UNITS = 2.0;

    /** Default matching, default separation rule, 2.0-unit near-zero limit, no observable range. */
    public static final RecheckSettings DEFAULT = new RecheckSettings(MatchSettings.DEFAULT, SeparationRule.DEFAULT,
            DEFAULT_LOST_BELOW_UNITS, Double.NaN, Double.NaN);

    public RecheckSettings {
        if (match == null || separation == null) {
            throw new IllegalArgumentException("match settings and separation rule must be given");
        }
        if (!(lostBelowUnits >= 0) || Double.isInfinite(lostBelowUnits)) {
            throw new IllegalArgumentException("lostBelowUnits must be finite and ≥ 0, got " + lostBelowUnits);
        }
        if (Double.isInfinite(observableMinUnits) || Double.isInfinite(observableMaxUnits)) {
            throw new IllegalArgumentException("the observable range must be finite (NaN for no limit)");
        }
        if (observableMinUnits > observableMaxUnits) {
            throw new IllegalArgumentException("observable range from " + observableMinUnits + " above its end "
                    + observableMaxUnits);
        }
    }

    public RecheckSettings withMatch(MatchSettings value) {
        return new RecheckSettings(value, separation, lostBelowUnits, observableMinUnits, observableMaxUnits);
    }

    public RecheckSettings withSeparation(SeparationRule value) {
        return new RecheckSettings(match, value, lostBelowUnits, observableMinUnits, observableMaxUnits);
    }

    public RecheckSettings withLostBelow(double units) {
        return new RecheckSettings(match, separation, units, observableMinUnits, observableMaxUnits);
    }

    /** The effective-mobility range the runs can observe (either end NaN for none). */
    public RecheckSettings withObservableRange(double minUnits, double maxUnits) {
        return new RecheckSettings(match, separation, lostBelowUnits, minUnits, maxUnits);
    }

    /** Whether a mobility lies inside the observable range. */
    public boolean observable(double mobility) {
        return !(mobility < observableMinUnits) && !(mobility > observableMaxUnits);
    }
}
