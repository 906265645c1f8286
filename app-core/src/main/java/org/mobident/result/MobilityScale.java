package org.mobident.result;

/**
 * Converts migration times of one run into effective mobilities (1e-9 m²/(V·s), signed), once
 * the run's markers are known. Every supported marker scheme gives a mobility of the form
 * μ = a / t' + b with t' = t − τ/2 the ramp-corrected time; implementations differ in how a and
 * b follow from markers and geometry, and in how the marker uncertainties propagate.
 */
public interface MobilityScale {

    /** Effective mobility of a zone whose apex passes the detector at {@code timeS}. */
    double mobility(double timeS);

    /**
     * Standard uncertainty of {@link #mobility} for an apex time with standard uncertainty
     * {@code timeSdS}, including the uncertainty of the marker times.
     */
    double mobilitySd(double timeS, double timeSdS);

    /** The time at which a zone of this effective mobility would pass the detector, or NaN if never. */
    double timeS(double mobility);

    /** Mobility of the electro-osmotic flow, or NaN when the scheme does not determine it. */
    double eofMobility();

    /** One line saying how the scale was set, for reports (e.g. "neutral marker at 212.4 s"). */
    String describe();
}
