package org.mobident.chem;

import org.mobident.buffer.SpeciesModel;

/**
 * The pH of a buffer of fixed composition at another temperature.
 *
 * <p>A buffer made up (and its pH measured) at one temperature keeps its composition when the
 * capillary is held at another, so the ratio of its conjugate forms stays put and, by the
 * Henderson–Hasselbalch relation, its pH moves with the pKa of the buffering step:
 * pH(T₂) = pH(T₁) + pKa(T₂) − pKa(T₁) (Bates, Determination of pH, 2nd ed., 1973, on the
 * temperature coefficients of buffer solutions, from memory; the small change of the activity
 * coefficients with temperature is ignored). The buffering step is the pKa nearest the stated pH.
 * A Tris buffer adjusted to pH 8.1 at 25 °C is thus about pH 7.8 at 37 °C.
 */
public final class BufferPh {

    private BufferPh() {
    }

    /**
     * The pH at {@code toC} of a buffer whose pH was {@code pH} at {@code fromC}.
     *
     * @param buffer the buffer substance, pKa at 25 °C (a strong ion, without pKa, leaves the pH unchanged)
     * @param table  enthalpies of ionisation
     * @param pH     pH at {@code fromC}
     * @param fromC  temperature the pH was measured at, °C
     * @param toC    temperature wanted, °C
     */
    public static double pHAt(SpeciesModel buffer, IonisationEnthalpies table, double pH, double fromC, double toC) {
        if (buffer.pKa().isEmpty() || fromC == toC) {
            return pH;
        }
        double[] from = table.atTemperature(buffer, fromC).pKaArray();
        double[] to = table.atTemperature(buffer, toC).pKaArray();
        int nearest = nearestStep(from, pH);
        return pH + to[nearest] - from[nearest];
    }

    /** Standard uncertainty of {@link #pHAt}'s shift from the enthalpy of the buffering step. */
    public static double shiftSd(SpeciesModel buffer, IonisationEnthalpies table, double pH, double fromC,
                                 double toC) {
        if (buffer.pKa().isEmpty()) {
            return 0.0;
        }
        int nearest = nearestStep(table.atTemperature(buffer, fromC).pKaArray(), pH);
        return PkaTemperature.shiftSd(table.steps(buffer).get(nearest).enthalpySdKjPerMol(), fromC, toC);
    }

    /** Whether the buffering step's enthalpy is tabulated (false: the class value stood in). */
    public static boolean tabulated(SpeciesModel buffer, IonisationEnthalpies table, double pH, double fromC) {
        if (buffer.pKa().isEmpty()) {
            return true;
        }
        int nearest = nearestStep(table.atTemperature(buffer, fromC).pKaArray(), pH);
        return table.steps(buffer).get(nearest).tabulated();
    }

    private static int nearestStep(double[] pKa, double pH) {
        int best = 0;
        for (int i = 1; i < pKa.length; i++) {
            if (Math.abs(pKa[i] - pH) < Math.abs(pKa[best] - pH)) {
                best = i;
            }
        }
        return best;
    }
}
