/**
 * Building a mobility library from replicate runs of standard mixtures, and updating an existing
 * library with a fresh build.
 *
 * <p>Units: mobilities in 1e-9 m²/(V·s), signed (cations positive, anions negative); times in s;
 * lengths in cm; voltage in signed kV; temperature in °C.
 *
 * <p>The flow: {@link org.mobident.library.standards.StandardsSheetReader} reads which analytes each
 * mix holds; the pipeline turns each standards run into a {@link org.mobident.result.RunResult};
 * {@link org.mobident.library.standards.LibraryBuilder} groups the analyte peaks of each mix's
 * replicate runs into one group per analyte, names the groups, computes replicate statistics
 * with a Grubbs outlier test and writes conditions and provenance into the library notes;
 * {@link org.mobident.library.standards.LibraryMerger} pools a fresh build into an existing library
 * exactly as if all measurements had been pooled. Nothing here prints or throws on questionable
 * data: such data produce {@link org.mobident.library.standards.BuildWarning}s an analyst must read.
 */
package org.mobident.library.standards;
