/**
 * Reading trace files and run sheets into immutable values.
 *
 * <p>{@link org.mobident.trace.io.TraceFiles} is the one entry point for traces: it recognises the
 * format by content or extension and hands the file to
 * {@link org.mobident.trace.io.DelimitedTraceReader} (delimited text) or
 * {@link org.mobident.trace.io.AndiTraceReader} (the netCDF-based chromatography interchange format of
 * ASTM E1947 / E1948, read with the package's own strict netCDF classic reader). Either gives a
 * {@link org.mobident.trace.Trace} with times in s. {@link org.mobident.trace.io.RunSheetReader} turns a
 * run sheet into {@link org.mobident.trace.RunSpec}s. Every user-data problem is an
 * {@link org.mobident.InputException}: text readers give the 1-based line and column; the netCDF reader
 * gives line 0, the variable or attribute, and the byte offset in the message ("at byte N").
 */
package org.mobident.trace.io;
