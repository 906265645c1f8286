package org.mobident.chem;

/**
 * Fundamental constants in SI units, CODATA 2018 recommended values (exact since the 2019
 * redefinition of the SI, except the vacuum permittivity). Package-private: only the formulas of
 * this package need them; the Faraday constant lives in {@link org.mobident.Units}.
 */
final class PhysicalConstants {
    /** Elementary charge, C (exact). */
    static final double ELEMENTARY_CHARGE_C = 1.602176634e-19;
    /** Boltzmann constant, J/K (exact). */
    static final double BOLTZMANN_J_PER_K = 1.380649e-23;
    /** Avogadro constant, 1/mol (exact). */
    static final double AVOGADRO_PER_MOL = 6.02214076e23;
    /** Vacuum electric permittivity ε₀, F/m (CODATA 2018). */
    static final double VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;
    /** Litres per cubic metre: turns mol/L into mol/m³. */
    static final double LITRES_PER_CUBIC_METRE = 1000.0;
    /** Pa·s per mPa·s. */
    static final double PA_S_PER_MPA_S = 1e-3;
    /** Mobility unit of Mobident, 1e-9 m²/(V·s), per SI unit m²/(V·s). */
    static final double MOBILITY_UNITS_PER_SI = 1e9;

    private PhysicalConstants() {
    }
}
