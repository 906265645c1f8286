package org.mobident.result;

/**
 * A peak with its mobility and its match.
 *
 * @param peak                  the measured peak
 * @param role                  what the peak is: an analyte peak or one of the markers
 * @param mobility              effective mobility at the run temperature, 1e-9 m²/(V s) (NaN if unknown)
 * @param mobilitySd            its standard uncertainty (NaN if unknown)
 * @param mobilityAtLibraryTemp mobility converted to the library temperature (equals mobility
 *                              when the temperatures agree; NaN if unknown)
 * @param match                 the matching outcome ({@link PeakMatch#none()} for markers)
 * @param mobilityCorrected     the mobility compared with the library: at the library temperature and
 *                              corrected for the run's scale ({@link org.mobident.result.RunScale#corrected});
 *                              equals mobilityAtLibraryTemp when the scale was not fitted (NaN if unknown)
 * @param note                  a remark on this peak for the reader (e.g. two candidates that co-migrate
 *                              at this zone's width), or null
 */
public record PeakResult(Peak peak, PeakRole role, double mobility, double mobilitySd,
                         double mobilityAtLibraryTemp, PeakMatch match, double mobilityCorrected, String note) {

    /** A peak without a remark. */
    public PeakResult(Peak peak, PeakRole role, double mobility, double mobilitySd, double mobilityAtLibraryTemp,
                      PeakMatch match, double mobilityCorrected) {
        this(peak, role, mobility, mobilitySd, mobilityAtLibraryTemp, match, mobilityCorrected, null);
    }

    /** A peak whose run's scale was not corrected: the corrected mobility is the one at the library temperature. */
    public PeakResult(Peak peak, PeakRole role, double mobility, double mobilitySd, double mobilityAtLibraryTemp,
                      PeakMatch match) {
        this(peak, role, mobility, mobilitySd, mobilityAtLibraryTemp, match, mobilityAtLibraryTemp);
    }
}
