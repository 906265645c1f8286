package org.mobident.usecase;

import java.nio.file.Path;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.RunConditions;

/** The demo scenario's files (invented data, demo-data/README.md), shared by the use-case tests. */
final class DemoInputs {

    static final Path DEMO = Path.of("..", "demo-data");

    private DemoInputs() {
    }

    static Library library() throws InputException {
        return LibraryCsv.read(DEMO.resolve("library.csv"));
    }

    static RunBatch runs() throws InputException {
        return RunBatch.fromSheet(DEMO.resolve("runs.csv"), RunConditions.EMPTY);
    }

    static RunBatch standards() throws InputException {
        return RunBatch.fromSheet(DEMO.resolve("standards").resolve("standards-runs.csv"), RunConditions.EMPTY);
    }

    /** Two threads, so that the batch's parallel path is the one tested. */
    static IdentifySettings settings() {
        return IdentifySettings.defaults().withThreads(2);
    }

    /** The demo batch identified. */
    static IdentifiedBatch identified() throws InputException {
        return new IdentifyBatch(library()).run(runs(), settings());
    }
}
