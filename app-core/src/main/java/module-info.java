/**
 * The Mobident engine: reading runs, finding peaks, turning migration times into effective
 * mobilities, matching them against a library, and writing what was found.
 *
 * <p>A front end reaches the work through the use cases of {@code org.mobident.usecase}, gets
 * back the value types of {@code org.mobident.result}, tunes it with those of
 * {@code org.mobident.settings} (and, for buffer chemistry, of {@code org.mobident.buffer}), and reads and writes files with the readers, writers and
 * renderers of the other exported packages. The packages that compute (peak finding in
 * {@code signal}, mobility scales in {@code mobility}, library matching in {@code matching}, the
 * identification pipeline in {@code pipeline}, buffer chemistry in {@code chem}) are not
 * exported: they may change without notice.
 */
@SuppressWarnings("requires-automatic") // Commons Math 3.6.1 names no module: the name comes from its file
module org.mobident.core {
    requires commons.math3;
    requires org.apache.commons.numbers.gamma;
    requires transitive java.desktop;
    requires java.management;
    requires jdk.management;
    requires org.apache.commons.csv;
    requires org.dhatim.fastexcel;
    requires org.jgrapht.core;

    exports org.mobident;
    exports org.mobident.assess;
    exports org.mobident.buffer;
    exports org.mobident.io;
    exports org.mobident.library;
    exports org.mobident.library.standards;
    exports org.mobident.recheck;
    exports org.mobident.report;
    exports org.mobident.report.assess;
    exports org.mobident.report.html;
    exports org.mobident.report.library;
    exports org.mobident.report.plot;
    exports org.mobident.report.prediction;
    exports org.mobident.report.recheck;
    exports org.mobident.result;
    exports org.mobident.settings;
    exports org.mobident.simulate;
    exports org.mobident.summary;
    exports org.mobident.text;
    exports org.mobident.trace;
    exports org.mobident.trace.io;
    exports org.mobident.usecase;
}
