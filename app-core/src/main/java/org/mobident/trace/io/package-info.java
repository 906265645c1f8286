/**
 * Reading trace files and run sheets into immutable values.
 *
 * <p>{@link org.mobident.trace.io.DelimitedTraceReader} turns delimited text into a
 * {@link org.mobident.trace.Trace} (times in s); {@link org.mobident.trace.io.RunSheetReader} turns a
 * run sheet into {@link org.mobident.trace.RunSpec}s. Every user-data problem is an
 * {@link org.mobident.InputException} with file, 1-based line and column.
 */
package org.mobident.trace.io;
