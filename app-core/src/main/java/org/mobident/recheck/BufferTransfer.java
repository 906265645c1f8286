package org.mobident.recheck;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.PredictionUncertainty;
import org.mobident.buffer.SpeciesModel;
import org.mobident.chem.InputPropagation;
import org.mobident.chem.IonicStrengthCorrection;
import org.mobident.chem.IonisationEnthalpies;
import org.mobident.chem.MobilityPredictor;
import org.mobident.chem.PkaTemperature;
import org.mobident.chem.ReferenceIons;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.mobility.MobilityMath;
import org.mobident.settings.MatchSettings;

/**
 * Predicts each library analyte's effective mobility in a new buffer B from its value measured in
 * buffer A, anchored on the measurement.
 *
 * <h2>Method</h2>
 * The model μ_model(buffer) of {@link MobilityPredictor} (Σαᵢμᵢ over the protolytic forms,
 * Tiselius 1930, Pospíchal, Gebauer &amp; Boček, Chem. Rev. 89 (1989) 419; Davies activity
 * correction of the pKa; Debye–Hückel–Onsager lowering of the limiting mobilities; Walden's rule
 * for the mobilities' temperature dependence; the pKa values moved to each buffer's temperature by
 * the van 't Hoff equation, {@link PkaTemperature}, with the enthalpies of {@link #withEnthalpies})
 * is not used for its absolute value but for the <em>change</em> from A to B, so
 * that whatever the model gets wrong in both buffers alike (a limiting mobility a few per cent off,
 * the buffer's own viscosity, wall effects in the measured value) cancels:
 * <ul>
 *   <li><b>ratio transfer</b>: μ_B = μ_A,measured × μ_model(B)/μ_model(A). For a strong ion this
 *       is the product of the viscosity ratio η(T_A)/η(T_B) and the ratio of the ionic-strength
 *       factors; for a weak electrolyte the ratio also carries the change of the degree of
 *       ionisation Σαᵢμᵢ, i.e. the measured value calibrates the limiting mobilities of the
 *       model. (The same anchoring of a model on one measured point is the usual way of carrying
 *       effective mobilities between buffers in CE modelling; see Friedl, Reijenga &amp;
 *       Kenndler, J. Chromatogr. A 709 (1995) 163.)</li>
 *   <li><b>difference transfer</b>: μ_B = μ_A,measured + (μ_model(B) − μ_model(A)), used
 *       instead when the analyte is barely ionised in A (|μ_model(A)| below
 *       {@value #MIN_ANCHOR_FRACTION} of the largest |mobility| of its forms in A) or when model
 *       and measurement disagree in sign: the ratio would then multiply the measurement error (and
 *       any pKa error) by a large factor. A modelling choice.</li>
 *   <li><b>no model data</b> (no pKa/limiting mobility in the entry, none in the reference
 *       library under its name, no charge): only the viscosity ratio and the ionic-strength factor
 *       of a univalent ion are applied, a pH change is not taken into account, and the result is
 *       flagged ({@link PredictionBasis#NO_MODEL}).</li>
 * </ul>
 * Model data are looked up in this order: the entry's own {@code pka}/{@code limiting_mobility}
 * (with its {@code charge}, read as {@link ReferenceIons#model} reads it); the reference library
 * by name (case-insensitive); the entry's charge alone (a strong ion whose limiting mobility is
 * taken to be the measured one, which only matters for the small ionic-strength term).
 *
 * <h2>Uncertainty</h2>
 * Combined in quadrature (JCGM 100:2008, GUM, eq. 10), each term as a standard uncertainty:
 * <ul>
 *   <li>the library spread s carried by the transfer: (∂μ_B/∂μ_A · s)²·(1 + 1/n), the
 *       variance of a new run about a mean of n (1 when n is unknown); an entry without a
 *       spread gets {@link #assumedSpread()};</li>
 *   <li>the model inputs: each pKa (±{@link PredictionUncertainty#pKaSd()}, widened by the uncertainty of
 *       its change between the two temperatures from the uncertainty of the enthalpy of
 *       ionisation, {@link PkaTemperature#shiftSd}: small for a tabulated enthalpy, larger for
 *       the class value that stands in for a missing one) and each limiting mobility (relative
 *       ±{@link PredictionUncertainty#relativeMobilitySd()}), propagated through the
 *       <em>transfer</em> by central differences, so that errors common to A and B cancel as they
 *       do in the ratio;</li>
 *   <li>the form of the ionic-strength correction: {@value #UNIVALENT_IONIC_STRENGTH_RELATIVE_SD}
 *       (univalent) or {@value #MULTIVALENT_IONIC_STRENGTH_RELATIVE_SD} (|z| ≥ 2 or unknown
 *       charge) of the part of the shift that the correction makes;</li>
 *   <li>the form of the temperature correction: {@value #WALDEN_RELATIVE_SD_PER_K} of |μ_B| per
 *       kelvin of temperature change (deviations of ions from Walden's rule, and the buffer's
 *       viscosity differing from water's). This term moves all analytes together, so it is kept
 *       apart ({@link PredictedMobility#commonUncertainty()}) and left out where analytes are
 *       compared with each other ({@link PredictedMobility#comparisonUncertainty()});</li>
 *   <li>without model data, in addition {@value #NO_MODEL_RELATIVE_SD} of |μ_B|.</li>
 * </ul>
 * The numbers of the last three terms are modelling choices (common practice), stated here so
 * that the reported uncertainty can be judged.
 */
public final class BufferTransfer {

    /** Smallest |μ_model(A)| relative to the largest form mobility in A for a ratio transfer (modelling choice). */
    public static final double MIN_ANCHOR_FRACTION = 0.1;
    /** Relative uncertainty of the ionic-strength shift for univalent ions (common practice; the simple correction reproduces KCl within ~1 % of μ up to 0.1 mol/L). */
    public static final double UNIVALENT_IONIC_STRENGTH_RELATIVE_SD = 0.1;
    /** Relative uncertainty of the ionic-strength shift for multivalent or unknown charges (common practice; for |z| ≥ 2 the correction lowers more than the empirical exp(−0.77·√(|z|I)) of Friedl et al. 1995, by up to a third at I = 0.05 mol/L for z = 3, see IonicStrengthCorrection). */
    public static final double MULTIVALENT_IONIC_STRENGTH_RELATIVE_SD = 0.25;
    /** Relative uncertainty per kelvin of the viscosity (Walden) scaling (common practice: ions' conductivity temperature coefficients differ from water's fluidity by ~0.1–0.3 %/K). */
    public static final double WALDEN_RELATIVE_SD_PER_K = 0.002;
    /** Extra relative uncertainty without model data (modelling choice). */
    public static final double NO_MODEL_RELATIVE_SD = 0.05;

    private static final double REFERENCE_C = BufferConditions.REFERENCE_TEMPERATURE_C;

    /** Note of a prediction from the reference library's data (implied by {@link PredictionBasis#REFERENCE_MODEL}). */
    static final String NOTE_REFERENCE = "model data from the reference library";
    /** Note when the entry's own data were unusable and the reference library stood in. */
    static final String NOTE_REFERENCE_USED = "reference library used";
    /** Note of a charge-only prediction (implied by {@link PredictionBasis#CHARGE_ONLY}). */
    static final String NOTE_STRONG = "strong ion of the stated charge assumed";
    /** Note of a prediction without model data (implied by {@link PredictionBasis#NO_MODEL}). */
    static final String NOTE_NO_MODEL = "no model data (no pka/limiting_mobility, not in the reference library, "
            + "no charge): only viscosity and univalent ionic-strength transfer";
    /** Start of the note when the entry's own model data could not be used. */
    static final String NOTE_OWN_DATA_UNUSED = "the entry's pka/limiting_mobility were not used";
    /** Note when the pH changes and nothing models it. */
    static final String NOTE_PH_IGNORED = "the pH change is NOT accounted for";
    /** Note when a pKa was moved to another temperature with the class value of the enthalpy. */
    public static final String NOTE_ASSUMED_ENTHALPY = "pKa moved to the method temperature with an assumed enthalpy "
            + "of ionisation";
    /** The notes above: what the basis column already says, or what is said once for all analytes. */
    static final java.util.Set<String> BASIS_NOTES = java.util.Set.of(NOTE_REFERENCE, NOTE_REFERENCE_USED, NOTE_STRONG,
            NOTE_NO_MODEL, NOTE_PH_IGNORED, NOTE_ASSUMED_ENTHALPY);

    private final Map<String, SpeciesModel> reference;
    private final PredictionUncertainty inputs;
    private final double assumedSpread;
    private final IonisationEnthalpies enthalpies;

    private BufferTransfer(Map<String, SpeciesModel> reference, PredictionUncertainty inputs, double assumedSpread) {
        this(reference, inputs, assumedSpread, IonisationEnthalpies.none());
    }

    private BufferTransfer(Map<String, SpeciesModel> reference, PredictionUncertainty inputs, double assumedSpread,
                           IonisationEnthalpies enthalpies) {
        this.reference = reference;
        this.inputs = inputs;
        this.assumedSpread = assumedSpread;
        this.enthalpies = enthalpies;
    }

    /**
     * The same predictor with a table of enthalpies of ionisation for the temperature dependence of
     * pKa (by analyte name; steps the table lacks get the class values of {@link PkaTemperature}).
     */
    BufferTransfer withEnthalpies(IonisationEnthalpies table) {
        if (table == null) {
            throw new IllegalArgumentException("table must not be null");
        }
        return new BufferTransfer(reference, inputs, assumedSpread, table);
    }

    /**
     * The same predictor with the enthalpies of ionisation read from a table file (columns as
     * {@code reference-libraries/ionisation-enthalpies.csv}); see {@link #withEnthalpies}.
     *
     * @throws InputException when the file cannot be read or a row is malformed (file, line and field named)
     */
    public BufferTransfer withEnthalpyTable(Path tableFile) throws InputException {
        return withEnthalpies(IonisationEnthalpies.read(tableFile));
    }

    /** A predictor that knows only the model data inside the libraries it is given. */
    public static BufferTransfer withoutReference() {
        return new BufferTransfer(Map.of(), PredictionUncertainty.DEFAULT, MatchSettings.DEFAULT_ASSUMED_ENTRY_SD);
    }

    /**
     * A predictor that falls back on reference models by analyte name (for example
     * {@code ReferenceIons.read(Path.of(ReferenceIons.SHIPPED_LIBRARY))}).
     *
     * @param models reference species by name (not modified; copied)
     */
    public static BufferTransfer withReference(Map<String, SpeciesModel> models) {
        Map<String, SpeciesModel> byKey = new HashMap<>();
        for (Map.Entry<String, SpeciesModel> e : models.entrySet()) {
            byKey.put(key(e.getKey()), e.getValue());
        }
        return new BufferTransfer(Map.copyOf(byKey), PredictionUncertainty.DEFAULT, MatchSettings.DEFAULT_ASSUMED_ENTRY_SD);
    }

    /** As {@link #withReference(Map)} with the models of a reference library. */
    public static BufferTransfer withReference(Library referenceLibrary) throws InputException {
        return withReference(ReferenceIons.models(referenceLibrary));
    }

    /** The same predictor with other model-input uncertainties. */
    public BufferTransfer withInputUncertainty(PredictionUncertainty uncertainty) {
        if (uncertainty == null) {
            throw new IllegalArgumentException("uncertainty must not be null");
        }
        return new BufferTransfer(reference, uncertainty, assumedSpread, enthalpies);
    }

    /** The same predictor with another spread for entries that state none, mobility units, &gt; 0. */
    public BufferTransfer withAssumedSpread(double spreadUnits) {
        if (!(spreadUnits > 0) || Double.isInfinite(spreadUnits)) {
            throw new IllegalArgumentException("assumed spread must be finite and > 0, got " + spreadUnits);
        }
        return new BufferTransfer(reference, inputs, spreadUnits, enthalpies);
    }

    /** Spread used for entries without {@code mobility_sd}, mobility units. */
    public double assumedSpread() {
        return assumedSpread;
    }

    /** The model-input uncertainties. */
    public PredictionUncertainty inputUncertainty() {
        return inputs;
    }

    private static String key(String name) {
        return name.strip().toLowerCase(Locale.ROOT);
    }

    /**
     * Predictions for every entry of library A.
     *
     * @param libraryA the measured library
     * @param bufferA  the library's buffer, used where an entry states no conditions (may be null
     *                 when every entry states its pH and ionic strength)
     * @param bufferB  the new buffer
     * @return one prediction per entry, in library order
     * @throws InputException when an entry's buffer cannot be determined
     */
    public List<PredictedMobility> predictAll(Library libraryA, BufferSpec bufferA, BufferSpec bufferB)
            throws InputException {
        List<PredictedMobility> out = new ArrayList<>(libraryA.size());
        for (LibraryEntry e : libraryA.entries()) {
            out.add(predict(e, BufferSpec.forEntry(e, bufferA, libraryA.sourceFile()), bufferB,
                    libraryA.sourceFile()));
        }
        return out;
    }

    /**
     * The predicted library B: every entry of A with the predicted mobility and its comparison
     * uncertainty ({@link PredictedMobility#comparisonUncertainty()}) as {@code mobility_sd} (n left unknown, since the uncertainty already is that of a new run),
     * B's conditions, A's charge and model data, and no per-entry tolerance (the matching rule then
     * works on the predicted uncertainty).
     *
     * @param predictions as from {@link #predictAll}
     * @param libraryA    the library they came from
     * @param bufferB     the new buffer
     */
    public static Library asLibrary(List<PredictedMobility> predictions, Library libraryA, BufferSpec bufferB) {
        List<LibraryEntry> entries = new ArrayList<>(predictions.size());
        for (PredictedMobility p : predictions) {
            LibraryEntry a = libraryA.find(p.name()).orElseThrow(() ->
                    new IllegalArgumentException("prediction for '" + p.name() + "' has no entry in the old library"));
            entries.add(new LibraryEntry(p.name(), p.predicted(), p.comparisonUncertainty(), 0, a.charge(), Double.NaN,
                    a.pKa(), a.limitingMobilities(), bufferB.label().isEmpty() ? null : bufferB.label(),
                    bufferB.pH(), bufferB.ionicStrengthMm(), bufferB.temperatureC(),
                    "predicted from " + libraryA.sourceFile() + " (" + p.method().label() + ", " + p.basis().label()
                            + ")"));
        }
        return new Library(entries, libraryA.sourceFile() + " predicted for " + bufferB.describeConditions(),
                List.of("Predicted for " + bufferB.describeConditions() + " from " + libraryA.sourceFile()
                        + "; presumptive, confirm with standards"));
    }

    /**
     * Prediction for one entry.
     *
     * @param entry        the measured entry (mobility at {@code bufferA}'s temperature)
     * @param bufferA      the conditions it was measured in
     * @param bufferB      the new conditions
     * @param libraryLabel library file, for notes
     */
    public PredictedMobility predict(LibraryEntry entry, BufferSpec bufferA, BufferSpec bufferB, String libraryLabel) {
        List<String> notes = new ArrayList<>();
        double spread = Double.isFinite(entry.mobilitySd()) ? entry.mobilitySd() : assumedSpread;
        if (!Double.isFinite(entry.mobilitySd())) {
            notes.add(String.format(Locale.ROOT, "no mobility_sd in the library; %.2f assumed", assumedSpread));
        }
        Choice choice = choose(entry, libraryLabel, notes);
        BufferConditions a = bufferA.conditions();
        BufferConditions b = bufferB.conditions();
        double mu = entry.mobility();
        if (choice.model == null) {
            return withoutModel(entry, bufferA, bufferB, spread, notes);
        }
        SpeciesModel m = choice.model;
        // pKa values at each buffer's temperature (van 't Hoff), limiting mobilities still at 25 °C
        SpeciesModel mA = enthalpies.atTemperature(m, a.temperatureC());
        SpeciesModel mB = enthalpies.atTemperature(m, b.temperatureC());
        double gA = MobilityPredictor.effectiveMobility(mA, a);
        double gB = MobilityPredictor.effectiveMobility(mB, b);
        PredictedMobility.Method method = anchorIsInformative(mA, a, gA, mu)
                ? PredictedMobility.Method.RATIO : PredictedMobility.Method.DIFFERENCE;
        if (method == PredictedMobility.Method.DIFFERENCE) {
            notes.add(Math.signum(gA) != Math.signum(mu) && gA != 0 && mu != 0
                    ? "model and measurement disagree in sign in the old buffer; the model's change was added"
                    : "barely ionised in the old buffer; the model's change was added instead of scaled");
        }
        double predicted = transfer(method, mu, gA, gB);
        double slope = method == PredictedMobility.Method.RATIO ? gB / gA : 1.0;
        boolean warmer = !m.pKa().isEmpty() && (a.temperatureC() != REFERENCE_C || b.temperatureC() != REFERENCE_C);
        if (warmer && enthalpies.steps(m).stream().anyMatch(st -> !st.tabulated())) {
            notes.add(NOTE_ASSUMED_ENTHALPY);
        }

        double pKaSd = Math.hypot(inputs.pKaSd(), enthalpies.shiftSd(m, a.temperatureC(), b.temperatureC()));
        double variance = inputVariance(m, mA, mB, a, b, mu, method, pKaSd);
        double withoutIonic = transfer(method, mu,
                MobilityPredictor.effectiveMobility(mA, new BufferConditions(a.pH(), 0.0, a.temperatureC())),
                MobilityPredictor.effectiveMobility(mB, new BufferConditions(b.pH(), 0.0, b.temperatureC())));
        double ionicRelative = maxAbsCharge(m) >= 2 ? MULTIVALENT_IONIC_STRENGTH_RELATIVE_SD
                : UNIVALENT_IONIC_STRENGTH_RELATIVE_SD;
        variance += square(ionicRelative * (predicted - withoutIonic));
        double common = WALDEN_RELATIVE_SD_PER_K * Math.abs(b.temperatureC() - a.temperatureC()) * Math.abs(predicted);
        variance += square(common);
        double modelSd = Math.sqrt(variance);
        double total = Math.sqrt(square(slope * spread) * predictiveFactor(entry.n()) + variance);
        double meanCharge = MobilityPredictor.predict(mB, b).meanCharge();
        if (choice.note != null) {
            notes.add(0, choice.note);
        }
        return new PredictedMobility(entry.name(), bufferA, bufferB, mu, spread, entry.n(), gA, gB, predicted, total,
                modelSd, common, slope, meanCharge, choice.basis, method, String.join("; ", notes));
    }

    private PredictedMobility withoutModel(LibraryEntry entry, BufferSpec bufferA, BufferSpec bufferB, double spread,
                                           List<String> notes) {
        double mu = entry.mobility();
        double tA = bufferA.temperatureC();
        double tB = bufferB.temperatureC();
        double viscous = MobilityMath.atTemperature(mu, tA, tB);
        int z = (int) Math.signum(mu);
        double predicted = mu == 0.0 ? 0.0
                : viscous * ionicFactor(mu, z, tA, bufferB) / ionicFactor(mu, z, tA, bufferA);
        double slope = mu == 0.0 ? MobilityMath.atTemperature(1.0, tA, tB) : predicted / mu;
        double common = WALDEN_RELATIVE_SD_PER_K * Math.abs(tB - tA) * Math.abs(predicted);
        double variance = square(MULTIVALENT_IONIC_STRENGTH_RELATIVE_SD * (predicted - viscous))
                + square(common) + square(NO_MODEL_RELATIVE_SD * predicted);
        double total = Math.sqrt(square(slope * spread) * predictiveFactor(entry.n()) + variance);
        notes.add(0, NOTE_NO_MODEL);
        if (Math.abs(bufferB.pH() - bufferA.pH()) > BufferSpec.SAME_VALUE_TOLERANCE) {
            notes.add(1, NOTE_PH_IGNORED);
        }
        return new PredictedMobility(entry.name(), bufferA, bufferB, mu, spread, entry.n(), Double.NaN, Double.NaN,
                predicted, total, Math.sqrt(variance), common, slope, Double.NaN, PredictionBasis.NO_MODEL,
                PredictedMobility.Method.VISCOSITY_AND_IONIC_STRENGTH, String.join("; ", notes));
    }

    /**
     * Ratio of the actual to the limiting mobility of a univalent ion at a buffer's ionic strength
     * and temperature, the measured magnitude (brought to that temperature) standing in for the
     * limiting mobility.
     */
    private static double ionicFactor(double mu, int z, double measuredAtC, BufferSpec buffer) {
        double m = Math.abs(MobilityMath.atTemperature(mu, measuredAtC, buffer.temperatureC()));
        return IonicStrengthCorrection.actualMobility(m, z, buffer.ionicStrengthMolar(), buffer.temperatureC()) / m;
    }

    /** 1 + 1/n: a new run about a mean of n (1 when n is unknown). */
    private static double predictiveFactor(int n) {
        return n > 0 ? 1.0 + 1.0 / n : 1.0;
    }

    private static double transfer(PredictedMobility.Method method, double measured, double gA, double gB) {
        return method == PredictedMobility.Method.RATIO ? measured * gB / gA : measured + (gB - gA);
    }

    /** Whether μ_model(A) is large enough (and of the measured sign) to scale by. */
    static boolean anchorIsInformative(SpeciesModel m, BufferConditions a, double gA, double measured) {
        if (gA == 0.0 || measured == 0.0 || Math.signum(gA) != Math.signum(measured)) {
            return false;
        }
        double largest = 0.0;
        for (int i = 0; i < m.formCount(); i++) {
            double mu0 = m.limitingMobilities().get(i);
            if (mu0 == 0.0) {
                continue;
            }
            double atT = MobilityMath.atTemperature(mu0, REFERENCE_C, a.temperatureC());
            largest = Math.max(largest, Math.abs(IonicStrengthCorrection.actualMobility(atT, m.charge(i),
                    a.ionicStrengthMolar(), a.temperatureC())));
        }
        return Math.abs(gA) >= MIN_ANCHOR_FRACTION * largest;
    }

    /**
     * Variance of the transfer from the pKa and limiting-mobility inputs, by central differences: a
     * perturbation of a pKa of {@code m} (25 °C) moves that pKa alike at both temperatures.
     */
    private double inputVariance(SpeciesModel m, SpeciesModel mA, SpeciesModel mB, BufferConditions a,
                                 BufferConditions b, double measured, PredictedMobility.Method method, double pKaSd) {
        double[] base = m.pKaArray();
        // the propagation perturbs its own array in place; the differences are taken against this copy
        double[] perturbed = base.clone();
        return InputPropagation.variance((p, mu) -> transferOf(m, shifted(mA, base, p), shifted(mB, base, p), mu, a,
                b, measured, method), perturbed, m.limitingMobilityArray(), pKaSd, inputs.relativeMobilitySd());
    }

    /** The pKa values of {@code atT} moved by the perturbation {@code p − base}. */
    private static double[] shifted(SpeciesModel atT, double[] base, double[] p) {
        double[] out = atT.pKaArray();
        for (int i = 0; i < out.length; i++) {
            out[i] += p[i] - base[i];
        }
        return out;
    }

    private static double transferOf(SpeciesModel m, double[] pKaA, double[] pKaB, double[] mu, BufferConditions a,
                                     BufferConditions b, double measured, PredictedMobility.Method method) {
        List<Double> u = new ArrayList<>(mu.length);
        for (double v : mu) {
            u.add(v);
        }
        return transfer(method, measured, MobilityPredictor.effectiveMobility(species(m, pKaA, u), a),
                MobilityPredictor.effectiveMobility(species(m, pKaB, u), b));
    }

    private static SpeciesModel species(SpeciesModel m, double[] pKa, List<Double> mu) {
        List<Double> p = new ArrayList<>(pKa.length);
        for (double v : pKa) {
            p.add(v);
        }
        // keep the ascending order a perturbation of nearly equal pKa values could break
        p.sort(null);
        return new SpeciesModel(m.name(), m.highestCharge(), p, mu);
    }

    private static int maxAbsCharge(SpeciesModel m) {
        int max = 0;
        for (int i = 0; i < m.formCount(); i++) {
            max = Math.max(max, Math.abs(m.charge(i)));
        }
        return max;
    }

    /**
     * What a prediction for the entry would rest on, and why a better source was not usable
     * (null when nothing stood in the way), without predicting anything.
     *
     * @param e            the entry
     * @param libraryLabel its library's file name, for messages
     */
    public Coverage coverage(LibraryEntry e, String libraryLabel) {
        List<String> notes = new ArrayList<>();
        Choice c = choose(e, libraryLabel, notes);
        String problem = null;
        List<String> said = new ArrayList<>(notes);
        if (c.note != null) {
            said.add(0, c.note);
        }
        for (String n : said) {
            String first = n.split("; ")[0];
            if (first.startsWith(NOTE_OWN_DATA_UNUSED)) {
                problem = first;
                break;
            }
        }
        return new Coverage(e.name(), c.basis, problem);
    }

    /**
     * What an entry's prediction rests on.
     *
     * @param name    the analyte
     * @param basis   the model data that would be used
     * @param problem why the entry's own pka/limiting_mobility could not be used, or null
     */
    public record Coverage(String name, PredictionBasis basis, String problem) {
    }

    /** The model chosen for an entry, with the reason when a better source was unusable. */
    private record Choice(SpeciesModel model, PredictionBasis basis, String note) {
    }

    private Choice choose(LibraryEntry e, String libraryLabel, List<String> notes) {
        boolean ownData = !e.pKa().isEmpty() || !e.limitingMobilities().isEmpty();
        String problem = null;
        if (ownData) {
            if (e.charge() == 0) {
                problem = NOTE_OWN_DATA_UNUSED + ": no charge is given";
            } else {
                try {
                    return new Choice(ReferenceIons.model(e, libraryLabel), PredictionBasis.ENTRY_MODEL, null);
                } catch (InputException ex) {
                    problem = NOTE_OWN_DATA_UNUSED + ": " + ex.problem();
                }
            }
        }
        SpeciesModel ref = reference.get(key(e.name()));
        if (ref != null) {
            return new Choice(ref, PredictionBasis.REFERENCE_MODEL, problem == null
                    ? NOTE_REFERENCE : problem + "; " + NOTE_REFERENCE_USED);
        }
        if (e.charge() != 0 && e.pKa().isEmpty()) {
            try {
                return new Choice(ReferenceIons.model(e, libraryLabel), PredictionBasis.CHARGE_ONLY, problem == null
                        ? NOTE_STRONG : problem + "; " + NOTE_STRONG);
            } catch (InputException | IllegalArgumentException ex) {
                problem = problem == null ? ex.getMessage() : problem;
            }
        }
        if (problem != null) {
            notes.add(problem);
        }
        return new Choice(null, PredictionBasis.NO_MODEL, null);
    }

    private static double square(double v) {
        return v * v;
    }
}
