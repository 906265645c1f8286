package org.mobident.trace.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;

import org.mobident.InputException;
import org.mobident.trace.Trace;

/**
 * One entry point for trace files: chooses the reader by content, then by extension.
 *
 * <ol>
 *   <li>A file that starts with the netCDF signature 'C' 'D' 'F' and version byte 1, 2 or 5, or with the
 *       HDF5 signature of netCDF-4, goes to {@link AndiTraceReader} (which reads versions 1 and 2 and
 *       explains why it refuses the others).</li>
 *   <li>Else a name ending in {@code .cdf}, {@code .nc} or {@code .netcdf} (any case) goes to
 *       {@link AndiTraceReader}, which then says the file is not netCDF.</li>
 *   <li>Everything else is delimited text: {@link DelimitedTraceReader}.</li>
 * </ol>
 */
public final class TraceFiles {

    /** Bytes read to recognise the format. */
    private static final int SNIFF_BYTES = 8;
    private static final String[] NETCDF_EXTENSIONS = {".cdf", ".nc", ".netcdf"};

    /** The readers {@link TraceFiles} chooses between. */
    enum Format {
        NETCDF, DELIMITED_TEXT
    }

    private TraceFiles() {
    }

    /** Reads a trace file of either format; messages name it as {@code file.toString()}. */
    public static Trace read(Path file, TraceReadOptions options) throws InputException {
        return read(file, file.toString(), options);
    }

    /**
     * Reads a trace file of either format.
     *
     * @param displayName how messages and {@link Trace#sourceFile()} name the file
     * @param options     time unit and column (for netCDF: variable) names; {@code null} means the defaults
     */
    public static Trace read(Path file, String displayName, TraceReadOptions options) throws InputException {
        TraceReadOptions o = options == null ? TraceReadOptions.DEFAULT : options;
        if (formatOf(file, displayName) == Format.NETCDF) {
            return AndiTraceReader.read(file, displayName, o);
        }
        return DelimitedTraceReader.read(file, displayName, o);
    }

    /** The format {@link #read} would use for {@code file}. */
    static Format formatOf(Path file, String displayName) throws InputException {
        if (Files.isDirectory(file)) {
            throw new InputException(displayName, 0, null, "is a folder, not a file");
        }
        byte[] head = new byte[SNIFF_BYTES];
        int n = 0;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(head, 0, SNIFF_BYTES);
        } catch (NoSuchFileException e) {
            throw new InputException(displayName, 0, null, "file not found", e);
        } catch (AccessDeniedException e) {
            throw new InputException(displayName, 0, null, "cannot be read (access denied)", e);
        } catch (IOException e) {
            throw new InputException(displayName, 0, null, "cannot be read: " + e.getMessage(), e);
        }
        return formatOf(head, n, file.getFileName() == null ? "" : file.getFileName().toString());
    }

    /** The format for a file starting with {@code head[0, n)} and named {@code fileName}. */
    static Format formatOf(byte[] head, int n, String fileName) {
        boolean cdf = n >= 4 && head[0] == 'C' && head[1] == 'D' && head[2] == 'F'
                && (head[3] == 1 || head[3] == 2 || head[3] == 5);
        if (cdf || NetcdfClassicFile.isHdf5(head, n)) {
            return Format.NETCDF;
        }
        String lower = fileName.toLowerCase(Locale.ROOT);
        for (String ext : NETCDF_EXTENSIONS) {
            if (lower.endsWith(ext)) {
                return Format.NETCDF;
            }
        }
        return Format.DELIMITED_TEXT;
    }
}
