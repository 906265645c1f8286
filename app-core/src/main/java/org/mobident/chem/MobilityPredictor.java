package org.mobident.chem;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.PhInterval;
import org.mobident.buffer.PredictionUncertainty;
import org.mobident.buffer.SpeciesModel;
import org.mobident.mobility.MobilityMath;

/**
 * Predicts the effective mobility of a species in a buffer.
 *
 * <p>μ_eff = Σᵢ αᵢ(pH, pKa'(I, T))·μᵢ(I, T), the mobility-weighted average over the protolytic
 * forms (Tiselius, Nova Acta Regiae Soc. Sci. Ups. Ser. IV 7 (1930) no. 4; Pospíchal, Gebauer
 * &amp; Boček, Chem. Rev. 89 (1989) 419), where
 * <ul>
 *   <li>μᵢ(I, T) is the limiting mobility of form i at 25 °C, scaled to T by the viscosity of water
 *       ({@link MobilityMath#atTemperature}, Walden's rule), then lowered to ionic strength I by
 *       {@link IonicStrengthCorrection} (Debye–Hückel–Onsager with ion size);</li>
 *   <li>pKa'(I, T) are the mixed constants of {@link Activity#mixedPka} (Davies equation, A at T)
 *       of the thermodynamic pKa values <em>as given</em>: pass a model whose pKa values hold at the
 *       buffer's temperature ({@link PkaTemperature#atTemperature},
 *       {@link IonisationEnthalpies#atTemperature}) when it is not 25 °C;</li>
 *   <li>αᵢ are the mole fractions of {@link IonicForms}.</li>
 * </ul>
 *
 * <p>Uncertainty: every pKa and every non-zero limiting mobility is treated as an independent
 * input with the standard uncertainty of {@link PredictionUncertainty}; sensitivities are central
 * differences ({@link InputPropagation}: step {@value InputPropagation#PKA_STEP} pKa units, relative step
 * {@value InputPropagation#RELATIVE_MOBILITY_STEP}
 * for mobilities) and combined in quadrature (JCGM 100:2008, GUM, law of propagation of
 * uncertainty, eq. 10).
 *
 * <p>The static methods use {@link PredictionUncertainty#DEFAULT}; an instance made with
 * {@link #withUncertainty} uses other input uncertainties.
 */
public final class MobilityPredictor {

    /** Grid step of the comigration scan, pH units; intervals narrower than this may be missed. */
    public static final double COMIGRATION_SCAN_STEP_PH = 0.01;
    /** pH resolution to which comigration interval ends are refined by bisection. */
    public static final double COMIGRATION_PH_RESOLUTION = 1e-6;

    /** Slack for counting curve steps, so that a range that is a whole number of steps is not padded. */
    private static final double STEP_COUNT_SLACK = 1e-9;

    private static final MobilityPredictor DEFAULT = new MobilityPredictor(PredictionUncertainty.DEFAULT);

    private final PredictionUncertainty uncertainty;

    private MobilityPredictor(PredictionUncertainty uncertainty) {
        this.uncertainty = uncertainty;
    }

    /** A predictor that propagates the given input uncertainties. */
    public static MobilityPredictor withUncertainty(PredictionUncertainty uncertainty) {
        if (uncertainty == null) {
            throw new IllegalArgumentException("uncertainty must not be null");
        }
        return new MobilityPredictor(uncertainty);
    }

    /** The input uncertainties of this predictor. */
    public PredictionUncertainty uncertainty() {
        return uncertainty;
    }

    /**
     * Predicted effective mobility and its uncertainty with the default input uncertainties
     * (pKa ±{@value PredictionUncertainty#DEFAULT_PKA_SD}, limiting mobilities ±2 %).
     *
     * @param model      the species
     * @param conditions the buffer
     * @return mobility in 1e-9 m²/(V·s), signed, with its standard uncertainty
     */
    public static MobilityPrediction predict(SpeciesModel model, BufferConditions conditions) {
        return DEFAULT.estimate(model, conditions);
    }

    /**
     * Predicted effective mobility and its uncertainty with this predictor's input uncertainties.
     *
     * @param model      the species
     * @param conditions the buffer
     */
    public MobilityPrediction estimate(SpeciesModel model, BufferConditions conditions) {
        double[] pKa = model.pKaArray();
        double[] mu = model.limitingMobilityArray();
        int h = model.highestCharge();
        double central = mobility(pKa, mu, h, conditions);
        double variance = InputPropagation.variance((p, m) -> mobility(p, m, h, conditions), pKa, mu,
                uncertainty.pKaSd(), uncertainty.relativeMobilitySd());
        return new MobilityPrediction(central, Math.sqrt(variance), meanCharge(model, conditions));
    }

    /**
     * The predicted effective mobility alone, 1e-9 m²/(V·s), signed.
     *
     * @param model      the species
     * @param conditions the buffer
     */
    public static double effectiveMobility(SpeciesModel model, BufferConditions conditions) {
        return mobility(model.pKaArray(), model.limitingMobilityArray(), model.highestCharge(), conditions);
    }

    /** Σαᵢzᵢ at the buffer's pH with the mixed constants of its ionic strength. */
    static double meanCharge(SpeciesModel model, BufferConditions c) {
        double[] mixed = Activity.mixedPkas(model.pKaArray(), model.highestCharge(), c.ionicStrengthMolar(),
                c.temperatureC());
        double[] alpha = IonicForms.fractions(mixed, c.pH());
        double sum = 0.0;
        for (int i = 0; i < alpha.length; i++) {
            sum += alpha[i] * model.charge(i);
        }
        return sum;
    }

    /** The model itself, on arrays (not modified). */
    static double mobility(double[] pKa, double[] limitingMobilities25C, int highestCharge, BufferConditions c) {
        double[] mixed = Activity.mixedPkas(pKa, highestCharge, c.ionicStrengthMolar(), c.temperatureC());
        double[] alpha = IonicForms.fractions(mixed, c.pH());
        double sum = 0.0;
        for (int i = 0; i < alpha.length; i++) {
            double mu0 = limitingMobilities25C[i];
            if (mu0 == 0.0) {
                continue;
            }
            double atT = MobilityMath.atTemperature(mu0, BufferConditions.REFERENCE_TEMPERATURE_C, c.temperatureC());
            double actual = IonicStrengthCorrection.actualMobility(atT, highestCharge - i, c.ionicStrengthMolar(),
                    c.temperatureC());
            sum += alpha[i] * actual;
        }
        return sum;
    }

    /**
     * The mobility–pH curve from {@code pHFrom} to {@code pHTo} (both included; the last step may be
     * shorter so that the curve ends exactly at {@code pHTo}).
     *
     * @param model              the species
     * @param pHFrom             first pH
     * @param pHTo               last pH, ≥ pHFrom
     * @param pHStep             step, &gt; 0
     * @param ionicStrengthMolar ionic strength, mol/L
     * @param temperatureC       temperature, °C
     * @return points in increasing pH
     */
    public static List<CurvePoint> curve(SpeciesModel model, double pHFrom, double pHTo, double pHStep,
                                         double ionicStrengthMolar, double temperatureC) {
        checkRange(pHFrom, pHTo);
        if (!(pHStep > 0.0) || Double.isInfinite(pHStep)) {
            throw new IllegalArgumentException("pH step must be positive, got " + pHStep);
        }
        long steps = (long) Math.ceil((pHTo - pHFrom) / pHStep - STEP_COUNT_SLACK);
        List<CurvePoint> out = new ArrayList<>();
        BufferConditions base = new BufferConditions(pHFrom, ionicStrengthMolar, temperatureC);
        for (long k = 0; k <= steps; k++) {
            double pH = k == steps ? pHTo : pHFrom + k * pHStep;
            out.add(new CurvePoint(pH, effectiveMobility(model, base.withPh(pH))));
        }
        return out;
    }

    /**
     * The pH intervals within [pHFrom, pHTo] where the two species' predicted effective mobilities
     * differ by less than {@code thresholdMobility}, i.e. where they would comigrate.
     *
     * <p>The range is scanned in steps of {@value #COMIGRATION_SCAN_STEP_PH} pH and each crossing of
     * the threshold is located by bisection to {@value #COMIGRATION_PH_RESOLUTION} pH; an interval
     * narrower than the scan step can be missed.
     *
     * @param a                  first species
     * @param b                  second species
     * @param pHFrom             lower end of the pH range
     * @param pHTo               upper end, ≥ pHFrom
     * @param ionicStrengthMolar ionic strength, mol/L
     * @param temperatureC       temperature, °C
     * @param thresholdMobility  difference in 1e-9 m²/(V·s) below which the two comigrate, &gt; 0
     * @return disjoint intervals in increasing pH (empty when they are resolved everywhere)
     */
    public static List<PhInterval> comigrationRanges(SpeciesModel a, SpeciesModel b, double pHFrom, double pHTo,
                                                     double ionicStrengthMolar, double temperatureC,
                                                     double thresholdMobility) {
        checkRange(pHFrom, pHTo);
        if (!(thresholdMobility > 0.0) || Double.isInfinite(thresholdMobility)) {
            throw new IllegalArgumentException("threshold must be a positive mobility, got " + thresholdMobility);
        }
        BufferConditions base = new BufferConditions(pHFrom, ionicStrengthMolar, temperatureC);
        DoubleUnaryOperator excess = pH -> Math.abs(
                effectiveMobility(a, base.withPh(pH)) - effectiveMobility(b, base.withPh(pH))) - thresholdMobility;
        List<PhInterval> out = new ArrayList<>();
        int steps = Math.max(1, (int) Math.ceil((pHTo - pHFrom) / COMIGRATION_SCAN_STEP_PH));
        double prevPh = pHFrom;
        boolean prevInside = excess.applyAsDouble(prevPh) < 0.0;
        double start = prevInside ? pHFrom : Double.NaN;
        for (int k = 1; k <= steps; k++) {
            double pH = k == steps ? pHTo : pHFrom + k * (pHTo - pHFrom) / steps;
            boolean inside = excess.applyAsDouble(pH) < 0.0;
            if (inside != prevInside) {
                double edge = bisect(excess, prevPh, pH, prevInside);
                if (inside) {
                    start = edge;
                } else {
                    out.add(new PhInterval(start, edge));
                }
            }
            prevPh = pH;
            prevInside = inside;
        }
        if (prevInside) {
            out.add(new PhInterval(start, pHTo));
        }
        return out;
    }

    /** The boundary between lo (inside = loInside) and hi (the other state), to the set resolution. */
    private static double bisect(DoubleUnaryOperator excess, double lo, double hi,
                                 boolean loInside) {
        while (hi - lo > COMIGRATION_PH_RESOLUTION) {
            double mid = 0.5 * (lo + hi);
            boolean midInside = excess.applyAsDouble(mid) < 0.0;
            if (midInside == loInside) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static void checkRange(double pHFrom, double pHTo) {
        if (!(pHFrom >= BufferConditions.MIN_PH && pHTo <= BufferConditions.MAX_PH && pHTo >= pHFrom)) {
            throw new IllegalArgumentException("pH range must lie within " + BufferConditions.MIN_PH + "–"
                    + BufferConditions.MAX_PH + " with from ≤ to, got " + pHFrom + "–" + pHTo);
        }
    }

    private static double square(double v) {
        return v * v;
    }
}
