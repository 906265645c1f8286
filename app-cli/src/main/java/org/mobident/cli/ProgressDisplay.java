package org.mobident.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.mobident.result.BatchProgress;

/**
 * A one-line progress bar on the terminal for a long batch: runs done, rate and time left,
 * redrawn in place with a carriage return a few times a second. It appears only once the batch has
 * run for {@link #SHOW_AFTER_NANOS} (a short batch prints nothing) and is wiped when the batch
 * ends, so the closing lines start on a clean line. Disabled, it counts nothing and prints nothing:
 * the caller disables it for {@code --quiet} and when standard error is not a terminal
 * ({@link #stderrIsTerminal()}), so pipes and log files never see it.
 *
 * <p>The workers only count ({@link #runDone}); a daemon thread draws.
 */
final class ProgressDisplay implements BatchProgress, AutoCloseable {

    /** A batch shorter than this shows no bar at all. */
    static final long SHOW_AFTER_NANOS = TimeUnit.SECONDS.toNanos(2);
    /** Time between redraws. */
    private static final long REFRESH_MILLIS = 250;
    /** Width of the line when the terminal does not say ({@code COLUMNS} unset). */
    static final int DEFAULT_WIDTH = 80;
    /** Narrowest bar drawn; below it the line goes without a bar. */
    private static final int MIN_BAR = 10;
    /** Runs done before a rate (and so the time left) is shown. */
    private static final int MIN_RUNS_FOR_RATE = 2;

    private final PrintWriter err;
    private final boolean enabled;
    private final int width;
    private final long startNanos = System.nanoTime();
    private final AtomicInteger done = new AtomicInteger();
    private volatile int pass = 1;
    private volatile int total;
    private volatile long passStartNanos = startNanos;
    private final Thread drawer;
    /** Guarded by this: whether a line is on the screen, and its length. */
    private int shownLength;

    private ProgressDisplay(PrintWriter err, boolean enabled, int width) {
        this.err = err;
        this.enabled = enabled;
        this.width = width;
        if (enabled) {
            drawer = new Thread(this::drawLoop, "mobident-progress");
            drawer.setDaemon(true);
            drawer.start();
        } else {
            drawer = null;
        }
    }

    /** A display on {@code err} that shows itself only when {@code enabled}. */
    static ProgressDisplay on(PrintWriter err, boolean enabled) {
        return new ProgressDisplay(err, enabled, terminalWidth());
    }

    /**
     * True when standard error is a terminal. On Linux from what file descriptor 2 points to; elsewhere
     * Java 17 can only tell whether the process has a console (standard input and output both a terminal).
     */
    static boolean stderrIsTerminal() {
        Path fd = Path.of("/proc/self/fd/2");
        try {
            if (Files.isSymbolicLink(fd)) {
                String target = Files.readSymbolicLink(fd).toString();
                return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty") || target.equals("/dev/console");
            }
        } catch (IOException | SecurityException | UnsupportedOperationException e) {
            // fall through to the console test
        }
        return System.console() != null;
    }

    private static int terminalWidth() {
        String columns = System.getenv("COLUMNS");
        if (columns != null) {
            try {
                int w = Integer.parseInt(columns.trim());
                if (w > MIN_BAR) {
                    return w;
                }
            } catch (NumberFormatException e) {
                // the default serves
            }
        }
        return DEFAULT_WIDTH;
    }

    @Override
    public void passStarted(int pass, int runs) {
        if (!enabled) {
            return;
        }
        this.total = runs;
        this.done.set(0);
        this.passStartNanos = System.nanoTime();
        this.pass = pass;
    }

    @Override
    public void runDone(int pass) {
        if (enabled) {
            done.incrementAndGet();
        }
    }

    private void drawLoop() {
        try {
            while (!Thread.currentThread().isInterrupted()) {
                Thread.sleep(REFRESH_MILLIS);
                long now = System.nanoTime();
                if (now - startNanos >= SHOW_AFTER_NANOS) {
                    draw(line(pass, Math.min(done.get(), total), total, (now - passStartNanos) / 1e9, width));
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private synchronized void draw(String text) {
        StringBuilder sb = new StringBuilder(width + 2).append('\r').append(text);
        for (int k = text.length(); k < shownLength; k++) {
            sb.append(' ');
        }
        err.print(sb);
        err.flush();
        shownLength = text.length();
    }

    /** Stops drawing and wipes the line, if one was shown. */
    @Override
    public void close() {
        if (drawer == null) {
            return;
        }
        drawer.interrupt();
        try {
            drawer.join(TimeUnit.SECONDS.toMillis(1));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        synchronized (this) {
            if (shownLength > 0) {
                err.print("\r" + " ".repeat(shownLength) + "\r");
                err.flush();
                shownLength = 0;
            }
        }
    }

    /**
     * The progress line, at most {@code width - 1} characters: e.g.
     * {@code identifying [#########-----------]   412/1,000 runs  137 runs/s  4 s left}.
     *
     * @param pass     1 or 2 (matching again with the batch's prior)
     * @param done     runs of the pass done
     * @param total    runs of the pass
     * @param elapsedS seconds since the pass began
     */
    static String line(int pass, int done, int total, double elapsedS, int width) {
        String label = pass == 1 ? "identifying" : "matching again";
        String all = String.format(Locale.ROOT, "%,d", total);
        String count = String.format(Locale.ROOT, "%" + all.length() + "s/%s runs",
                String.format(Locale.ROOT, "%,d", done), all);
        String rate = "";
        String left = "";
        if (done >= MIN_RUNS_FOR_RATE && elapsedS > 0) {
            double perS = done / elapsedS;
            rate = String.format(Locale.ROOT, "  %,.0f runs/s", perS);
            long seconds = Math.round((total - done) / perS);
            left = "  " + duration(seconds) + " left";
        }
        String tail = " " + count + rate + left;
        int bar = width - 1 - label.length() - 3 - tail.length();
        if (bar < MIN_BAR) {
            String plain = label + tail;
            return plain.length() < width ? plain : plain.substring(0, Math.max(0, width - 1));
        }
        int filled = total <= 0 ? 0 : (int) ((long) bar * Math.min(done, total) / total);
        return label + " [" + "#".repeat(filled) + "-".repeat(bar - filled) + "]" + tail;
    }

    private static String duration(long seconds) {
        if (seconds < 60) {
            return seconds + " s";
        }
        return String.format(Locale.ROOT, "%d min %02d s", seconds / 60, seconds % 60);
    }
}
