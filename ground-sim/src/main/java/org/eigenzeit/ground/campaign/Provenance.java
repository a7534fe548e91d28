package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.eigenzeit.ground.scenario.Scenario;

/**
 * Where a campaign's results come from: the code, the date, each scenario's origin and canonical
 * content hash (the resolved inputs are copied beside the results as {@code inputs/NAME.yaml}),
 * and the checksums of the data the runs read.
 *
 * @param tool the program
 * @param codeVersion {@link CodeVersion#describe()}
 * @param codeFingerprint {@link CodeVersion#fingerprint()}
 * @param javaRuntime the Java runtime's version
 * @param date the date the campaign's outputs were assembled (UTC, ISO 8601)
 * @param scenarios each scenario's name, origin, kind and content hash
 * @param data SHA-256 of each data file
 */
public record Provenance(String tool, String codeVersion, String codeFingerprint, String javaRuntime, String date,
    List<ScenarioSource> scenarios, Map<String, String> data) {

  /** Immutable copies. */
  public Provenance {
    scenarios = List.copyOf(scenarios);
    data = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(data));
  }

  /**
   * A scenario's source.
   *
   * @param name scenario name
   * @param origin its file or "built-in demo ..."
   * @param kind "built-in demo (invented mission)" or "supplied by the user"
   * @param contentHash SHA-256 of its canonical form
   * @param resolvedCopy the copy of its resolved inputs, relative to the campaign folder
   */
  public record ScenarioSource(String name, String origin, String kind, String contentHash, String resolvedCopy) {}

  /** Data files every run reads, by resource path. */
  static final List<String> DATA = List.of("/org/eigenzeit/ground/ephemeris/header.405",
      "/org/eigenzeit/ground/ephemeris/ascp2000.405.gz",
      "/org/eigenzeit/ground/ephemeris/ascp2020.405.gz", "/org/eigenzeit/ground/trajectory/leap-seconds.list",
      "/org/eigenzeit/onboard/gravity/egm96-normalized-deg36.txt");

  /**
   * The provenance of a plan.
   *
   * @param plan the campaign
   * @param date the assembly date
   * @return the provenance
   */
  public static Provenance of(CampaignPlan plan, Instant date) {
    final List<ScenarioSource> sources = new ArrayList<>();
    final Map<String, String> data = new LinkedHashMap<>();
    for (String r : DATA) {
      data.put(r.substring(r.lastIndexOf('/') + 1), resourceHash(r));
    }
    for (CampaignPlan.Entry e : plan.entries()) {
      final Scenario s = e.scenario();
      sources.add(new ScenarioSource(s.name(), e.origin(), e.builtIn() ? "built-in demo (invented mission)"
          : "supplied by the user", s.contentHash(), "inputs/" + s.name() + ".yaml"));
      if (s.orbit().trajectory() != null) {
        data.put(String.valueOf(s.orbit().trajectory().file().getFileName()), s.orbit().trajectory().sha256());
      }
    }
    final CodeVersion v = CodeVersion.current();
    return new Provenance("Eigenzeit ground-sim", v.describe(), v.fingerprint(), Runtime.version().toString(),
        date.toString(), sources, data);
  }

  private static String resourceHash(String resource) {
    try (InputStream in = Provenance.class.getResourceAsStream(resource)) {
      if (in == null) {
        throw new IllegalStateException("the data file " + resource + " is missing from the build");
      }
      return Scenario.sha256Hex(in.readAllBytes());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * The assembly date: {@code SOURCE_DATE_EPOCH} (seconds, the reproducible-builds convention) when
   * set, else now.
   *
   * @return the date
   */
  public static Instant dateNow() {
    final String sde = System.getenv("SOURCE_DATE_EPOCH");
    if (sde != null && sde.matches("\\d{1,12}")) {
      return Instant.ofEpochSecond(Long.parseLong(sde));
    }
    return Instant.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS);
  }

}
