package org.eigenzeit.ground.campaign;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.eigenzeit.ground.loop.ClosedLoop;
import org.eigenzeit.ground.loop.RunResult;

/**
 * Runs many scenarios times many seeds in parallel on all cores. Each run is a pure function of
 * (scenario, seed) and writes {@code runs/<scenario>/seed-<n>/summary.json} and
 * {@code timeseries.csv}; a run whose summary exists is skipped (resumable). Progress with an
 * estimate of the time left goes to the given stream.
 */
public final class Campaign {
  private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private Campaign() {}

  /** One unit of work. */
  public record Job(Scenario scenario, long seed) {}

  /**
   * The jobs of a campaign: every scenario times its seeds (or a common seed count).
   *
   * @param scenarios scenarios
   * @param seedsOverride seed count for all (0: each scenario's own)
   * @return the jobs
   */
  public static List<Job> jobs(List<Scenario> scenarios, int seedsOverride) {
    final List<Job> jobs = new ArrayList<>();
    for (Scenario s : scenarios) {
      final int n = seedsOverride > 0 ? seedsOverride : s.seeds();
      for (long k = 0; k < n; k++) {
        jobs.add(new Job(s, k));
      }
    }
    return jobs;
  }

  /**
   * Folder of one run.
   *
   * @param out campaign folder
   * @param job the job
   * @return the run folder
   */
  public static Path runDir(Path out, Job job) {
    return out.resolve("runs").resolve(job.scenario().name()).resolve("seed-" + job.seed());
  }

  /**
   * Runs the jobs.
   *
   * @param jobs jobs
   * @param out campaign folder
   * @param threads worker threads (0: all cores)
   * @param progress where progress goes (null: nowhere)
   * @return results in job order
   * @throws IOException when an output cannot be written
   */
  public static List<RunResult> run(List<Job> jobs, Path out, int threads, PrintStream progress) throws IOException {
    Files.createDirectories(out);
    final int n = threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
    final ExecutorService pool = Executors.newFixedThreadPool(n);
    final AtomicInteger done = new AtomicInteger();
    final AtomicInteger skipped = new AtomicInteger();
    final long start = System.nanoTime();
    try {
      final List<Future<RunResult>> futures = new ArrayList<>();
      for (Job job : jobs) {
        futures.add(pool.submit(() -> {
          final RunResult r = runOne(job, out, skipped);
          report(progress, done.incrementAndGet(), jobs.size(), skipped.get(), start);
          return r;
        }));
      }
      final List<RunResult> results = new ArrayList<>();
      for (Future<RunResult> f : futures) {
        results.add(f.get());
      }
      if (progress != null) {
        progress.println();
      }
      Files.writeString(out.resolve("summary.json"), JSON.writeValueAsString(results), StandardCharsets.UTF_8);
      return results;
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

  private static RunResult runOne(Job job, Path out, AtomicInteger skipped) {
    final Path dir = runDir(out, job);
    final Path summary = dir.resolve("summary.json");
    try {
      if (Files.exists(summary) && Files.exists(dir.resolve("timeseries.csv"))) {
        skipped.incrementAndGet();
        return JSON.readValue(summary.toFile(), RunResult.class);
      }
      final ClosedLoop.Output o = ClosedLoop.run(job.scenario(), job.seed());
      Files.createDirectories(dir);
      Files.writeString(dir.resolve("timeseries.csv"), o.series().toCsv(), StandardCharsets.UTF_8);
      // summary last: its presence marks a finished run
      final Path tmp = dir.resolve("summary.json.tmp");
      Files.writeString(tmp, JSON.writeValueAsString(o.result()), StandardCharsets.UTF_8);
      Files.move(tmp, summary, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
      return o.result();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static synchronized void report(PrintStream p, int done, int total, int skipped, long start) {
    if (p == null) {
      return;
    }
    final double elapsed = (System.nanoTime() - start) / 1e9;
    final double eta = done > 0 ? elapsed / done * (total - done) : 0;
    final int width = 30;
    final int filled = (int) Math.round(width * (double) done / total);
    p.printf(Locale.ROOT, "\r[%s%s] %d/%d runs (%d resumed)  %.1f s elapsed, ETA %.0f s ", "#".repeat(filled),
        ".".repeat(width - filled), done, total, skipped, elapsed, eta);
    p.flush();
  }
}
