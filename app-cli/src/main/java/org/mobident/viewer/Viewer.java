package org.mobident.viewer;

import java.awt.GraphicsEnvironment;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CountDownLatch;
import javax.swing.SwingUtilities;
import org.mobident.library.Library;
import org.mobident.report.plot.Axis;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.RunSpec;
import org.mobident.usecase.IdentifyBatch;

/** Opens the viewer window. The only entry point the command line needs. */
public final class Viewer {

    /** The window's colours. */
    public enum Theme { LIGHT, DARK }

    private Viewer() {
    }

    /**
     * What the window starts with.
     *
     * @param title          shown in the window title (e.g. the run sheet's file name)
     * @param job            identifies the runs (and names the library they are matched against)
     * @param runs           runs to read and identify (in the background)
     * @param rejected       runs already known to have failed (bad sheet rows, unusable trace names)
     * @param settings       identification settings, as for {@code identify}
     * @param loader         reads a trace file
     * @param axis           the axis shown first
     * @param tickedAtStart  indices (into {@code runs} followed by {@code rejected}) ticked at start
     * @param theme          light or dark window (the plot stays white)
     */
    public record Setup(String title, IdentifyBatch job, List<RunSpec> runs, List<RunResult> rejected,
                        IdentifySettings settings, TraceLoader loader, Axis axis, List<Integer> tickedAtStart,
                        Theme theme) {
        public Setup {
            title = title == null ? "" : title;
            Objects.requireNonNull(job, "job");
            runs = List.copyOf(runs);
            rejected = List.copyOf(rejected);
            Objects.requireNonNull(settings, "settings");
            Objects.requireNonNull(loader, "loader");
            Objects.requireNonNull(axis, "axis");
            tickedAtStart = List.copyOf(tickedAtStart);
            theme = theme == null ? Theme.LIGHT : theme;
        }

        /** The library the runs are matched against. */
        public Library library() {
            return job.library();
        }

        /** The runs as the window lists them: those to process, waiting, then the rejected ones. */
        List<ViewerRun> initialRuns() {
            List<ViewerRun> out = new ArrayList<>();
            for (RunSpec r : runs) {
                out.add(ViewerRun.waiting(r));
            }
            for (RunResult r : rejected) {
                out.add(ViewerRun.failed(r));
            }
            return out;
        }
    }

    /** Whether a window can be shown at all (false with {@code java.awt.headless=true} or no display). */
    public static boolean canShowWindow() {
        return !GraphicsEnvironment.isHeadless();
    }

    /**
     * Shows the window (on the Event Dispatch Thread) and starts identifying the runs in the
     * background. Returns at once.
     *
     * @return released when the window has been closed
     * @throws java.awt.HeadlessException when no window can be shown; check {@link #canShowWindow()} first
     */
    public static CountDownLatch open(Setup setup) {
        if (!canShowWindow()) {
            throw new java.awt.HeadlessException("no display to show the viewer on");
        }
        CountDownLatch closed = new CountDownLatch(1);
        SwingUtilities.invokeLater(() -> ViewerWindow.show(setup, closed::countDown));
        return closed;
    }
}
