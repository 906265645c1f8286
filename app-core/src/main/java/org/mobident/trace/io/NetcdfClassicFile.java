package org.mobident.trace.io;

import java.io.EOFException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.mobident.InputException;
import org.mobident.io.TextFiles;

/**
 * A small, strict reader of the netCDF <em>classic</em> binary format: version 1 ("CDF-1", classic)
 * and version 2 ("CDF-2", 64-bit offset). It follows the grammar of Unidata, "The NetCDF Classic
 * Format Specification" (netCDF-C documentation, Appendix B "File Format Specifications"), which is
 * what the chromatography interchange files of ASTM E1947 / E1948 are written in:
 *
 * <pre>
 *   header  = magic numrecs dim_list gatt_list var_list
 *   magic   = 'C' 'D' 'F' VERSION            VERSION = \x01 (classic) | \x02 (64-bit offset)
 *   dim     = name dim_length                (dim_length 0 = the record dimension)
 *   attr    = name nc_type nelems [values]   (values padded to 4 bytes)
 *   var     = name nelems [dimid] vatt_list nc_type vsize begin   (begin: 32 bit in CDF-1, 64 bit in CDF-2)
 *   nc_type = 1 byte | 2 char | 3 short | 4 int | 5 float | 6 double     all big-endian
 * </pre>
 *
 * Record variables (first dimension the record dimension) are stored interleaved, one slab of
 * each record variable per record; the record size is the sum of the record variables' padded slab
 * sizes, except that a single record variable is stored without padding (spec, "Note on padding").
 * The {@code vsize} field is redundant (spec, "Note on vsize"): it is read but sizes are computed
 * from the dimensions. A {@code numrecs} of {@code 0xFFFFFFFF} ("streaming") is resolved from the file length.
 *
 * <p>Strictness: every count, length and offset read from the file is checked before it is used,
 * against the bytes that remain in the file and against the caps below, so a corrupt header cannot
 * cause a huge allocation or a read past the end. Data extents are checked when a variable is read, so
 * a damaged variable the caller does not need does not stop it from reading the others. Every problem
 * is an {@link InputException} with line 0, the field (variable, attribute, dimension or header
 * field name) and a message that says "at byte N". Header padding bytes are not checked.
 *
 * <p>Not supported: CDF-5 (64-bit data) and netCDF-4 (HDF5) files; both are recognised and refused
 * with a message saying so.
 */
final class NetcdfClassicFile {

    /** The external data types of the classic format with their size in bytes. */
    enum NcType {
        BYTE(1, 1, -127.0),
        CHAR(2, 1, 0.0),
        SHORT(3, 2, -32767.0),
        INT(4, 4, -2147483647.0),
        FLOAT(5, 4, (double) 9.9692099683868690e+36f),
        DOUBLE(6, 8, 9.9692099683868690e+36);

        final int code;
        final int size;
        /** Default fill value (spec, FILL_BYTE … FILL_DOUBLE), as the double a read gives. */
        final double defaultFill;

        NcType(int code, int size, double defaultFill) {
            this.code = code;
            this.size = size;
            this.defaultFill = defaultFill;
        }

        /** The type for a code, or {@code null}. */
        static NcType of(int code) {
            for (NcType t : values()) {
                if (t.code == code) {
                    return t;
                }
            }
            return null;
        }

        String label() {
            return "NC_" + name();
        }
    }

    /**
     * A dimension.
     *
     * @param name   its name
     * @param length its length; for the record dimension the number of records
     * @param record whether it is the record (unlimited) dimension
     */
    record Dimension(String name, int length, boolean record) {
    }

    /** An attribute: text (type char) or numbers (every other type). */
    static final class Attribute {
        private final String name;
        private final NcType type;
        private final String text;
        private final double[] values;
        private final long offset;

        Attribute(String name, NcType type, String text, double[] values, long offset) {
            this.name = name;
            this.type = type;
            this.text = text;
            this.values = values;
            this.offset = offset;
        }

        String name() {
            return name;
        }

        NcType type() {
            return type;
        }

        boolean isText() {
            return type == NcType.CHAR;
        }

        /** The text of a char attribute, trailing NULs removed; {@code null} for numbers. */
        String text() {
            return text;
        }

        /** A copy of the values of a numeric attribute; empty for text. */
        double[] values() {
            return values.clone();
        }

        /** Byte offset of the attribute's entry in the header. */
        long offset() {
            return offset;
        }

        @Override
        public String toString() {
            return name + "=" + (isText() ? "\"" + text + "\"" : Arrays.toString(values));
        }
    }

    /** A variable as declared in the header. */
    static final class Variable {
        private final String name;
        private final List<Dimension> dimensions;
        private final List<Attribute> attributes;
        private final NcType type;
        private final long begin;
        private final boolean record;
        private final long valuesPerRecord;
        private final long offset;

        Variable(String name, List<Dimension> dimensions, List<Attribute> attributes, NcType type, long begin,
                boolean record, long valuesPerRecord, long offset) {
            this.name = name;
            this.dimensions = List.copyOf(dimensions);
            this.attributes = List.copyOf(attributes);
            this.type = type;
            this.begin = begin;
            this.record = record;
            this.valuesPerRecord = valuesPerRecord;
            this.offset = offset;
        }

        String name() {
            return name;
        }

        List<Dimension> dimensions() {
            return dimensions;
        }

        int rank() {
            return dimensions.size();
        }

        List<Attribute> attributes() {
            return attributes;
        }

        /** The attribute of that name, or {@code null}. */
        Attribute attribute(String attributeName) {
            return find(attributes, attributeName);
        }

        NcType type() {
            return type;
        }

        /** File offset of the variable's first value (its {@code begin} field). */
        long begin() {
            return begin;
        }

        /** Whether the first dimension is the record dimension. */
        boolean isRecord() {
            return record;
        }

        /** Byte offset of the variable's entry in the header. */
        long offset() {
            return offset;
        }

        /** Product of the non-record dimension lengths (1 for a scalar). */
        long valuesPerRecord() {
            return valuesPerRecord;
        }
    }

    /** Random access to the bytes of a file. */
    interface Source {
        long size();

        /** Reads exactly {@code length} bytes at {@code position}; the caller keeps within {@link #size()}. */
        void read(long position, byte[] into, int offset, int length) throws IOException;

        static Source of(byte[] bytes) {
            return new Source() {
                @Override
                public long size() {
                    return bytes.length;
                }

                @Override
                public void read(long position, byte[] into, int offset, int length) {
                    System.arraycopy(bytes, (int) position, into, offset, length);
                }
            };
        }

        /** A source over an open channel (not closed here); its size is taken now. */
        static Source of(FileChannel channel) throws IOException {
            long size = channel.size();
            return new Source() {
                @Override
                public long size() {
                    return size;
                }

                @Override
                public void read(long position, byte[] into, int offset, int length) throws IOException {
                    ByteBuffer buffer = ByteBuffer.wrap(into, offset, length);
                    long at = position;
                    while (buffer.hasRemaining()) {
                        int n = channel.read(buffer, at);
                        if (n < 0) {
                            throw new EOFException("the file became shorter while it was read");
                        }
                        at += n;
                    }
                }
            };
        }
    }

    // ---- limits ----

    /** Tags of the header lists (spec: NC_DIMENSION, NC_VARIABLE, NC_ATTRIBUTE; ABSENT is 0). */
    static final int TAG_ABSENT = 0;
    static final int TAG_DIMENSION = 0x0A;
    static final int TAG_VARIABLE = 0x0B;
    static final int TAG_ATTRIBUTE = 0x0C;
    /** {@code numrecs} value meaning "indeterminate, count from the file length" (spec, STREAMING). */
    private static final int STREAMING = -1;
    /** Longest name accepted (NC_MAX_NAME of the netCDF-C library, from memory). */
    static final int MAX_NAME_BYTES = 256;
    /** Largest rank accepted (NC_MAX_VAR_DIMS of the netCDF-C library, from memory). */
    static final int MAX_RANK = 1024;
    /** Largest single attribute value accepted, in bytes; interchange files have short attributes. */
    static final int MAX_ATTRIBUTE_BYTES = 1 << 24;
    /** Largest number of values read from one variable (about 1 GiB of doubles). */
    static final long MAX_VALUES = 1L << 27;
    /** Smallest header entry in bytes: a dimension (name length, one padded name word, length). */
    private static final int MIN_DIMENSION_BYTES = 12;
    /** Smallest attribute entry: name length, one name word, type, count. */
    private static final int MIN_ATTRIBUTE_BYTES = 16;
    /** Smallest variable entry: name (8), rank, ABSENT attribute list (8), type, vsize, begin. */
    private static final int MIN_VARIABLE_BYTES = 32;
    /** Bytes read from the file at a time. */
    private static final int WINDOW_BYTES = 1 << 16;
    /** Length of the format signature: 'C' 'D' 'F' and the version byte. */
    private static final int MAGIC_BYTES = 4;
    /** The HDF5 superblock signature that starts a netCDF-4 file (HDF5 File Format Specification). */
    private static final byte[] HDF5_SIGNATURE = {(byte) 0x89, 'H', 'D', 'F', '\r', '\n', 0x1A, '\n'};
    /** Offsets where an HDF5 superblock may sit after a user block (0, 512, 1024, 2048, …; HDF5 spec). */
    private static final long[] HDF5_SIGNATURE_OFFSETS = {0, 512, 1024, 2048, 4096};
    /** Header bytes quoted back in a message about a wrong signature. */
    private static final int QUOTED_MAGIC_BYTES = 8;

    // ---- the parsed file ----

    private final String file;
    private final Source source;
    private final Window window;
    private final int version;
    private final long numRecords;
    private final long recordSize;
    private final long headerEnd;
    private final long variableListOffset;
    private final List<Dimension> dimensions;
    private final List<Attribute> globalAttributes;
    private final List<Variable> variables;

    private NetcdfClassicFile(String file, Source source, Window window, int version, long numRecords,
            long recordSize, long headerEnd, long variableListOffset, List<Dimension> dimensions,
            List<Attribute> globalAttributes, List<Variable> variables) {
        this.file = file;
        this.source = source;
        this.window = window;
        this.version = version;
        this.numRecords = numRecords;
        this.recordSize = recordSize;
        this.headerEnd = headerEnd;
        this.variableListOffset = variableListOffset;
        this.dimensions = Collections.unmodifiableList(dimensions);
        this.globalAttributes = Collections.unmodifiableList(globalAttributes);
        this.variables = Collections.unmodifiableList(variables);
    }

    /** Parses the header of bytes already in memory (not modified). */
    static NetcdfClassicFile parse(byte[] bytes, String file) throws InputException {
        return parse(Source.of(bytes), file);
    }

    /**
     * Parses the header. The source must stay readable while variables are read.
     *
     * @param file how messages name the file
     */
    static NetcdfClassicFile parse(Source source, String file) throws InputException {
        return new HeaderParser(source, file).parse();
    }

    /** True when the bytes start with the netCDF-4 (HDF5) signature at one of its usual offsets. */
    static boolean isHdf5(byte[] start, int length) {
        for (long at : HDF5_SIGNATURE_OFFSETS) {
            if (at + HDF5_SIGNATURE.length <= length
                    && Arrays.equals(start, (int) at, (int) at + HDF5_SIGNATURE.length, HDF5_SIGNATURE, 0,
                    HDF5_SIGNATURE.length)) {
                return true;
            }
        }
        return false;
    }

    /** The file as messages name it. */
    String file() {
        return file;
    }

    /** 1 (classic) or 2 (64-bit offset). */
    int version() {
        return version;
    }

    /** Number of records (the record dimension's length). */
    long numRecords() {
        return numRecords;
    }

    /** Bytes from one record to the next. */
    long recordSize() {
        return recordSize;
    }

    /** Offset of the first byte after the header. */
    long headerEnd() {
        return headerEnd;
    }

    /** Offset of the variable list in the header. */
    long variableListOffset() {
        return variableListOffset;
    }

    List<Dimension> dimensions() {
        return dimensions;
    }

    /** The dimension of that name, or {@code null}. */
    Dimension dimension(String name) {
        for (Dimension d : dimensions) {
            if (d.name().equals(name)) {
                return d;
            }
        }
        return null;
    }

    List<Attribute> globalAttributes() {
        return globalAttributes;
    }

    /** The global attribute of that name, or {@code null}. */
    Attribute globalAttribute(String name) {
        return find(globalAttributes, name);
    }

    List<Variable> variables() {
        return variables;
    }

    /** The variable of that name, or {@code null}. */
    Variable variable(String name) {
        for (Variable v : variables) {
            if (v.name().equals(name)) {
                return v;
            }
        }
        return null;
    }

    /** Number of values the variable holds (records included). */
    long valueCount(Variable v) throws InputException {
        long records = v.isRecord() ? numRecords : 1;
        try {
            return Math.multiplyExact(v.valuesPerRecord(), records);
        } catch (ArithmeticException e) {
            throw problem(v.offset(), v.name(), "variable '" + v.name() + "' declared at byte " + v.offset()
                    + " would hold more values than can be counted");
        }
    }

    /** File offset of value {@code index} (row-major, records first) of {@code v}. */
    long offsetOf(Variable v, long index) {
        long size = v.type().size;
        if (!v.isRecord() || v.valuesPerRecord() == 0) {
            return v.begin() + index * size;
        }
        long rec = index / v.valuesPerRecord();
        return v.begin() + rec * recordSize + (index % v.valuesPerRecord()) * size;
    }

    /**
     * Reads all values of a numeric variable as doubles, exactly as stored (bytes signed; no fill,
     * scale or offset handling).
     */
    double[] readDoubles(Variable v) throws InputException {
        if (v.type() == NcType.CHAR) {
            throw problem(v.offset(), v.name(), "variable '" + v.name() + "' declared at byte " + v.offset()
                    + " holds text (NC_CHAR), not numbers");
        }
        long count = valueCount(v);
        if (count == 0) {
            return new double[0];
        }
        int size = v.type().size;
        long perRecord = v.valuesPerRecord();
        long records = v.isRecord() ? numRecords : 1;
        long slabBytes = perRecord * size;
        long end;
        try {
            long last = Math.multiplyExact(records - 1, v.isRecord() ? recordSize : 0);
            end = Math.addExact(Math.addExact(v.begin(), last), slabBytes);
        } catch (ArithmeticException e) {
            end = Long.MAX_VALUE;
        }
        if (end > source.size()) {
            throw problem(v.begin(), v.name(), "the data of '" + v.name() + "' at byte " + v.begin() + " needs "
                    + (v.isRecord() ? records + " records of " + slabBytes + " bytes (" + recordSize
                    + " bytes apart)" : slabBytes + " bytes") + ", but the file ends at byte " + source.size()
                    + "; the file is truncated or its header is damaged");
        }
        if (count > MAX_VALUES) {
            throw problem(v.offset(), v.name(), "variable '" + v.name() + "' declared at byte " + v.offset()
                    + " has " + count + " values, more than this reader accepts (" + MAX_VALUES + ")");
        }
        double[] out = new double[(int) count];
        if (!v.isRecord() || recordSize == slabBytes) {
            readRun(v, v.begin(), out, 0, (int) count);
        } else {
            for (long r = 0; r < records; r++) {
                readRun(v, v.begin() + r * recordSize, out, (int) (r * perRecord), (int) perRecord);
            }
        }
        return out;
    }

    /** Decodes {@code n} contiguous values of {@code v} at {@code position} into {@code out[at…]}. */
    private void readRun(Variable v, long position, double[] out, int at, int n) throws InputException {
        NcType type = v.type();
        int perChunk = WINDOW_BYTES / type.size;
        int done = 0;
        while (done < n) {
            int k = Math.min(perChunk, n - done);
            long pos = position + (long) done * type.size;
            int i = window.at(pos, k * type.size, v.name());
            byte[] b = window.buffer();
            for (int j = 0; j < k; j++) {
                out[at + done + j] = decode(b, i + j * type.size, type);
            }
            done += k;
        }
    }

    private static double decode(byte[] b, int i, NcType type) {
        switch (type) {
            case BYTE:
                return b[i];
            case SHORT:
                return (short) (((b[i] & 0xFF) << 8) | (b[i + 1] & 0xFF));
            case INT:
                return int32(b, i);
            case FLOAT:
                return Float.intBitsToFloat(int32(b, i));
            case DOUBLE:
                return Double.longBitsToDouble(((long) int32(b, i) << 32) | (int32(b, i + 4) & 0xFFFFFFFFL));
            default:
                return b[i] & 0xFF;
        }
    }

    private static int int32(byte[] b, int i) {
        return ((b[i] & 0xFF) << 24) | ((b[i + 1] & 0xFF) << 16) | ((b[i + 2] & 0xFF) << 8) | (b[i + 3] & 0xFF);
    }

    private static Attribute find(List<Attribute> list, String name) {
        for (Attribute a : list) {
            if (a.name().equals(name)) {
                return a;
            }
        }
        return null;
    }

    private InputException problem(long offset, String field, String message) {
        return located(file, offset, field, message);
    }

    /** An error with line 0; the message always names the byte offset. */
    static InputException located(String file, long offset, String field, String message) {
        String m = message.contains("at byte ") ? message : message + " (at byte " + offset + ")";
        return new InputException(file, 0, field, m);
    }

    // ---- byte access ----

    /** A buffered view of the source; reads {@value #WINDOW_BYTES} bytes at a time. */
    private static final class Window {
        private final Source source;
        private final String file;
        private byte[] buffer;
        private long start;
        private int length;

        Window(Source source, String file) {
            this.source = source;
            this.file = file;
            this.buffer = new byte[(int) Math.min(WINDOW_BYTES, source.size())];
        }

        /**
         * Makes {@code [position, position + n)} available (the caller has checked it lies in the file)
         * and returns its index in {@link #buffer()}.
         */
        int at(long position, int n, String field) throws InputException {
            if (position >= start && position + n <= start + length) {
                return (int) (position - start);
            }
            if (n > buffer.length) {
                buffer = new byte[n];
            }
            int want = (int) Math.min(buffer.length, source.size() - position);
            try {
                source.read(position, buffer, 0, want);
            } catch (IOException e) {
                length = 0;
                throw new InputException(file, 0, field, "cannot be read at byte " + position + ": "
                        + e.getMessage(), e);
            }
            start = position;
            length = want;
            return 0;
        }

        byte[] buffer() {
            return buffer;
        }
    }

    // ---- the header ----

    /** State of one header parse; not shared. */
    private static final class HeaderParser {
        private final Source source;
        private final String file;
        private final long size;
        private final Window window;
        private long pos;
        private int version;

        HeaderParser(Source source, String file) {
            this.source = source;
            this.file = file;
            this.size = source.size();
            this.window = new Window(source, file);
        }

        NetcdfClassicFile parse() throws InputException {
            readMagic();
            long numrecsAt = pos;
            int numrecs = readInt("numrecs");
            if (numrecs < 0 && numrecs != STREAMING) {
                throw fail(numrecsAt, "numrecs", "the record count at byte " + numrecsAt + " is negative ("
                        + numrecs + ")");
            }

            int dimCount = listHeader(TAG_DIMENSION, "dim_list", MIN_DIMENSION_BYTES);
            List<Long> dimLengths = new ArrayList<>(dimCount);
            List<String> dimNames = new ArrayList<>(dimCount);
            int recordDim = -1;
            Set<String> seen = new HashSet<>();
            for (int i = 0; i < dimCount; i++) {
                long at = pos;
                String name = readName("dim_list", "dimension " + (i + 1));
                if (!seen.add(name)) {
                    throw fail(at, name, "dimension '" + name + "' at byte " + at + " is declared twice");
                }
                long lengthAt = pos;
                int length = readInt(name);
                if (length < 0) {
                    throw fail(lengthAt, name, "dimension '" + name + "' has a negative length (" + length
                            + ") at byte " + lengthAt);
                }
                if (length == 0) {
                    if (recordDim >= 0) {
                        throw fail(lengthAt, name, "dimension '" + name + "' at byte " + lengthAt
                                + " is a second record (unlimited) dimension; the classic format allows one");
                    }
                    recordDim = i;
                }
                dimNames.add(name);
                dimLengths.add((long) length);
            }

            List<Attribute> globals = attributes("gatt_list", "global attribute");

            long varListAt = pos;
            int varCount = listHeader(TAG_VARIABLE, "var_list", MIN_VARIABLE_BYTES);
            List<PendingVariable> pending = new ArrayList<>(varCount);
            seen.clear();
            for (int i = 0; i < varCount; i++) {
                PendingVariable v = variable(i, dimNames, dimLengths, recordDim);
                if (!seen.add(v.name)) {
                    throw fail(v.offset, v.name, "variable '" + v.name + "' at byte " + v.offset
                            + " is declared twice");
                }
                pending.add(v);
            }
            long headerEnd = pos;

            long recordSize = 0;
            int recordVariables = 0;
            long firstRecordBegin = Long.MAX_VALUE;
            for (PendingVariable v : pending) {
                if (v.begin < headerEnd) {
                    throw fail(v.beginAt, v.name, "variable '" + v.name + "': its data offset " + v.begin
                            + " (field 'begin' at byte " + v.beginAt + ") lies inside the header, which ends at byte "
                            + headerEnd);
                }
                if (v.record) {
                    recordVariables++;
                    firstRecordBegin = Math.min(firstRecordBegin, v.begin);
                }
            }
            for (PendingVariable v : pending) {
                if (v.record) {
                    long slab = v.valuesPerRecord * v.type.size;
                    long stride = recordVariables == 1 ? slab : pad4(slab);
                    recordSize = addChecked(recordSize, stride, v);
                }
            }

            long records;
            if (numrecs == STREAMING) {
                records = recordSize == 0 || firstRecordBegin >= size ? 0 : (size - firstRecordBegin) / recordSize;
            } else {
                records = numrecs;
            }
            if (records > Integer.MAX_VALUE) {
                throw fail(numrecsAt, "numrecs", "the record count at byte " + numrecsAt + " resolves to " + records
                        + " records, more than this reader accepts");
            }

            List<Dimension> dims = new ArrayList<>(dimCount);
            for (int i = 0; i < dimCount; i++) {
                boolean isRecord = i == recordDim;
                dims.add(new Dimension(dimNames.get(i), isRecord ? (int) records : dimLengths.get(i).intValue(),
                        isRecord));
            }
            List<Variable> vars = new ArrayList<>(varCount);
            for (PendingVariable v : pending) {
                List<Dimension> shape = new ArrayList<>(v.dimIds.length);
                for (int id : v.dimIds) {
                    shape.add(dims.get(id));
                }
                vars.add(new Variable(v.name, shape, v.attributes, v.type, v.begin, v.record, v.valuesPerRecord,
                        v.offset));
            }
            return new NetcdfClassicFile(file, source, window, version, records, recordSize, headerEnd, varListAt,
                    dims, globals, vars);
        }

        private long addChecked(long a, long b, PendingVariable v) throws InputException {
            try {
                return Math.addExact(a, b);
            } catch (ArithmeticException e) {
                throw fail(v.offset, v.name, "the record size overflows at variable '" + v.name + "' (byte "
                        + v.offset + ")");
            }
        }

        private void readMagic() throws InputException {
            if (size < MAGIC_BYTES) {
                throw fail(0, "magic", size == 0 ? "the file is empty (at byte 0)"
                        : "the file has only " + size + " bytes, too short for a netCDF file (ends at byte " + size
                        + ")");
            }
            int n = (int) Math.min(size, HDF5_SIGNATURE_OFFSETS[HDF5_SIGNATURE_OFFSETS.length - 1]
                    + HDF5_SIGNATURE.length);
            int i = window.at(0, n, "magic");
            byte[] start = Arrays.copyOfRange(window.buffer(), i, i + n);
            if (isHdf5(start, n)) {
                throw fail(0, "magic", "netCDF-4/HDF5 files are not supported; export as netCDF classic "
                        + "(the HDF5 signature is at the start, byte 0)");
            }
            if (start[0] != 'C' || start[1] != 'D' || start[2] != 'F') {
                throw fail(0, "magic", "not a netCDF classic file: at byte 0 it starts with " + quote(start)
                        + " instead of 'CDF' and a version byte");
            }
            version = start[3];
            if (version == 5) {
                throw fail(3, "magic", "netCDF CDF-5 (64-bit data) files are not supported; export as netCDF classic"
                        + " (version byte 5 at byte 3)");
            }
            if (version != 1 && version != 2) {
                throw fail(3, "magic", "unknown netCDF version byte " + (version & 0xFF)
                        + " at byte 3 (expected 1 for classic or 2 for 64-bit offset)");
            }
            pos = MAGIC_BYTES;
        }

        private static String quote(byte[] start) {
            StringBuilder sb = new StringBuilder();
            for (int k = 0; k < Math.min(start.length, QUOTED_MAGIC_BYTES); k++) {
                int c = start[k] & 0xFF;
                if (c >= 0x20 && c < 0x7F) {
                    sb.append((char) c);
                } else {
                    sb.append(String.format("\\x%02X", c));
                }
            }
            return "'" + sb + "'";
        }

        /** Reads a list tag and count; returns the count (0 for ABSENT). */
        private int listHeader(int tag, String field, int minEntryBytes) throws InputException {
            long at = pos;
            int found = readInt(field);
            long countAt = pos;
            int count = readInt(field);
            if (found == TAG_ABSENT) {
                if (count != 0) {
                    throw fail(countAt, field, "the " + field + " is marked absent (tag 0 at byte " + at
                            + ") but its count at byte " + countAt + " is " + count + " instead of 0");
                }
                return 0;
            }
            if (found != tag) {
                throw fail(at, field, "expected the " + field + " tag " + tag + " or 0 (absent) at byte " + at
                        + " but found " + found);
            }
            if (count < 0) {
                throw fail(countAt, field, "the " + field + " count at byte " + countAt + " is negative (" + count
                        + ")");
            }
            if ((long) count * minEntryBytes > size - pos) {
                throw fail(countAt, field, "the " + field + " count at byte " + countAt + " claims " + count
                        + " entries, which cannot fit in the " + (size - pos)
                        + " bytes left before the file ends at byte " + size);
            }
            return count;
        }

        private List<Attribute> attributes(String field, String what) throws InputException {
            int count = listHeader(TAG_ATTRIBUTE, field, MIN_ATTRIBUTE_BYTES);
            List<Attribute> list = new ArrayList<>(count);
            Set<String> seen = new HashSet<>();
            for (int i = 0; i < count; i++) {
                long at = pos;
                String name = readName(field, what + " " + (i + 1));
                if (!seen.add(name)) {
                    throw fail(at, name, what + " '" + name + "' at byte " + at + " appears twice in the same list");
                }
                NcType type = readType(name);
                long countAt = pos;
                int n = readInt(name);
                if (n < 0) {
                    throw fail(countAt, name, "attribute '" + name + "' has a negative value count (" + n
                            + ") at byte " + countAt);
                }
                long bytes = (long) n * type.size;
                if (bytes > MAX_ATTRIBUTE_BYTES) {
                    throw fail(countAt, name, "attribute '" + name + "' at byte " + countAt + " claims " + bytes
                            + " bytes of values, more than this reader accepts (" + MAX_ATTRIBUTE_BYTES + ")");
                }
                long valuesAt = pos;
                require(pad4(bytes), name, "the values of attribute '" + name + "'");
                int i0 = window.at(valuesAt, (int) bytes, name);
                byte[] b = window.buffer();
                String text = null;
                double[] values = new double[0];
                if (type == NcType.CHAR) {
                    int end = i0 + (int) bytes;
                    while (end > i0 && b[end - 1] == 0) {
                        end--;
                    }
                    text = TextFiles.decodeLenient(b, i0, end);
                } else {
                    values = new double[n];
                    for (int k = 0; k < n; k++) {
                        values[k] = decode(b, i0 + k * type.size, type);
                    }
                }
                pos = valuesAt + pad4(bytes);
                list.add(new Attribute(name, type, text, values, at));
            }
            return list;
        }

        private PendingVariable variable(int index, List<String> dimNames, List<Long> dimLengths, int recordDim)
                throws InputException {
            PendingVariable v = new PendingVariable();
            v.offset = pos;
            v.name = readName("var_list", "variable " + (index + 1));
            long rankAt = pos;
            int rank = readInt(v.name);
            if (rank < 0 || rank > MAX_RANK) {
                throw fail(rankAt, v.name, "variable '" + v.name + "' has " + (rank < 0 ? "a negative" : "an absurd")
                        + " number of dimensions (" + rank + ") at byte " + rankAt);
            }
            require(4L * rank, v.name, "the dimension ids of variable '" + v.name + "'");
            v.dimIds = new int[rank];
            long product = 1;
            for (int k = 0; k < rank; k++) {
                long idAt = pos;
                int id = readInt(v.name);
                if (id < 0 || id >= dimNames.size()) {
                    throw fail(idAt, v.name, "variable '" + v.name + "' refers to dimension id " + id + " at byte "
                            + idAt + ", but the file declares " + dimNames.size() + " dimensions");
                }
                if (id == recordDim) {
                    if (k != 0) {
                        throw fail(idAt, v.name, "variable '" + v.name + "' uses the record dimension '"
                                + dimNames.get(id) + "' at position " + (k + 1) + " (byte " + idAt
                                + "); it may only be the first");
                    }
                    v.record = true;
                } else {
                    try {
                        product = Math.multiplyExact(product, dimLengths.get(id));
                    } catch (ArithmeticException e) {
                        throw fail(idAt, v.name, "the dimensions of variable '" + v.name + "' (byte " + idAt
                                + ") multiply to more values than can be counted");
                    }
                }
                v.dimIds[k] = id;
            }
            v.valuesPerRecord = product;
            v.attributes = attributes(v.name, "attribute of '" + v.name + "'");
            v.type = readType(v.name);
            readInt(v.name); // vsize: redundant, sizes are computed from the shape (spec, "Note on vsize")
            v.beginAt = pos;
            v.begin = version == 1 ? readInt(v.name) : readLong(v.name);
            if (v.begin < 0) {
                throw fail(v.beginAt, v.name, "variable '" + v.name + "' has a negative data offset (" + v.begin
                        + ") at byte " + v.beginAt);
            }
            try {
                Math.multiplyExact(product, v.type.size);
            } catch (ArithmeticException e) {
                throw fail(v.offset, v.name, "variable '" + v.name + "' at byte " + v.offset
                        + " is larger than can be counted");
            }
            return v;
        }

        private NcType readType(String field) throws InputException {
            long at = pos;
            int code = readInt(field);
            NcType t = NcType.of(code);
            if (t == null) {
                throw fail(at, field, "unknown nc_type " + code + " at byte " + at
                        + " (expected 1 byte, 2 char, 3 short, 4 int, 5 float or 6 double)");
            }
            return t;
        }

        private String readName(String field, String what) throws InputException {
            long at = pos;
            int length = readInt(field);
            if (length <= 0 || length > MAX_NAME_BYTES) {
                throw fail(at, field, "the name of " + what + " at byte " + at + " has "
                        + (length <= 0 ? "an invalid" : "an absurd") + " length (" + length + "; expected 1 to "
                        + MAX_NAME_BYTES + ")");
            }
            require(pad4(length), field, "the name of " + what);
            int i = window.at(pos, length, field);
            String name = new String(window.buffer(), i, length, StandardCharsets.UTF_8);
            pos += pad4(length);
            return name;
        }

        private int readInt(String field) throws InputException {
            require(4, field, "header field '" + field + "'");
            int i = window.at(pos, 4, field);
            pos += 4;
            return int32(window.buffer(), i);
        }

        private long readLong(String field) throws InputException {
            require(8, field, "header field '" + field + "'");
            int i = window.at(pos, 8, field);
            pos += 8;
            byte[] b = window.buffer();
            return ((long) int32(b, i) << 32) | (int32(b, i + 4) & 0xFFFFFFFFL);
        }

        /** Throws unless {@code n} more bytes exist at the current position. */
        private void require(long n, String field, String what) throws InputException {
            if (n > size - pos) {
                throw fail(pos, field, "the file ends at byte " + size + " inside " + what + " (at byte " + pos
                        + ", " + n + " bytes needed); the header is truncated or damaged");
            }
        }

        private InputException fail(long offset, String field, String message) {
            return located(file, offset, field, message);
        }
    }

    /** A variable entry before the record count is known. */
    private static final class PendingVariable {
        String name;
        long offset;
        int[] dimIds;
        boolean record;
        long valuesPerRecord;
        List<Attribute> attributes;
        NcType type;
        long begin;
        long beginAt;
    }

    /** {@code n} rounded up to a multiple of 4 (spec, "padding"). */
    static long pad4(long n) {
        return (n + 3) & ~3L;
    }
}
