package org.eigenzeit.ground.scenario;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Collections;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.truth.EstimateErrors;
import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.ground.truth.OscillatorModel;
import org.eigenzeit.onboard.body.CentralBody;

/**
 * One closed-loop scenario, resolved: every key of the file with its default filled in and checked
 * ({@link ScenarioReader}). Its canonical form ({@link #canonicalYaml()}) is a scenario file that
 * reads back into an equal scenario; its SHA-256 ({@link #contentHash()}) keys the runs of a
 * campaign. The format is described in docs/campaigns.md.
 *
 * @param name scenario name (letters, digits, '-' and '_'); it also seeds the run's random draws
 * @param description one line for reports
 * @param timing span, cycle, epoch and scale, output, seeds, initial error, UT1 - TT
 * @param orbit the initial orbit (elements) or an external trajectory, and the surface forces
 * @param oscillator the truth oscillator (its name says whether it is a preset or derived from one)
 * @param model the onboard model level and degree
 * @param errors orbit-estimate errors
 * @param measurements time-offset measurement plan
 * @param servo the servo settings of the file (the filter's noise model follows the oscillator)
 * @param actuator the steering hardware
 * @param budget the timing budget, or {@link TimingBudget#NONE}
 * @param lunarTable the uplinked lunar time table of a Moon-centred run, null for the Earth
 * @param resolved every key with its canonical value text, in canonical order
 */
public record Scenario(String name, String description, Timing timing, OrbitInput orbit, OscillatorModel oscillator,
    OnboardModel model, EstimateErrors errors, MeasurementPlan measurements, ServoSettings servo,
    ActuatorSpec actuator, TimingBudget budget, LunarTable lunarTable, Map<String, String> resolved) {

  /** Model levels accepted in {@code model.level}, in the order of the side-by-side comparison. */
  public static final java.util.List<String> LEVELS = java.util.List.of("none", "point-mass", "j2", "full");

  /** Immutable copy of the resolved keys. */
  public Scenario {
    resolved = Collections.unmodifiableMap(new LinkedHashMap<>(resolved));
  }

  /**
   * Run timing.
   *
   * @param spanH simulated span, h
   * @param cycleS core cycle, s
   * @param epoch start epoch text (ISO calendar or day-of-year form) in {@code timeScale}
   * @param timeScale TT, TAI, GPS or UTC
   * @param outputEveryS time-series decimation, s (a multiple of the cycle)
   * @param seeds Monte-Carlo seeds of a campaign
   * @param initialTimeErrorNs initial error of the onboard time, ns
   * @param ut1MinusTtS UT1 - TT for every Earth-fixed frame of the run, s
   */
  public record Timing(double spanH, int cycleS, String epoch, String timeScale, int outputEveryS, int seeds,
      double initialTimeErrorNs, double ut1MinusTtS) {
    /** @return the span, s */
    public double spanS() {
      return spanH * 3600;
    }

    /** @return the initial time error, s */
    public double initialTimeErrorS() {
      return initialTimeErrorNs * 1e-9;
    }
  }

  /**
   * Keplerian elements (true anomaly), as written in the file.
   *
   * @param body "earth" or "moon"
   * @param smaKm semi-major axis, km
   * @param ecc eccentricity
   * @param incDeg inclination, deg
   * @param raanDeg right ascension of the ascending node, deg
   * @param argpDeg argument of perigee, deg
   * @param anomalyDeg true anomaly, deg
   */
  public record Elements(String body, double smaKm, double ecc, double incDeg, double raanDeg, double argpDeg,
      double anomalyDeg) {
    /** @return the central body */
    public CentralBody centralBody() {
      return "moon".equals(body) ? CentralBody.MOON : CentralBody.EARTH;
    }

    /** @return the inertial initial state */
    public OrbitSpec spec() {
      return OrbitSpec.fromElements(centralBody(), smaKm * 1e3, ecc, incDeg, raanDeg, argpDeg, anomalyDeg);
    }
  }

  /**
   * An external truth trajectory.
   *
   * @param format "oem" or "sp3"
   * @param file the file (resolved against the scenario file's folder)
   * @param satellite satellite id for SP3 (for example "G05"), "" for OEM
   * @param sha256 the file's SHA-256 (checked when the scenario is read)
   */
  public record ExternalOrbit(String format, Path file, String satellite, String sha256) {}

  /**
   * The orbit: elements or an external trajectory (exactly one is non-null), and surface forces.
   *
   * @param elements Keplerian elements, or null
   * @param trajectory an external trajectory, or null
   * @param srp radiation-pressure Cr A/m of the truth, m^2/kg
   * @param drag drag Cd A/m of the truth, m^2/kg
   */
  public record OrbitInput(Elements elements, ExternalOrbit trajectory, double srp, double drag) {
    /** @return the central body (external trajectories are Earth orbits) */
    public CentralBody body() {
      return elements == null ? CentralBody.EARTH : elements.centralBody();
    }
  }

  /**
   * The onboard model.
   *
   * @param level none, point-mass, j2 or full
   * @param degree harmonic degree (0: recommended for the orbit)
   */
  public record OnboardModel(String level, int degree) {}

  /**
   * The steering hardware.
   *
   * @param quantum frequency quantum (0: none)
   * @param delayCycles command-to-effect delay, cycles
   */
  public record ActuatorSpec(double quantum, int delayCycles) {}

  /**
   * The lunar time table uplinked for a Moon-centred run (key {@code lunar_table}): fitted by the
   * ground along DE405 over [run start + startH, + spanH] of TT and activated before the first cycle.
   *
   * @param startH table start from the run's start, h (-24 to the run's span; default -1)
   * @param spanH table span, h (1 to 64 days; default to one hour past the run's end); a span that
   *     ends inside the run makes the table expire mid-run
   * @param damage "none"; "crc" (one bit of the uplinked image flipped: the core refuses it);
   *     "absent" (no table uplinked)
   */
  public record LunarTable(double startH, double spanH, String damage) {}

  /** @return the central body */
  public CentralBody body() {
    return orbit.body();
  }

  /** @return the canonical form: a scenario file with every key resolved, in a fixed order */
  public String canonicalYaml() {
    return CanonicalYaml.write(resolved);
  }

  /** @return SHA-256 (hex) of the canonical form */
  public String contentHash() {
    return sha256Hex(canonicalYaml().getBytes(StandardCharsets.UTF_8));
  }

  /**
   * The same scenario at another model level (for the side-by-side comparison).
   *
   * @param level a model level
   * @return the scenario with {@code model.level} replaced
   */
  public Scenario withLevel(String level) {
    return with("model.level", level);
  }

  /**
   * The same scenario with a shorter or longer span.
   *
   * @param hours span, h
   * @return the scenario with {@code span_h} replaced
   */
  public Scenario withSpanH(double hours) {
    return with("span_h", Double.toString(hours));
  }

  /**
   * The same scenario shortened (or lengthened) for a quick look: a measurement outage that would
   * start after the new end is dropped, the budget's settling deadline is cut to the span and an
   * ADEV criterion at a tau beyond a quarter of the span is dropped.
   *
   * @param hours span, h
   * @return the scenario
   */
  public Scenario shortenedTo(double hours) {
    final Map<String, String> m = new LinkedHashMap<>(resolved);
    m.put("span_h", Double.toString(hours));
    final double start = measurements.outageStartS() / 3600;
    if (start >= 0 && !(start < hours)) {
      m.put("measurements.outage_start_h", "-1.0");
      m.put("measurements.outage_length_h", "0.0");
    }
    if (budget.stated()) {
      m.put("budget.settle_within_s", Double.toString(Math.min(budget.settleWithinS(), hours * 3600)));
      if (budget.hasAdev() && budget.adevTauS() > hours * 3600 / 4) {
        m.remove("budget.adev_max");
        m.remove("budget.adev_tau_s");
      }
    }
    return ScenarioReader.fromResolved(name + " (shortened to " + hours + " h)", m);
  }

  /**
   * The same scenario with one resolved key replaced, read again in full (so every check runs).
   *
   * @param key a dotted key of {@link #resolved()}
   * @param value its new value text
   * @return the new scenario
   * @throws ScenarioException when the value is refused
   */
  public Scenario with(String key, String value) {
    return with(Map.of(key, value));
  }

  /**
   * The same scenario with resolved keys replaced together, read again in full.
   *
   * @param changes dotted keys of {@link #resolved()} and their new value texts
   * @return the new scenario
   * @throws ScenarioException when a value is refused
   */
  public Scenario with(Map<String, String> changes) {
    final Map<String, String> m = new LinkedHashMap<>(resolved);
    for (Map.Entry<String, String> e : new java.util.TreeMap<>(changes).entrySet()) {
      if (!resolved.containsKey(e.getKey())) {
        throw new IllegalArgumentException("no resolved key " + e.getKey());
      }
      m.put(e.getKey(), CanonicalYaml.scalarFor(e.getKey(), e.getValue()));
    }
    return ScenarioReader.fromResolved(name + " (changed: " + String.join(", ", new java.util.TreeSet<>(changes.keySet()))
        + ")", m);
  }

  /** Keys whose values are text (quoted in the canonical form). */
  static final Set<String> TEXT_KEYS = Set.of("name", "description", "epoch", "time_scale", "orbit.body",
      "orbit.trajectory.format", "orbit.trajectory.file", "orbit.trajectory.satellite", "orbit.trajectory.sha256",
      "oscillator.preset", "model.level");

  /**
   * SHA-256 of bytes, hex.
   *
   * @param bytes the bytes
   * @return 64 hex digits
   */
  public static String sha256Hex(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
    }
  }
}
