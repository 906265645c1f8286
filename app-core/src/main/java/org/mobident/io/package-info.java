/**
 * File output of the engine: {@link org.mobident.io.SafeFiles} writes every file atomically
 * (temporary file, forced to disk, renamed into place) and never replaces an existing file
 * unless asked to.
 */
package org.mobident.io;
