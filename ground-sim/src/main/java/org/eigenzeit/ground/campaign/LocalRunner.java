package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Runs a campaign's runs on a fixed pool of threads on this machine. A run whose stored key equals
 * its key now is reused; a missing or stale one (inputs or code changed) is run. Progress goes to a
 * {@link Progress} (a bar on a terminal, one summary line elsewhere).
 */
public final class LocalRunner {
  private LocalRunner() {}

  /**
   * What a runner did.
   *
   * @param ran runs executed
   * @param reused finished runs reused under an equal key
   * @param stale stored runs made from other inputs or code, run again (counted in {@code ran})
   * @param elapsedS wall time, s
   */
  public record Counts(int ran, int reused, int stale, double elapsedS) {}

  /**
   * The tasks still to run: every run without a current stored result.
   *
   * @param out the campaign folder
   * @param runs the runs
   * @param codeFingerprint the code's fingerprint
   * @param staleOut receives the number of stale stored runs (index 0)
   * @return the runs to execute, in campaign order
   */
  public static List<RunSpec> pending(Path out, List<RunSpec> runs, String codeFingerprint, int[] staleOut) {
    final List<RunSpec> tasks = new ArrayList<>();
    for (RunSpec s : runs) {
      final RunStore.State st = RunStore.state(out, s, s.key(codeFingerprint));
      if (st != RunStore.State.CURRENT) {
        tasks.add(s);
        if (st == RunStore.State.STALE) {
          staleOut[0]++;
        }
      }
    }
    return tasks;
  }

  /**
   * Runs what is pending of the given runs.
   *
   * @param runs the runs
   * @param out the campaign folder
   * @param threads worker threads (0: all cores)
   * @param progress where progress goes (null: nowhere)
   * @return what was done
   * @throws IOException when an output cannot be written or a run fails
   */
  public static Counts run(List<RunSpec> runs, Path out, int threads, Progress progress) throws IOException {
    Files.createDirectories(out);
    final String fp = CodeVersion.current().fingerprint();
    final int[] stale = new int[1];
    final List<RunSpec> tasks = pending(out, runs, fp, stale);
    final int reused = runs.size() - tasks.size();
    final int n = threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
    final ExecutorService pool = Executors.newFixedThreadPool(n);
    final AtomicInteger done = new AtomicInteger();
    final long start = System.nanoTime();
    try {
      final List<Future<?>> futures = new ArrayList<>();
      for (RunSpec t : tasks) {
        futures.add(pool.submit(() -> {
          try {
            RunStore.write(out, RunTask.execute(t, fp));
          } catch (IOException e) {
            throw new UncheckedIOException(e);
          }
          final int d = done.incrementAndGet();
          if (progress != null) {
            progress.update(d, tasks.size(), reused, (System.nanoTime() - start) / 1e9);
          }
          return null;
        }));
      }
      for (Future<?> f : futures) {
        f.get();
      }
      final Counts counts = new Counts(tasks.size(), reused, stale[0], (System.nanoTime() - start) / 1e9);
      if (progress != null) {
        progress.finish(counts);
      }
      return counts;
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IOException("campaign interrupted", e);
    } catch (ExecutionException e) {
      final Throwable c = e.getCause();
      throw new IOException(c.getMessage(), c);
    } finally {
      pool.shutdownNow();
    }
  }
}
