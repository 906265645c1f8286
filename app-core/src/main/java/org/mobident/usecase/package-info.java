/**
 * The jobs of Mobident, one class per job: {@link org.mobident.usecase.IdentifyBatch},
 * {@link org.mobident.usecase.BuildLibrary}, {@link org.mobident.usecase.AddToLibrary},
 * {@link org.mobident.usecase.PredictMobilities}, {@link org.mobident.usecase.RecheckAssignments} and
 * {@link org.mobident.usecase.AssessIdentification}. Each takes parsed inputs (value types) and
 * returns an immutable result; the command line and the viewer only parse options, call one job,
 * render its result and map the outcome. Nothing in the engine depends on this package.
 */
package org.mobident.usecase;
