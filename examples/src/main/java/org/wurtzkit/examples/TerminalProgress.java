package org.wurtzkit.examples;

import java.io.PrintStream;
import java.util.Locale;
import org.wurtzkit.solvers.workflow.ProgressListener;

/**
 * Shows the progress of a long workflow on the terminal: a bar redrawn in place when the output is
 * an interactive console, one line at every tenth of the work otherwise (a log file, a build tool),
 * and always a final line with the elapsed time.
 */
final class TerminalProgress implements ProgressListener {
    private static final int WIDTH = 30;

    private final String label;
    private final PrintStream out;
    private final boolean interactive;
    private final long start = System.nanoTime();
    private int lastTenth = -1;

    /**
     * @param label what is running, e.g. "design map, full solver"
     * @param out   where to print
     */
    TerminalProgress(String label, PrintStream out) {
        this(label, out, System.console() != null && out == System.out);
    }

    TerminalProgress(String label, PrintStream out, boolean interactive) {
        this.label = label;
        this.out = out;
        this.interactive = interactive;
    }

    @Override
    public void progress(int done, int total) {
        double seconds = (System.nanoTime() - start) / 1e9;
        int filled = (int) Math.round(WIDTH * (double) done / total);
        String bar = "#".repeat(filled) + ".".repeat(WIDTH - filled);
        String text = String.format(Locale.ROOT, "  %s [%s] %d/%d points, %.1f s", label, bar, done, total, seconds);
        if (interactive) {
            out.print("\r" + text);
            if (done == total) {
                out.println();
            }
        } else {
            int tenth = (int) (10L * done / total);
            if (tenth != lastTenth || done == total) {
                lastTenth = tenth;
                out.println(text);
            }
        }
        out.flush();
    }
}
