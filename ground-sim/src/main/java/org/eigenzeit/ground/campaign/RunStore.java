package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The run folders of a campaign: {@code runs/<run>/seed-<n>/timeseries.csv}, then {@code
 * summary.json} (written last and atomically, so its presence marks a finished run). A stored run
 * is reused only when its key equals the run's key now (same canonical scenario, same code, same
 * seed); otherwise it is run again.
 */
public final class RunStore {
  private RunStore() {}

  /** What a look at a stored run found. */
  public enum State {
    /** no finished run stored */
    ABSENT,
    /** a finished run with the same key: reuse it */
    CURRENT,
    /** a finished run with another key (inputs or code changed): run again */
    STALE
  }

  /**
   * Looks at a run's folder.
   *
   * @param out the campaign folder
   * @param spec the run
   * @param key the run's key now
   * @return what is stored
   */
  public static State state(Path out, RunSpec spec, String key) {
    final Path dir = out.resolve(spec.folder());
    final Path summary = dir.resolve("summary.json");
    if (!Files.isRegularFile(summary) || !Files.isRegularFile(dir.resolve("timeseries.csv"))) {
      return State.ABSENT;
    }
    try {
      final StoredRun s = Json.read(Files.readString(summary, StandardCharsets.UTF_8), StoredRun.class);
      return key.equals(s.runKey()) ? State.CURRENT : State.STALE;
    } catch (IOException e) {
      return State.STALE;
    }
  }

  /**
   * Reads a stored run that must be current.
   *
   * @param out the campaign folder
   * @param spec the run
   * @param key the run's key
   * @return the stored run
   * @throws IOException when it is missing or has another key
   */
  public static StoredRun read(Path out, RunSpec spec, String key) throws IOException {
    final Path summary = out.resolve(spec.folder()).resolve("summary.json");
    if (!Files.isRegularFile(summary)) {
      throw new IOException(summary + ": the run " + spec.runName() + " seed " + spec.seed() + " has not finished");
    }
    final StoredRun s = Json.read(Files.readString(summary, StandardCharsets.UTF_8), StoredRun.class);
    if (!key.equals(s.runKey())) {
      throw new IOException(summary + ": the stored run was made from other inputs or code (run key " + s.runKey()
          + ", expected " + key + ")");
    }
    return s;
  }

  /**
   * Writes a run's files: the time series first, the summary last and atomically.
   *
   * @param out the campaign folder
   * @param o the task's output
   * @throws IOException on a write failure
   */
  public static void write(Path out, RunTask.Output o) throws IOException {
    final Path dir = out.resolve(o.folder());
    Files.createDirectories(dir);
    Json.writeAtomically(dir.resolve("timeseries.csv"), o.timeSeriesCsv());
    Json.writeAtomically(dir.resolve("summary.json"), o.summaryJson());
  }
}
