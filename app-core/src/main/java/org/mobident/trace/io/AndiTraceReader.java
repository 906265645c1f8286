package org.mobident.trace.io;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;

import org.mobident.InputException;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/**
 * Reads a detector trace from a chromatography interchange file: the netCDF-based "Analytical Data
 * Interchange Protocol for Chromatographic Data" (ASTM E1947, data definitions; ASTM E1948, guide and
 * netCDF template; formerly the AIA/ANDI format), in netCDF classic or 64-bit offset form
 * (see {@link NetcdfClassicFile}).
 *
 * <p>What is read (raw data, "data class 1"):
 * <ul>
 *   <li>the signal: variable {@value #SIGNAL} on dimension {@code point_number} (any numeric type; its
 *       unit, global attribute {@code detector_unit}, is not needed here);</li>
 *   <li>the times: variable {@value #RETENTION} when present (irregular sampling); otherwise
 *       {@code t[i] = actual_delay_time + i · actual_sampling_interval}, the first point at the delay
 *       time. These two are scalar variables in the standard template; a global attribute or an
 *       attribute of {@value #SIGNAL} of the same name is accepted too. A missing delay means 0.
 *       A float value is widened through its shortest decimal form, so a stored 0.05f gives 0.05;</li>
 *   <li>the time unit: global attribute {@code retention_unit}, else the {@code units} attribute of the
 *       time variable, else seconds ({@code s, sec, second(s), min, minute(s), ms, h, hour(s)},
 *       any case). {@link TraceReadOptions#timeScale()} overrides it.</li>
 * </ul>
 * {@link TraceReadOptions#signalColumn()} and {@link TraceReadOptions#timeColumn()} name other
 * variables to use instead of {@value #SIGNAL} and {@value #RETENTION}.
 *
 * <p>Values equal to the variable's {@code _FillValue}, or to the netCDF default fill of a float or
 * double variable, were never written and are refused, as are NaN and infinite values and times that
 * do not strictly increase. Every problem is an {@link InputException} with line 0, the variable or
 * attribute as field, and "at byte N" in the message.
 */
public final class AndiTraceReader {

    /** The signal variable of the interchange format. */
    static final String SIGNAL = "ordinate_values";
    /** The optional time variable of the interchange format. */
    static final String RETENTION = "raw_data_retention";
    static final String SAMPLING_INTERVAL = "actual_sampling_interval";
    static final String DELAY_TIME = "actual_delay_time";
    static final String RETENTION_UNIT = "retention_unit";
    static final String UNIFORM_SAMPLING = "uniform_sampling_flag";
    /** Variables of the mass-spectrometry interchange format, to say so when one is given. */
    private static final String MS_INTENSITY = "intensity_values";
    /** Most variable names listed in a message. */
    private static final int MAX_LISTED_NAMES = 20;

    private AndiTraceReader() {
    }

    /** Reads {@code file} with everything decided from the file. */
    public static Trace read(Path file, String displayName) throws InputException {
        return read(file, displayName, TraceReadOptions.DEFAULT);
    }

    /**
     * Reads {@code file}; the trace is named {@link RunSpec#runNameOf(Path)}.
     *
     * @param displayName how messages and {@link Trace#sourceFile()} name the file
     * @param options     time unit and variable names; {@code null} means {@link TraceReadOptions#DEFAULT}
     */
    public static Trace read(Path file, String displayName, TraceReadOptions options) throws InputException {
        if (Files.isDirectory(file)) {
            throw new InputException(displayName, 0, null, "is a folder, not a file");
        }
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.READ)) {
            NetcdfClassicFile nc = NetcdfClassicFile.parse(NetcdfClassicFile.Source.of(channel), displayName);
            return toTrace(nc, RunSpec.runNameOf(file), options);
        } catch (NoSuchFileException e) {
            throw new InputException(displayName, 0, null, "file not found", e);
        } catch (AccessDeniedException e) {
            throw new InputException(displayName, 0, null, "cannot be read (access denied)", e);
        } catch (IOException e) {
            throw new InputException(displayName, 0, null, "cannot be read: " + e.getMessage(), e);
        }
    }

    /**
     * Reads a file already in memory (not modified).
     *
     * @param name        trace (run) name
     * @param displayName file name for messages and {@link Trace#sourceFile()}
     */
    public static Trace parse(byte[] bytes, String name, String displayName, TraceReadOptions options)
            throws InputException {
        return toTrace(NetcdfClassicFile.parse(bytes, displayName), name, options);
    }

    private static Trace toTrace(NetcdfClassicFile nc, String name, TraceReadOptions options)
            throws InputException {
        TraceReadOptions o = options == null ? TraceReadOptions.DEFAULT : options;
        String file = nc.file();
        String signalName = o.signalColumn() != null ? o.signalColumn().trim() : SIGNAL;
        NetcdfClassicFile.Variable y = nc.variable(signalName);
        if (y == null) {
            throw missingSignal(nc, signalName);
        }
        requireVector(nc, y);
        double[] signal = nc.readDoubles(y);
        int n = signal.length;
        if (n < 2) {
            throw NetcdfClassicFile.located(file, y.offset(), signalName, "variable '" + signalName
                    + "' declared at byte " + y.offset() + " has " + (n == 0 ? "no points" : "a single point")
                    + "; a trace needs at least two");
        }
        requireWritten(nc, y, signal);

        String timeName = o.timeColumn() != null ? o.timeColumn().trim() : RETENTION;
        NetcdfClassicFile.Variable tv = nc.variable(timeName);
        if (tv == null && o.timeColumn() != null) {
            throw NetcdfClassicFile.located(file, nc.variableListOffset(), timeName, "the variable list at byte "
                    + nc.variableListOffset() + " has no variable '" + timeName + "' (named as the time column)");
        }
        double toSeconds = o.timeScale() != null ? o.timeScale().toSeconds(1.0) : secondsPerUnit(nc, tv);
        double[] times = tv != null ? timesFromVariable(nc, tv, y, n, toSeconds)
                : timesFromSampling(nc, y, n, toSeconds);
        return new Trace(name, file, times, signal);
    }

    private static InputException missingSignal(NetcdfClassicFile nc, String signalName) {
        StringBuilder present = new StringBuilder();
        int listed = 0;
        for (NetcdfClassicFile.Variable v : nc.variables()) {
            if (listed == MAX_LISTED_NAMES) {
                present.append(", …");
                break;
            }
            present.append(listed == 0 ? "" : ", ").append(v.name());
            listed++;
        }
        String hint = nc.variable(MS_INTENSITY) != null
                ? "; this looks like a mass-spectrometry interchange file, which is not supported"
                : "; this is not a chromatography interchange (ASTM E1947) raw-data file";
        return NetcdfClassicFile.located(nc.file(), nc.variableListOffset(), signalName, "the variable list at byte "
                + nc.variableListOffset() + " has no variable '" + signalName + "'" + hint + "; variables present: "
                + (listed == 0 ? "none" : present.toString()));
    }

    private static void requireVector(NetcdfClassicFile nc, NetcdfClassicFile.Variable v) throws InputException {
        if (v.rank() != 1) {
            throw NetcdfClassicFile.located(nc.file(), v.offset(), v.name(), "variable '" + v.name()
                    + "' declared at byte " + v.offset() + " has " + v.rank()
                    + " dimensions; expected one (point_number)");
        }
        if (v.type() == NetcdfClassicFile.NcType.CHAR) {
            throw NetcdfClassicFile.located(nc.file(), v.offset(), v.name(), "variable '" + v.name()
                    + "' declared at byte " + v.offset() + " holds text (NC_CHAR), not numbers");
        }
    }

    /** Refuses NaN, infinite and fill values. */
    private static void requireWritten(NetcdfClassicFile nc, NetcdfClassicFile.Variable v, double[] values)
            throws InputException {
        double fill = fillValue(v);
        for (int i = 0; i < values.length; i++) {
            double x = values[i];
            if (!Double.isFinite(x) || x == fill) {
                long at = nc.offsetOf(v, i);
                String what = Double.isNaN(x) ? "NaN" : Double.isInfinite(x) ? "an infinite value"
                        : "the fill value " + x + " (never written)";
                throw NetcdfClassicFile.located(nc.file(), at, v.name(), "point " + (i + 1) + " of '" + v.name()
                        + "' at byte " + at + " is " + what + "; values must be finite numbers");
            }
        }
    }

    /**
     * The value marking unwritten data: {@code _FillValue}, else the default fill of a float or double
     * variable (spec, "Note on fill values"), else NaN (matches nothing). The defaults of the integer
     * types are not used, as they are ordinary numbers for a detector.
     */
    private static double fillValue(NetcdfClassicFile.Variable v) {
        NetcdfClassicFile.Attribute a = v.attribute("_FillValue");
        if (a != null && !a.isText() && a.values().length == 1) {
            return a.values()[0];
        }
        NetcdfClassicFile.NcType t = v.type();
        return t == NetcdfClassicFile.NcType.FLOAT || t == NetcdfClassicFile.NcType.DOUBLE ? t.defaultFill
                : Double.NaN;
    }

    private static double[] timesFromVariable(NetcdfClassicFile nc, NetcdfClassicFile.Variable tv,
            NetcdfClassicFile.Variable y, int n, double toSeconds) throws InputException {
        requireVector(nc, tv);
        long count = nc.valueCount(tv);
        if (count != n) {
            throw NetcdfClassicFile.located(nc.file(), tv.offset(), tv.name(), "variable '" + tv.name()
                    + "' declared at byte " + tv.offset() + " has " + count + " values but '" + y.name() + "' has "
                    + n);
        }
        double[] raw = nc.readDoubles(tv);
        requireWritten(nc, tv, raw);
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = raw[i] * toSeconds;
            if (!Double.isFinite(t[i])) {
                long at = nc.offsetOf(tv, i);
                throw NetcdfClassicFile.located(nc.file(), at, tv.name(), "time " + raw[i] + " of point " + (i + 1)
                        + " at byte " + at + " is too large to be converted to seconds");
            }
            if (i > 0 && !(t[i] > t[i - 1])) {
                long at = nc.offsetOf(tv, i);
                throw NetcdfClassicFile.located(nc.file(), at, tv.name(), "time " + raw[i] + " of point " + (i + 1)
                        + " at byte " + at + (raw[i] == raw[i - 1] ? " repeats" : " is before")
                        + " the previous time " + raw[i - 1] + "; times must strictly increase");
            }
        }
        return t;
    }

    private static double[] timesFromSampling(NetcdfClassicFile nc, NetcdfClassicFile.Variable y, int n,
            double toSeconds) throws InputException {
        NetcdfClassicFile.Attribute uniform = nc.globalAttribute(UNIFORM_SAMPLING);
        Scalar interval = scalar(nc, y, SAMPLING_INTERVAL);
        if (interval == null) {
            String why = uniform != null && uniform.isText() && uniform.text().trim().toUpperCase(Locale.ROOT)
                    .startsWith("N") ? "the file says sampling is not uniform (" + UNIFORM_SAMPLING + " '"
                    + uniform.text().trim() + "') but has no '" + RETENTION + "' times"
                    : "the file has neither '" + RETENTION + "' times nor '" + SAMPLING_INTERVAL + "'";
            throw NetcdfClassicFile.located(nc.file(), nc.variableListOffset(), SAMPLING_INTERVAL, why
                    + " (variable list at byte " + nc.variableListOffset() + "); the time axis is unknown");
        }
        if (!(interval.value > 0) || !Double.isFinite(interval.value)) {
            throw NetcdfClassicFile.located(nc.file(), interval.offset, SAMPLING_INTERVAL, SAMPLING_INTERVAL + " "
                    + interval.value + " at byte " + interval.offset + " must be a positive finite number");
        }
        Scalar delay = scalar(nc, y, DELAY_TIME);
        double delayValue = delay == null ? 0.0 : delay.value;
        if (delay != null && !Double.isFinite(delay.value)) {
            throw NetcdfClassicFile.located(nc.file(), delay.offset, DELAY_TIME, DELAY_TIME + " " + delay.value
                    + " at byte " + delay.offset + " must be a finite number");
        }
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = (delayValue + i * interval.value) * toSeconds;
            if (!Double.isFinite(t[i]) || (i > 0 && !(t[i] > t[i - 1]))) {
                throw NetcdfClassicFile.located(nc.file(), interval.offset, SAMPLING_INTERVAL, SAMPLING_INTERVAL
                        + " " + interval.value + " (at byte " + interval.offset + ") with delay " + delayValue
                        + " gives no strictly increasing finite time at point " + (i + 1));
            }
        }
        return t;
    }

    /** A scalar setting and where it was found. */
    private record Scalar(double value, long offset) {
    }

    /**
     * A scalar from a variable, a global attribute, or an attribute of the signal variable, in that
     * order; {@code null} when none exists.
     */
    private static Scalar scalar(NetcdfClassicFile nc, NetcdfClassicFile.Variable y, String name)
            throws InputException {
        NetcdfClassicFile.Variable v = nc.variable(name);
        if (v != null) {
            if (v.type() == NetcdfClassicFile.NcType.CHAR) {
                throw NetcdfClassicFile.located(nc.file(), v.offset(), name, "variable '" + name + "' declared at byte "
                        + v.offset() + " holds text, not a number");
            }
            long count = nc.valueCount(v);
            if (count != 1) {
                throw NetcdfClassicFile.located(nc.file(), v.offset(), name, "variable '" + name
                        + "' declared at byte " + v.offset() + " has " + count + " values; expected one");
            }
            double value = nc.readDoubles(v)[0];
            if (value == fillValue(v)) {
                throw NetcdfClassicFile.located(nc.file(), v.begin(), name, "variable '" + name + "' at byte "
                        + v.begin() + " holds the fill value (it was never written)");
            }
            return new Scalar(widen(value, v.type()), v.begin());
        }
        NetcdfClassicFile.Attribute a = nc.globalAttribute(name);
        if (a == null) {
            a = y.attribute(name);
        }
        return a == null ? null : new Scalar(attributeNumber(nc, a), a.offset());
    }

    private static double attributeNumber(NetcdfClassicFile nc, NetcdfClassicFile.Attribute a)
            throws InputException {
        if (a.isText()) {
            String text = a.text().trim();
            try {
                return Double.parseDouble(text);
            } catch (NumberFormatException e) {
                throw NetcdfClassicFile.located(nc.file(), a.offset(), a.name(), "attribute '" + a.name()
                        + "' at byte " + a.offset() + " is '" + text + "', not a number");
            }
        }
        double[] values = a.values();
        if (values.length != 1) {
            throw NetcdfClassicFile.located(nc.file(), a.offset(), a.name(), "attribute '" + a.name() + "' at byte "
                    + a.offset() + " has " + values.length + " values; expected one");
        }
        return widen(values[0], a.type());
    }

    /** A float through its shortest decimal form (so 0.05f is 0.05); other types unchanged. */
    private static double widen(double value, NetcdfClassicFile.NcType type) {
        if (type == NetcdfClassicFile.NcType.FLOAT && Double.isFinite(value)) {
            return Double.parseDouble(Float.toString((float) value));
        }
        return value;
    }

    /** Seconds per unit of the stored times, from {@code retention_unit} or the time variable's units. */
    private static double secondsPerUnit(NetcdfClassicFile nc, NetcdfClassicFile.Variable tv)
            throws InputException {
        NetcdfClassicFile.Attribute a = nc.globalAttribute(RETENTION_UNIT);
        if (a == null && tv != null) {
            a = tv.attribute("units");
        }
        if (a == null || !a.isText() || a.text().trim().isEmpty()) {
            return 1.0;
        }
        double s = secondsPer(a.text());
        if (Double.isNaN(s)) {
            throw NetcdfClassicFile.located(nc.file(), a.offset(), a.name(), "time unit '" + a.text().trim()
                    + "' (attribute at byte " + a.offset() + ") is not supported; expected seconds or minutes, or "
                    + "give the time unit in the options");
        }
        return s;
    }

    /** Seconds in one of the named unit, or NaN when unknown. */
    static double secondsPer(String unit) {
        String u = unit.trim().toLowerCase(Locale.ROOT);
        if (u.endsWith(".")) {
            u = u.substring(0, u.length() - 1);
        }
        switch (u) {
            case "s":
            case "sec":
            case "secs":
            case "second":
            case "seconds":
                return 1.0;
            case "min":
            case "mins":
            case "minute":
            case "minutes":
                return 60.0;
            case "ms":
            case "msec":
            case "millisecond":
            case "milliseconds":
                return 1e-3;
            case "h":
            case "hr":
            case "hour":
            case "hours":
                return 3600.0;
            default:
                return Double.NaN;
        }
    }
}
