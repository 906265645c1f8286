package org.mobident.chem;

import static org.mobident.chem.PhysicalConstants.AVOGADRO_PER_MOL;
import static org.mobident.chem.PhysicalConstants.BOLTZMANN_J_PER_K;
import static org.mobident.chem.PhysicalConstants.ELEMENTARY_CHARGE_C;
import static org.mobident.chem.PhysicalConstants.LITRES_PER_CUBIC_METRE;
import static org.mobident.chem.PhysicalConstants.VACUUM_PERMITTIVITY_F_PER_M;

import org.mobident.Units;

/**
 * Activity coefficients of ions (Davies equation) and the shift of acidity constants with ionic
 * strength.
 *
 * <h2>Debye–Hückel quantities</h2>
 * From Debye &amp; Hückel (Phys. Z. 24 (1923) 185), as set out in Robinson &amp; Stokes,
 * Electrolyte Solutions (2nd ed., 1959), ch. 9, on the molar (mol/L) scale:
 * <ul>
 *   <li>inverse Debye length κ = κ₁·√I with κ₁² = 2·1000·N_A·e² / (ε₀·ε·k·T), in m⁻¹ (mol/L)^−½;</li>
 *   <li>Bjerrum length l_B = e² / (4π·ε₀·ε·k·T), m;</li>
 *   <li>limiting-law constant A = l_B·κ₁ / (2·ln 10), (mol/L)^−½, so that the limiting law reads
 *       log10 γ = −A·z²·√I.</li>
 * </ul>
 * ε is the relative permittivity of water at the temperature ({@link WaterDielectric},
 * Malmberg &amp; Maryott 1956), the other constants are CODATA 2018. At 25 °C this gives
 * A = 0.5116 (mol/L)^−½ (Robinson &amp; Stokes, Appendix 7.1, list 0.5115 on the molar scale;
 * the rounded 0.509 often quoted was computed with the older ε = 78.54; both checked in the
 * tests) and κ₁ = 3.29 nm⁻¹ (mol/L)^−½.
 *
 * <h2>Davies equation</h2>
 * log10 γ = −A·z²·(√I / (1 + √I) − 0.3·I) (Davies, Ion Association, Butterworths, London, 1962,
 * p. 41; the earlier 1938 form had 0.2). It is usable up to I ≈ 0.1–0.2 mol/L; the constant 0.3
 * is kept independent of temperature, only A changes with T.
 *
 * <h2>Mixed acidity constants</h2>
 * pH is measured as an activity, pH = −log10 a(H⁺). For the step HA^z ⇌ H⁺ + A^(z−1) the
 * thermodynamic constant is Ka = a(H⁺)·[A^(z−1)]·γ(z−1) / ([HA^z]·γ(z)). The concentration ratio
 * of the two forms at a measured pH is therefore governed by the mixed ("practical") constant
 * <pre>  pKa' = pKa + log10 γ(base form, charge z−1) − log10 γ(acid form, charge z)</pre>
 * i.e. [A]/[HA] = 10^(pH − pKa'). With the Davies equation
 * pKa' = pKa + A·(2z − 1)·(√I/(1+√I) − 0.3·I): for a neutral acid (z = 0) pKa' falls with ionic
 * strength, for a cationic acid such as NH₄⁺ (z = +1) it rises
 * (the usual result, e.g. Harris, Quantitative Chemical Analysis, ch. on activity).
 */
public final class Activity {

    /** Empirical linear coefficient of the Davies equation (Davies 1962, p. 41). */
    public static final double DAVIES_LINEAR_TERM = 0.3;

    private static final double LN10 = Math.log(10.0);

    private Activity() {
    }

    /** Absolute temperature in K for a temperature in °C. */
    static double kelvin(double temperatureC) {
        return temperatureC + Units.CELSIUS_ZERO_K;
    }

    /**
     * Bjerrum length e²/(4π ε₀ ε k T) in m.
     *
     * @param temperatureC temperature, °C, within [0, 100]
     */
    public static double bjerrumLengthM(double temperatureC) {
        double eps = WaterDielectric.relativePermittivity(temperatureC);
        return ELEMENTARY_CHARGE_C * ELEMENTARY_CHARGE_C
                / (4.0 * Math.PI * VACUUM_PERMITTIVITY_F_PER_M * eps * BOLTZMANN_J_PER_K * kelvin(temperatureC));
    }

    /**
     * κ₁ = κ/√I, the inverse Debye length per square root of ionic strength, in
     * m⁻¹·(mol/L)^−½.
     *
     * @param temperatureC temperature, °C, within [0, 100]
     */
    public static double inverseDebyeLengthPerRootMolar(double temperatureC) {
        double eps = WaterDielectric.relativePermittivity(temperatureC);
        return Math.sqrt(2.0 * LITRES_PER_CUBIC_METRE * AVOGADRO_PER_MOL * ELEMENTARY_CHARGE_C * ELEMENTARY_CHARGE_C
                / (VACUUM_PERMITTIVITY_F_PER_M * eps * BOLTZMANN_J_PER_K * kelvin(temperatureC)));
    }

    /**
     * Debye–Hückel limiting-law constant A on the molar scale, (mol/L)^−½ (0.5116 at 25 °C).
     *
     * @param temperatureC temperature, °C, within [0, 100]
     */
    public static double debyeHuckelA(double temperatureC) {
        return bjerrumLengthM(temperatureC) * inverseDebyeLengthPerRootMolar(temperatureC) / (2.0 * LN10);
    }

    /**
     * Davies activity coefficient, as log10 γ = −A(T)·z²·(√I/(1+√I) − 0.3·I).
     *
     * @param charge             charge number z of the ion (0 gives 0: neutral species are taken as ideal)
     * @param ionicStrengthMolar ionic strength I, mol/L, ≥ 0
     * @param temperatureC       temperature, °C, within [0, 100]
     * @return log10 γ
     */
    public static double daviesLog10Gamma(int charge, double ionicStrengthMolar, double temperatureC) {
        checkIonicStrength(ionicStrengthMolar);
        return -debyeHuckelA(temperatureC) * charge * charge * daviesFunction(ionicStrengthMolar);
    }

    /** The ionic-strength function of the Davies equation, √I/(1+√I) − 0.3·I. */
    static double daviesFunction(double ionicStrengthMolar) {
        double root = Math.sqrt(ionicStrengthMolar);
        return root / (1.0 + root) - DAVIES_LINEAR_TERM * ionicStrengthMolar;
    }

    /**
     * Mixed acidity constant at an ionic strength: pKa' = pKa + log10 γ(z − 1) − log10 γ(z) for
     * the step from the acid form of charge z to its conjugate base of charge z − 1, pH on the
     * activity scale (see the class description).
     *
     * @param thermodynamicPka  pKa at zero ionic strength
     * @param acidFormCharge    charge number z of the protonated form of this step
     * @param ionicStrengthMolar I, mol/L, ≥ 0
     * @param temperatureC      temperature, °C, within [0, 100]
     * @return pKa'
     */
    public static double mixedPka(double thermodynamicPka, int acidFormCharge, double ionicStrengthMolar,
                                  double temperatureC) {
        return thermodynamicPka
                + daviesLog10Gamma(acidFormCharge - 1, ionicStrengthMolar, temperatureC)
                - daviesLog10Gamma(acidFormCharge, ionicStrengthMolar, temperatureC);
    }

    /**
     * The mixed constants of every step of a species: step k (1-based) goes from form k − 1
     * (charge highestCharge − k + 1) to form k.
     *
     * @param thermodynamicPka  pKa values at zero ionic strength (not modified)
     * @param highestCharge     charge of the most protonated form
     * @param ionicStrengthMolar I, mol/L
     * @param temperatureC      temperature, °C
     * @return a new array of pKa' values, same order
     */
    public static double[] mixedPkas(double[] thermodynamicPka, int highestCharge, double ionicStrengthMolar,
                                     double temperatureC) {
        double[] out = new double[thermodynamicPka.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = mixedPka(thermodynamicPka[k], highestCharge - k, ionicStrengthMolar, temperatureC);
        }
        return out;
    }

    static void checkIonicStrength(double ionicStrengthMolar) {
        if (!(ionicStrengthMolar >= 0.0) || Double.isInfinite(ionicStrengthMolar)) {
            throw new IllegalArgumentException("ionic strength must be a finite number ≥ 0 mol/L, got "
                    + ionicStrengthMolar);
        }
    }
}
