package org.eigenzeit.ground.campaign;

import java.io.OutputStreamWriter;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.Locale;

/**
 * Progress of a campaign on a stream (standard error): on a terminal a bar with an estimate of the
 * time left, redrawn in place with carriage returns; anywhere else (a log file, a pipe, a batch
 * job) nothing while the runs go and one summary line at the end, so a log holds one line per
 * campaign, not one per run.
 */
public final class Progress {
  /** System property the launcher sets to {@code true} or {@code false} from {@code [ -t 2 ]}. */
  public static final String TERMINAL_PROPERTY = "eigenzeit.stderrTerminal";

  private final PrintWriter out;
  private final Object lock = new Object();
  private final boolean terminal;
  private boolean drawn;

  /**
   * Progress on a stream.
   *
   * @param out the stream
   * @param terminal whether the stream is a terminal (a bar) or not (one summary line)
   */
  public Progress(PrintStream out, boolean terminal) {
    // Our own writer over the stream (text is ASCII): the caller keeps its stream, we keep ours.
    this.out = new PrintWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
    this.terminal = terminal;
  }

  /**
   * Progress on standard error; a terminal when the launcher says so ({@link #TERMINAL_PROPERTY}),
   * else when the JVM has a console.
   *
   * @return the progress
   */
  public static Progress onStandardError() {
    final String said = System.getProperty(TERMINAL_PROPERTY);
    final boolean terminal = said != null ? Boolean.parseBoolean(said) : System.console() != null;
    return new Progress(System.err, terminal);
  }

  /**
   * Whether the bar is drawn (a terminal).
   *
   * @return true on a terminal
   */
  public boolean terminal() {
    return terminal;
  }

  /**
   * One more run finished.
   *
   * @param done runs finished so far
   * @param total runs to run
   * @param reused runs reused (not run)
   * @param elapsedS time since the start, s
   */
  public void update(int done, int total, int reused, double elapsedS) {
    if (!terminal) {
      return;
    }
    synchronized (lock) {
      draw(done, total, reused, elapsedS);
    }
  }

  private void draw(int done, int total, int reused, double elapsedS) {
    final double eta = done > 0 ? elapsedS / done * (total - done) : 0;
    final int width = 30;
    final int filled = total > 0 ? (int) Math.round(width * (double) done / total) : width;
    out.printf(Locale.ROOT, "\r[%s%s] %d/%d runs (%d reused)  %.1f s elapsed, ETA %.0f s ", "#".repeat(filled),
        ".".repeat(width - filled), done, total, reused, elapsedS, eta);
    out.flush();
    drawn = true;
  }

  /**
   * The campaign's runs are done: ends the bar, then the summary line.
   *
   * @param counts what was done
   */
  public void finish(LocalRunner.Counts counts) {
    synchronized (lock) {
      summary(counts);
    }
  }

  private void summary(LocalRunner.Counts counts) {
    if (drawn) {
      out.println();
    }
    out.printf(Locale.ROOT, "campaign: %d runs done (%d re-run after a change), %d reused, in %.1f s%n", counts.ran(),
        counts.stale(), counts.reused(), counts.elapsedS());
    out.flush();
  }
}
