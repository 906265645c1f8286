/**
 * Files in and out of the engine. {@link org.mobident.io.SafeFiles} writes every file atomically
 * (temporary file, forced to disk, renamed into place) and never replaces an existing file
 * unless asked to. {@link org.mobident.io.TableReader} reads every text table (library, run
 * sheet, standards sheet, peak table, known identities) as a {@link org.mobident.io.TableSpec}
 * describes it; {@link org.mobident.io.TextFiles} turns bytes into text and is the one place that
 * strips a UTF-8 byte-order mark; {@link org.mobident.io.Suggestions} gives the "did you mean".
 */
package org.mobident.io;
