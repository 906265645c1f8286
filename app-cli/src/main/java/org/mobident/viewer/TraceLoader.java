package org.mobident.viewer;

import java.nio.file.Path;
import org.mobident.InputException;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceReadOptions;

/** Reads a trace file; the command passes the project's reader. */
@FunctionalInterface
public interface TraceLoader {
    Trace read(Path file, TraceReadOptions options) throws InputException;
}
