package org.mobident.trace.io;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A minimal writer of netCDF classic (CDF-1) and 64-bit offset (CDF-2) files for tests, written from
 * Unidata, "The NetCDF Classic Format Specification" (netCDF-C docs, Appendix B): header
 * {@code magic numrecs dim_list gatt_list var_list}, big-endian, names and values padded to 4 bytes
 * (data padding with the type's fill value), non-record data contiguous in header order, then the
 * records with one slab of each record variable per record (no padding when there is a single record
 * variable). It records the byte offset of every header field it writes so tests can damage one
 * field and check the reported offset.
 */
final class NetcdfTestWriter {

    static final int BYTE = 1;
    static final int CHAR = 2;
    static final int SHORT = 3;
    static final int INT = 4;
    static final int FLOAT = 5;
    static final int DOUBLE = 6;

    /** An attribute: text when {@code type == CHAR}. */
    record Att(String name, int type, String text, double[] values) {
    }

    private record Dim(String name, int length) {
    }

    private record Var(String name, int type, String[] dims, double[] values, Att[] atts) {
    }

    /** The bytes and the offsets of the header fields, keyed as documented on {@link #write()}. */
    record Written(byte[] bytes, Map<String, Long> offsets) {
        long at(String key) {
            Long v = offsets.get(key);
            if (v == null) {
                throw new IllegalArgumentException("no offset recorded for " + key + "; known: " + offsets.keySet());
            }
            return v;
        }

        /** A copy with the big-endian int at {@code key} replaced. */
        byte[] withInt(String key, int value) {
            byte[] b = bytes.clone();
            int i = (int) at(key);
            b[i] = (byte) (value >>> 24);
            b[i + 1] = (byte) (value >>> 16);
            b[i + 2] = (byte) (value >>> 8);
            b[i + 3] = (byte) value;
            return b;
        }

        /** The first {@code n} bytes. */
        byte[] truncated(long n) {
            return Arrays.copyOf(bytes, (int) n);
        }
    }

    private final int version;
    private final List<Dim> dims = new ArrayList<>();
    private final List<Att> globals = new ArrayList<>();
    private final List<Var> vars = new ArrayList<>();

    /** @param version 1 (classic) or 2 (64-bit offset) */
    NetcdfTestWriter(int version) {
        this.version = version;
    }

    static Att text(String name, String value) {
        return new Att(name, CHAR, value, null);
    }

    static Att number(String name, int type, double... values) {
        return new Att(name, type, null, values);
    }

    /** Adds a dimension; length 0 declares the record dimension. */
    NetcdfTestWriter dim(String name, int length) {
        dims.add(new Dim(name, length));
        return this;
    }

    NetcdfTestWriter global(Att att) {
        globals.add(att);
        return this;
    }

    /** Adds a variable; for a record variable {@code values} holds all records, record after record. */
    NetcdfTestWriter var(String name, int type, String[] dimNames, double[] values, Att... atts) {
        vars.add(new Var(name, type, dimNames, values, atts));
        return this;
    }

    /** Adds a scalar variable. */
    NetcdfTestWriter scalar(String name, int type, double value, Att... atts) {
        return var(name, type, new String[0], new double[] {value}, atts);
    }

    /**
     * Writes the file. Offset keys: {@code numrecs}, {@code dim_list}, {@code gatt_list}, {@code var_list},
     * {@code header_end}, {@code dim.N}, {@code dim.N.length}, {@code gatt.N}, {@code gatt.N.type},
     * {@code gatt.N.nelems}, {@code var.N}, {@code var.N.rank}, {@code var.N.dimid0}, {@code var.N.type},
     * {@code var.N.vsize}, {@code var.N.begin} (the field) and {@code data.N} (the data).
     */
    Written write() {
        Map<String, Long> at = new LinkedHashMap<>();
        int recordDim = -1;
        for (int i = 0; i < dims.size(); i++) {
            if (dims.get(i).length() == 0) {
                recordDim = i;
            }
        }
        int numrecs = 0;
        int recordVars = 0;
        for (Var v : vars) {
            if (isRecord(v, recordDim)) {
                recordVars++;
                numrecs = Math.max(numrecs, (int) (v.values().length / perRecord(v)));
            }
        }

        Out h = new Out();
        h.bytes(new byte[] {'C', 'D', 'F', (byte) version});
        at.put("numrecs", (long) h.size());
        h.i32(numrecs);
        at.put("dim_list", (long) h.size());
        if (dims.isEmpty()) {
            h.i32(0);
            h.i32(0);
        } else {
            h.i32(0x0A);
            h.i32(dims.size());
            for (Dim d : dims) {
                at.put("dim." + d.name(), (long) h.size());
                h.name(d.name());
                at.put("dim." + d.name() + ".length", (long) h.size());
                h.i32(d.length());
            }
        }
        at.put("gatt_list", (long) h.size());
        attributes(h, globals, "gatt.", at);
        at.put("var_list", (long) h.size());
        if (vars.isEmpty()) {
            h.i32(0);
            h.i32(0);
        } else {
            h.i32(0x0B);
            h.i32(vars.size());
        }
        Map<String, Integer> beginField = new LinkedHashMap<>();
        for (Var v : vars) {
            at.put("var." + v.name(), (long) h.size());
            h.name(v.name());
            at.put("var." + v.name() + ".rank", (long) h.size());
            h.i32(v.dims().length);
            for (int k = 0; k < v.dims().length; k++) {
                at.put("var." + v.name() + ".dimid" + k, (long) h.size());
                h.i32(dimId(v.dims()[k]));
            }
            attributes(h, Arrays.asList(v.atts()), "var." + v.name() + ".att.", at);
            at.put("var." + v.name() + ".type", (long) h.size());
            h.i32(v.type());
            at.put("var." + v.name() + ".vsize", (long) h.size());
            h.i32((int) pad4(perRecord(v) * size(v.type())));
            at.put("var." + v.name() + ".begin", (long) h.size());
            beginField.put(v.name(), h.size());
            if (version == 1) {
                h.i32(0);
            } else {
                h.i64(0);
            }
        }
        long headerEnd = h.size();
        at.put("header_end", headerEnd);

        // offsets of the data
        long next = headerEnd;
        Map<String, Long> begin = new LinkedHashMap<>();
        for (Var v : vars) {
            if (!isRecord(v, recordDim)) {
                begin.put(v.name(), next);
                next += pad4(perRecord(v) * size(v.type()));
            }
        }
        long recordStart = next;
        long recSize = 0;
        for (Var v : vars) {
            if (isRecord(v, recordDim)) {
                begin.put(v.name(), recordStart + recSize);
                long slab = perRecord(v) * size(v.type());
                recSize += recordVars == 1 ? slab : pad4(slab);
            }
        }
        for (Var v : vars) {
            long b = begin.get(v.name());
            at.put("data." + v.name(), b);
            h.patch(beginField.get(v.name()), b, version == 1 ? 4 : 8);
        }

        Out d = h;
        for (Var v : vars) {
            if (!isRecord(v, recordDim)) {
                d.values(v.values(), 0, v.values().length, v.type());
                d.fillPad(v.type());
            }
        }
        for (int r = 0; r < numrecs; r++) {
            for (Var v : vars) {
                if (isRecord(v, recordDim)) {
                    int per = (int) perRecord(v);
                    d.values(v.values(), r * per, per, v.type());
                    if (recordVars > 1) {
                        d.fillPad(v.type());
                    }
                }
            }
        }
        return new Written(d.toByteArray(), at);
    }

    private void attributes(Out h, List<Att> atts, String prefix, Map<String, Long> at) {
        if (atts.isEmpty()) {
            h.i32(0);
            h.i32(0);
            return;
        }
        h.i32(0x0C);
        h.i32(atts.size());
        for (Att a : atts) {
            at.put(prefix + a.name(), (long) h.size());
            h.name(a.name());
            at.put(prefix + a.name() + ".type", (long) h.size());
            h.i32(a.type());
            at.put(prefix + a.name() + ".nelems", (long) h.size());
            if (a.type() == CHAR) {
                byte[] b = a.text().getBytes(StandardCharsets.UTF_8);
                h.i32(b.length);
                h.bytes(b);
                h.zeroPad();
            } else {
                h.i32(a.values().length);
                h.values(a.values(), 0, a.values().length, a.type());
                h.zeroPad();
            }
        }
    }

    private boolean isRecord(Var v, int recordDim) {
        return recordDim >= 0 && v.dims().length > 0 && dimId(v.dims()[0]) == recordDim;
    }

    private long perRecord(Var v) {
        long p = 1;
        for (String n : v.dims()) {
            int len = dims.get(dimId(n)).length();
            if (len != 0) {
                p *= len;
            }
        }
        return p;
    }

    private int dimId(String name) {
        for (int i = 0; i < dims.size(); i++) {
            if (dims.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no dimension " + name);
    }

    static int size(int type) {
        switch (type) {
            case BYTE:
            case CHAR:
                return 1;
            case SHORT:
                return 2;
            case DOUBLE:
                return 8;
            default:
                return 4;
        }
    }

    static long pad4(long n) {
        return (n + 3) & ~3L;
    }

    /** A growing big-endian byte buffer. */
    private static final class Out extends ByteArrayOutputStream {
        void i32(int v) {
            write(v >>> 24);
            write(v >>> 16);
            write(v >>> 8);
            write(v);
        }

        void i64(long v) {
            i32((int) (v >>> 32));
            i32((int) v);
        }

        void bytes(byte[] b) {
            write(b, 0, b.length);
        }

        void name(String name) {
            byte[] b = name.getBytes(StandardCharsets.UTF_8);
            i32(b.length);
            bytes(b);
            zeroPad();
        }

        void zeroPad() {
            while (size() % 4 != 0) {
                write(0);
            }
        }

        /** Pads with the type's fill bytes (spec: FILL_BYTE \x81, FILL_CHAR \x00, FILL_SHORT \x80 \x01). */
        void fillPad(int type) {
            while (size() % 4 != 0) {
                if (type == SHORT) {
                    write(0x80);
                    write(0x01);
                } else {
                    write(type == BYTE ? 0x81 : 0);
                }
            }
        }

        void values(double[] v, int from, int n, int type) {
            for (int i = from; i < from + n; i++) {
                double x = v[i];
                switch (type) {
                    case BYTE:
                    case CHAR:
                        write((int) x);
                        break;
                    case SHORT:
                        write((int) x >>> 8);
                        write((int) x);
                        break;
                    case INT:
                        i32((int) x);
                        break;
                    case FLOAT:
                        i32(Float.floatToRawIntBits((float) x));
                        break;
                    default:
                        i64(Double.doubleToRawLongBits(x));
                        break;
                }
            }
        }

        void patch(int position, long value, int width) {
            for (int k = 0; k < width; k++) {
                buf[position + k] = (byte) (value >>> (8 * (width - 1 - k)));
            }
        }
    }
}
