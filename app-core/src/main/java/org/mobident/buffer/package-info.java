/**
 * The values of buffer chemistry that cross the engine's interface: a buffer's conditions
 * ({@link org.mobident.buffer.BufferConditions}: pH, ionic strength, temperature), an analyte's
 * acid–base model ({@link org.mobident.buffer.SpeciesModel}), the uncertainty of the model's inputs
 * ({@link org.mobident.buffer.PredictionUncertainty}) and a pH interval
 * ({@link org.mobident.buffer.PhInterval}). The model that uses them is in a package the module
 * does not export.
 */
package org.mobident.buffer;
