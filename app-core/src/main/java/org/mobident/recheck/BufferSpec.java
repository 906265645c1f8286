package org.mobident.recheck;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * A named background electrolyte: what the mobility model needs to know about a buffer.
 *
 * <p>The numbers are validated as {@link BufferConditions} (pH 0–14, ionic strength 0–0.5 mol/L,
 * temperature 0–100 °C); this record only adds a label.
 *
 * @param label              buffer label as the lab names it (never null; may be empty)
 * @param pH                 pH on the operational (activity) scale
 * @param ionicStrengthMolar ionic strength, mol/L
 * @param temperatureC       temperature, °C
 */
public record BufferSpec(String label, double pH, double ionicStrengthMolar, double temperatureC) {

    /** mmol/L per mol/L. */
    public static final double MM_PER_MOLAR = 1000.0;

    /**
     * Largest difference between two stated values of the same quantity that still counts as
     * the same buffer (pH units, mmol/L or °C alike): differences of rounding only.
     */
    public static final double SAME_VALUE_TOLERANCE = 1e-6;

    /** Library note keys that state the buffer, matched without regard to case. */
    static final List<String> NOTE_KEYS = List.of("buffer", "ph", "ionic_strength_mm", "temperature_c");

    /** {@code key: value} or {@code key = value} at the start of a note line. */
    private static final Pattern NOTE = Pattern.compile(
            "\\s*(buffer|ph|ionic_strength_mm|temperature_c)\\s*[:=]\\s*(.*?)\\s*", Pattern.CASE_INSENSITIVE);

    public BufferSpec {
        label = label == null ? "" : label.strip();
        // validates the numbers with the model's own ranges
        new BufferConditions(pH, ionicStrengthMolar, temperatureC);
    }

    /**
     * A buffer from the units labs usually state.
     *
     * @param label           buffer label (may be null)
     * @param pH              pH
     * @param ionicStrengthMm ionic strength, mmol/L
     * @param temperatureC    temperature, °C
     * @throws IllegalArgumentException when a value is out of range
     */
    public static BufferSpec of(String label, double pH, double ionicStrengthMm, double temperatureC) {
        return new BufferSpec(label, pH, ionicStrengthMm / MM_PER_MOLAR, temperatureC);
    }

    /** A labelled copy of model conditions. */
    public static BufferSpec of(String label, BufferConditions conditions) {
        return new BufferSpec(label, conditions.pH(), conditions.ionicStrengthMolar(), conditions.temperatureC());
    }

    /** The conditions as the model takes them. */
    public BufferConditions conditions() {
        return new BufferConditions(pH, ionicStrengthMolar, temperatureC);
    }

    /** Ionic strength in mmol/L. */
    public double ionicStrengthMm() {
        return ionicStrengthMolar * MM_PER_MOLAR;
    }

    /** The same buffer at another pH (label kept). */
    public BufferSpec withPh(double newPh) {
        return new BufferSpec(label, newPh, ionicStrengthMolar, temperatureC);
    }

    /** Short description, e.g. {@code "CHR-8 (pH 8.00, I 12.0 mmol/L, 25.0 °C)"}. */
    public String describe() {
        String numbers = describeConditions();
        return label.isEmpty() ? numbers : label + " (" + numbers + ")";
    }

    /** The conditions without the label, e.g. {@code "pH 8.00, I 12.0 mmol/L, 25.0 °C"}. */
    public String describeConditions() {
        return String.format(Locale.ROOT, "pH %.2f, I %.1f mmol/L, %.1f °C", pH, ionicStrengthMm(), temperatureC);
    }

    /**
     * The conditions one library entry was measured in: the entry's own {@code ph},
     * {@code ionic_strength_mm}, {@code temperature_c} and {@code buffer} where it states them,
     * otherwise those of {@code fallback}; a temperature stated nowhere is 25 °C (the library
     * convention, {@link LibraryEntry#DEFAULT_TEMPERATURE_C}).
     *
     * @param entry        the entry
     * @param fallback     the library's buffer, or null when there is none
     * @param libraryLabel the library file, for messages
     * @throws InputException when neither the entry nor the fallback states the pH or the ionic strength
     */
    public static BufferSpec forEntry(LibraryEntry entry, BufferSpec fallback, String libraryLabel)
            throws InputException {
        double pH = stated(entry.pH()) ? entry.pH() : fallback == null ? Double.NaN : fallback.pH();
        double ionicMm = stated(entry.ionicStrengthMm()) ? entry.ionicStrengthMm()
                : fallback == null ? Double.NaN : fallback.ionicStrengthMm();
        double t = stated(entry.temperatureC()) ? entry.temperatureC()
                : fallback == null ? LibraryEntry.DEFAULT_TEMPERATURE_C : fallback.temperatureC();
        String label = entry.buffer() != null ? entry.buffer() : fallback == null ? "" : fallback.label();
        if (Double.isNaN(pH)) {
            throw new InputException(libraryLabel, 0, "ph", "analyte '" + entry.name()
                    + "' states no buffer pH and no buffer was given for the library");
        }
        if (Double.isNaN(ionicMm)) {
            throw new InputException(libraryLabel, 0, "ionic_strength_mm", "analyte '" + entry.name()
                    + "' states no ionic strength and no buffer was given for the library");
        }
        try {
            return of(label, pH, ionicMm, t);
        } catch (IllegalArgumentException e) {
            throw new InputException(libraryLabel, 0, "ph", "analyte '" + entry.name() + "': " + e.getMessage(), e);
        }
    }

    private static boolean stated(double v) {
        return !Double.isNaN(v);
    }

    /** A fresh builder with nothing set. */
    public static Builder builder() {
        return new Builder();
    }

    /**
     * What a library says about its buffer, as a builder to complete or override.
     *
     * <p>Read from the entries' {@code buffer, ph, ionic_strength_mm, temperature_c} columns
     * (every entry that states a value must agree with the others) and from note lines of the
     * form {@code key: value} or {@code key = value} with the same keys (a note overrides
     * nothing the entries state; it fills what they leave empty, and must agree with them).
     *
     * @param library the library
     * @return a builder holding whatever was found (possibly nothing)
     * @throws InputException when entries (or a note) state different values for the same
     *                        quantity, or a note value is not a number; the message names the
     *                        analytes, so a library of several buffers can be split
     */
    public static Builder fromLibrary(Library library) throws InputException {
        String file = library.sourceFile();
        Builder b = new Builder();
        Agreement pH = new Agreement(file, "ph");
        Agreement ionic = new Agreement(file, "ionic_strength_mm");
        Agreement temp = new Agreement(file, "temperature_c");
        String label = null;
        String labelFrom = null;
        for (LibraryEntry e : library.entries()) {
            pH.offer(e.pH(), "analyte '" + e.name() + "'");
            ionic.offer(e.ionicStrengthMm(), "analyte '" + e.name() + "'");
            temp.offer(e.temperatureC(), "analyte '" + e.name() + "'");
            if (e.buffer() != null) {
                if (label != null && !label.equals(e.buffer())) {
                    throw new InputException(file, 0, "buffer", "the library mixes buffers: '" + label + "' ("
                            + labelFrom + ") and '" + e.buffer() + "' (analyte '" + e.name()
                            + "'); recheck one buffer at a time");
                }
                label = e.buffer();
                labelFrom = "analyte '" + e.name() + "'";
            }
        }
        int noteNumber = 0;
        for (String note : library.notes()) {
            noteNumber++;
            Matcher m = NOTE.matcher(note);
            if (!m.matches()) {
                continue;
            }
            String key = m.group(1).toLowerCase(Locale.ROOT);
            String value = m.group(2);
            String where = "note " + noteNumber;
            switch (key) {
                case "buffer" -> {
                    if (label == null) {
                        label = value;
                    }
                }
                case "ph" -> pH.offer(noteNumber(file, key, value), where);
                case "ionic_strength_mm" -> ionic.offer(noteNumber(file, key, value), where);
                default -> temp.offer(noteNumber(file, key, value), where);
            }
        }
        b.label = label;
        b.pH = pH.value;
        b.ionicStrengthMm = ionic.value;
        b.temperatureC = temp.value;
        return b;
    }

    private static double noteNumber(String file, String key, String value) throws InputException {
        try {
            double v = Double.parseDouble(value.replace('\u2212', '-'));
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InputException(file, 0, key, "the note '" + key + "' should hold a number, got '" + value + "'");
    }

    /** Collects the stated values of one quantity and insists they agree. */
    private static final class Agreement {
        private final String file;
        private final String field;
        private double value = Double.NaN;
        private String from;

        Agreement(String file, String field) {
            this.file = file;
            this.field = field;
        }

        void offer(double v, String where) throws InputException {
            if (Double.isNaN(v)) {
                return;
            }
            if (Double.isNaN(value)) {
                value = v;
                from = where;
            } else if (Math.abs(v - value) > SAME_VALUE_TOLERANCE) {
                throw new InputException(file, 0, field, "the library states two values of " + field + ": "
                        + value + " (" + from + ") and " + v + " (" + where + "); recheck one buffer at a time");
            }
        }
    }

    /**
     * Collects the parts of a buffer from several places (a library, options) and validates them
     * on {@link #build()}. Not thread-safe; the built {@link BufferSpec} is immutable.
     */
    public static final class Builder {
        private String label;
        private double pH = Double.NaN;
        private double ionicStrengthMm = Double.NaN;
        private double temperatureC = Double.NaN;

        private Builder() {
        }

        public Builder label(String value) {
            this.label = value;
            return this;
        }

        public Builder pH(double value) {
            this.pH = value;
            return this;
        }

        public Builder ionicStrengthMm(double value) {
            this.ionicStrengthMm = value;
            return this;
        }

        public Builder ionicStrengthMolar(double value) {
            this.ionicStrengthMm = value * MM_PER_MOLAR;
            return this;
        }

        public Builder temperatureC(double value) {
            this.temperatureC = value;
            return this;
        }

        /** Takes every value that {@code other} has set (NaN/null values leave this one's alone). */
        public Builder override(Builder other) {
            if (other.label != null) {
                label = other.label;
            }
            if (!Double.isNaN(other.pH)) {
                pH = other.pH;
            }
            if (!Double.isNaN(other.ionicStrengthMm)) {
                ionicStrengthMm = other.ionicStrengthMm;
            }
            if (!Double.isNaN(other.temperatureC)) {
                temperatureC = other.temperatureC;
            }
            return this;
        }

        /** The names of the values still missing for {@link #build()} (pH, ionic strength). */
        public List<String> missing() {
            List<String> out = new ArrayList<>();
            if (Double.isNaN(pH)) {
                out.add("ph");
            }
            if (Double.isNaN(ionicStrengthMm)) {
                out.add("ionic_strength_mm");
            }
            return out;
        }

        /**
         * The buffer. A temperature set nowhere is 25 °C ({@link LibraryEntry#DEFAULT_TEMPERATURE_C}).
         *
         * @throws IllegalArgumentException when the pH or the ionic strength is missing, or a value
         *                                  is out of range; the message names them
         */
        public BufferSpec build() {
            List<String> missing = missing();
            if (!missing.isEmpty()) {
                throw new IllegalArgumentException("the buffer needs " + String.join(" and ", missing));
            }
            double t = Double.isNaN(temperatureC) ? LibraryEntry.DEFAULT_TEMPERATURE_C : temperatureC;
            return of(label, pH, ionicStrengthMm, t);
        }
    }
}
