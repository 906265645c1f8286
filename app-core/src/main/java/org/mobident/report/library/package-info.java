/**
 * Renderers of a library built from standards runs
 * ({@link org.mobident.library.standards.BuildResult}): the terminal report of what was built, merged
 * and warned about.
 */
package org.mobident.report.library;
