package org.eigenzeit.ground.campaign;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.truth.EstimateErrors;
import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.ground.truth.OscillatorModel;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.table.ServoParameters;

/**
 * One closed-loop scenario, read from YAML (Jackson's YAML data format over SnakeYAML) with
 * explicit units in every key and each value checked against its range; a bad value is reported
 * as {@code file: key 'a.b' = value: allowed range}. The format is described in docs/campaigns.md.
 *
 * @param name scenario name (letters, digits, '-' and '_')
 * @param description one line for reports
 * @param spanS simulated span, s
 * @param cycleS core cycle, s (whole seconds)
 * @param epoch start epoch (ISO), in {@code timeScale}
 * @param timeScale TT, TAI, GPS or UTC
 * @param orbit initial orbit
 * @param srp radiation-pressure Cr A/m of the truth, m^2/kg
 * @param drag drag Cd A/m of the truth, m^2/kg
 * @param oscillator the truth oscillator
 * @param modelLevel none, point-mass, j2 or full
 * @param degree onboard harmonic degree (0: recommended for the orbit)
 * @param errors orbit-estimate errors
 * @param measurements time-offset measurement plan
 * @param servo servo table values ({@link ServoParameters#FIELD_COUNT} values)
 * @param actuatorQuantum hardware frequency quantum
 * @param actuatorDelayCycles command-to-effect delay, cycles
 * @param initialTimeErrorS initial error of the onboard time, s
 * @param seeds number of Monte-Carlo seeds
 * @param outputEveryS time-series decimation, s
 * @param trajectory an external truth trajectory instead of the elements, or null
 */
public record Scenario(String name, String description, double spanS, int cycleS, String epoch, String timeScale,
    OrbitSpec orbit, double srp, double drag, OscillatorModel oscillator, String modelLevel, int degree,
    EstimateErrors errors, MeasurementPlan measurements, double[] servo, double actuatorQuantum,
    int actuatorDelayCycles, double initialTimeErrorS, int seeds, int outputEveryS, ExternalOrbit trajectory) {

  /**
   * An external truth trajectory.
   *
   * @param format "oem" or "sp3"
   * @param file the file (resolved against the scenario file's folder)
   * @param satellite satellite id for SP3 (for example "G05")
   * @param ut1MinusTtS UT1 - TT for the Earth-fixed frames, s
   */
  public record ExternalOrbit(String format, Path file, String satellite, double ut1MinusTtS) {}

  /** Defensive copy. */
  public Scenario {
    servo = servo.clone();
  }

  @Override
  public double[] servo() {
    return servo.clone();
  }

  /** Model levels accepted in {@code model.level}. */
  public static final Set<String> LEVELS = Set.of("none", "point-mass", "j2", "full");

  /**
   * The same scenario at another model level (for the side-by-side comparison).
   *
   * @param level a model level
   * @return a copy with that level and the name suffixed
   */
  public Scenario atLevel(String level) {
    return new Scenario(name + "@" + level, description, spanS, cycleS, epoch, timeScale, orbit, srp, drag, oscillator,
        level, degree, errors, measurements, servo, actuatorQuantum, actuatorDelayCycles, initialTimeErrorS, seeds,
        outputEveryS, trajectory);
  }

  /**
   * Reads a scenario file.
   *
   * @param path the YAML file
   * @return the scenario
   * @throws IOException when the file cannot be read
   * @throws ScenarioException when a value is missing, unknown or out of range
   */
  public static Scenario read(Path path) throws IOException {
    try (InputStream in = Files.newInputStream(path)) {
      final Path dir = path.toAbsolutePath().getParent();
      return parse(String.valueOf(path), in, dir == null ? Path.of(".") : dir);
    }
  }

  /**
   * Parses a scenario.
   *
   * @param file name for messages
   * @param in YAML text
   * @return the scenario
   * @throws IOException when the text cannot be read
   */
  public static Scenario parse(String file, InputStream in) throws IOException {
    return parse(file, in, Path.of("."));
  }

  /**
   * Parses a scenario whose relative file names resolve against a folder.
   *
   * @param file name for messages
   * @param in YAML text
   * @param baseDir folder for relative trajectory files
   * @return the scenario
   * @throws IOException when the text cannot be read
   */
  public static Scenario parse(String file, InputStream in, Path baseDir) throws IOException {
    final JsonNode root;
    try {
      root = new ObjectMapper(new YAMLFactory()).readTree(in);
    } catch (IOException e) {
      throw new ScenarioException(file + ": not valid YAML: " + e.getMessage());
    }
    if (root == null || !root.isObject()) {
      throw new ScenarioException(file + ": the scenario must be a YAML mapping");
    }
    final Reader r = new Reader(file, root);
    r.known("", "name", "description", "span_h", "cycle_s", "epoch", "time_scale", "orbit", "oscillator", "model",
        "estimate_errors", "measurements", "servo", "actuator", "initial_time_error_ns", "seeds", "output_every_s");
    final String name = r.text("name", null);
    if (!name.matches("[A-Za-z0-9_-]{1,64}")) {
      throw new ScenarioException(file + ": key 'name' = '" + name + "': letters, digits, '-' and '_', 1 to 64");
    }
    final double spanS = r.number("span_h", 24, 0.01, 24 * 30) * 3600;
    final double cycleValue = r.number("cycle_s", 1, 1, 60);
    final int cycleS = (int) Math.rint(cycleValue);
    if (Math.abs(cycleValue - cycleS) > 1e-9) {
      throw new ScenarioException(file + ": key 'cycle_s' must be a whole number of seconds");
    }
    r.known("orbit", "body", "trajectory", "sma_km", "ecc", "inc_deg", "raan_deg", "argp_deg", "anomaly_deg",
        "srp_cr_area_over_mass_m2_per_kg", "drag_cd_area_over_mass_m2_per_kg");
    final ExternalOrbit external = external(r, baseDir);
    final OrbitSpec orbit = external == null ? orbit(r) : null;
    r.known("oscillator", "preset", "white_pm_sigma_ps", "white_fm_adev_1s", "flicker_fm_floor",
        "random_walk_fm_adev_1s", "drift_per_day", "initial_frequency");
    final OscillatorModel base = r.preset("oscillator.preset", "rubidium");
    final OscillatorModel osc = new OscillatorModel(base.name(),
        r.number("oscillator.white_pm_sigma_ps", base.whitePmSigmaXS() * 1e12, 0, 1e6) * 1e-12,
        r.number("oscillator.white_fm_adev_1s", base.whiteFmAdev1s(), 0, 1e-8),
        r.number("oscillator.flicker_fm_floor", base.flickerFmFloor(), 0, 1e-8),
        r.number("oscillator.random_walk_fm_adev_1s", base.randomWalkFmAdev1s(), 0, 1e-8),
        r.number("oscillator.drift_per_day", base.driftPerDay(), -1e-7, 1e-7),
        r.number("oscillator.initial_frequency", base.initialFrequency(), -1e-5, 1e-5));
    r.known("model", "level", "degree");
    final String level = r.text("model.level", "full").toLowerCase(Locale.ROOT);
    if (!LEVELS.contains(level)) {
      throw new ScenarioException(file + ": key 'model.level' = '" + level + "': one of none, point-mass, j2, full");
    }
    final int degree = (int) r.number("model.degree", 0, 0, 36);
    r.known("estimate_errors", "position_noise_m", "velocity_noise_m_per_s", "radial_bias_m", "gap_every_s",
        "gap_length_s", "corrupt_probability");
    final EstimateErrors errors = new EstimateErrors(r.number("estimate_errors.position_noise_m", 0, 0, 1e4),
        r.number("estimate_errors.velocity_noise_m_per_s", 0, 0, 100), r.number("estimate_errors.radial_bias_m", 0, -1e4, 1e4),
        r.number("estimate_errors.gap_every_s", 0, 0, 1e7), r.number("estimate_errors.gap_length_s", 0, 0, 1e6),
        r.number("estimate_errors.corrupt_probability", 0, 0, 0.5));
    r.known("measurements", "source", "sigma_ns", "every_s", "outage_start_h", "outage_length_h", "outlier_probability",
        "outlier_ns");
    final MeasurementPlan plan = new MeasurementPlan((int) r.number("measurements.source", 0, 0, 3),
        r.number("measurements.sigma_ns", 10, 0.001, 1e6) * 1e-9, r.number("measurements.every_s", 1, 0, 86_400),
        r.number("measurements.outage_start_h", -1, -1, 24 * 30) * 3600,
        r.number("measurements.outage_length_h", 0, 0, 24 * 30) * 3600,
        r.number("measurements.outlier_probability", 0, 0, 0.5), r.number("measurements.outlier_ns", 0, 0, 1e9) * 1e-9);
    final double[] servo = servo(r, osc, plan);
    r.known("actuator", "quantum", "delay_cycles");
    return new Scenario(name, r.text("description", ""), spanS, cycleS, r.text("epoch", "2026-10-01T00:00:00"),
        r.text("time_scale", "TT"), orbit, r.number("orbit.srp_cr_area_over_mass_m2_per_kg", 0, 0, 1),
        r.number("orbit.drag_cd_area_over_mass_m2_per_kg", 0, 0, 1), osc, level, degree, errors, plan, servo,
        r.number("actuator.quantum", 0, 0, 1e-9), (int) r.number("actuator.delay_cycles", 1, 0, 100),
        r.number("initial_time_error_ns", 1000, -1e9, 1e9) * 1e-9, (int) r.number("seeds", 2, 1, 10_000),
        (int) r.number("output_every_s", 10, 1, 86_400), external);
  }

  private static ExternalOrbit external(Reader r, Path baseDir) {
    if (r.node("orbit.trajectory") == null) {
      return null;
    }
    r.known("orbit.trajectory", "format", "file", "satellite", "ut1_minus_tt_s");
    final String format = r.text("orbit.trajectory.format", null).toLowerCase(Locale.ROOT);
    if (!format.equals("oem") && !format.equals("sp3")) {
      throw new ScenarioException(r.file + ": key 'orbit.trajectory.format' = '" + format + "': oem or sp3");
    }
    final Path f = baseDir.resolve(r.text("orbit.trajectory.file", null));
    if (!Files.isRegularFile(f)) {
      throw new ScenarioException(r.file + ": key 'orbit.trajectory.file' = '" + f + "': no such file");
    }
    final String sat = r.text("orbit.trajectory.satellite", format.equals("sp3") ? null : "");
    return new ExternalOrbit(format, f, sat, r.number("orbit.trajectory.ut1_minus_tt_s", -69.2, -1000, 1000));
  }

  private static OrbitSpec orbit(Reader r) {
    r.known("orbit", "body", "trajectory", "sma_km", "ecc", "inc_deg", "raan_deg", "argp_deg", "anomaly_deg",
        "srp_cr_area_over_mass_m2_per_kg", "drag_cd_area_over_mass_m2_per_kg");
    final String bodyName = r.text("orbit.body", "earth").toLowerCase(Locale.ROOT);
    final CentralBody body = switch (bodyName) {
      case "earth" -> CentralBody.EARTH;
      case "moon" -> CentralBody.MOON;
      default -> throw new ScenarioException(r.file + ": key 'orbit.body' = '" + bodyName + "': earth or moon");
    };
    final double aKm = r.number("orbit.sma_km", Double.NaN, body.minRadiusM() / 1e3, 2e6);
    final double e = r.number("orbit.ecc", 0, 0, 0.95);
    if (aKm * 1e3 * (1 - e) < body.minRadiusM()) {
      throw new ScenarioException(String.format(Locale.ROOT,
          "%s: keys 'orbit.sma_km' = %s and 'orbit.ecc' = %s put the perigee at %.0f km: at least %.0f km needed",
          r.file, aKm, e, aKm * (1 - e), body.minRadiusM() / 1e3));
    }
    return OrbitSpec.fromElements(body, aKm * 1e3, e, r.number("orbit.inc_deg", 0, 0, 180),
        r.number("orbit.raan_deg", 0, -360, 360), r.number("orbit.argp_deg", 0, -360, 360),
        r.number("orbit.anomaly_deg", 0, -360, 360));
  }

  /** Servo table: typical values tied to the truth oscillator, then the file's overrides. */
  private static double[] servo(Reader r, OscillatorModel osc, MeasurementPlan plan) {
    r.known("servo", "time_constant_track_s", "time_constant_acquire_s", "steer_resolution", "steer_max",
        "slew_max_per_s", "gate_sigma", "track_enter_ns", "track_exit_ns", "coast_after_s", "coast_max_h",
        "phase_step_threshold_ns", "phase_step_resolution_ns");
    final double[] v = ServoParameters.typicalRubidium();
    final double tTrack = r.number("servo.time_constant_track_s", 3000, 10, 1e6);
    v[ServoParameters.F_TIME_CONSTANT_TRACK_S] = tTrack;
    v[ServoParameters.F_TIME_CONSTANT_ACQUIRE_S] = r.number("servo.time_constant_acquire_s", Math.min(100, tTrack), 1, tTrack);
    // The filter's noise model follows the oscillator: flicker FM folded into random-walk FM at
    // the loop's time constant (sigma_y^2 of RWFM equals the flicker floor at tau = T).
    v[ServoParameters.F_SIGMA_WHITE_FM] = Math.max(osc.whiteFmAdev1s(), 1e-14);
    v[ServoParameters.F_SIGMA_RANDOM_WALK_FM] = Math.sqrt(osc.randomWalkFmAdev1s() * osc.randomWalkFmAdev1s()
        + osc.flickerFmFloor() * osc.flickerFmFloor() / tTrack);
    v[ServoParameters.F_SIGMA_RANDOM_RUN] = Math.max(Math.abs(osc.driftPerDay()) / 86_400.0 / Math.sqrt(86_400.0), 1e-24);
    v[ServoParameters.F_SIGMA_SOURCE0 + plan.source()] = plan.sigmaS();
    v[ServoParameters.F_STEER_RESOLUTION] = r.number("servo.steer_resolution", 1e-15, 0, 1e-9);
    v[ServoParameters.F_STEER_MAX] = r.number("servo.steer_max", 1e-7, 1e-12, 1e-4);
    v[ServoParameters.F_SLEW_MAX_PER_S] = r.number("servo.slew_max_per_s", 1e-10, 1e-18, 1e-6);
    v[ServoParameters.F_GATE_SIGMA] = r.number("servo.gate_sigma", 6, 2, 100);
    v[ServoParameters.F_TRACK_ENTER_S] = r.number("servo.track_enter_ns", Math.max(50, 5 * plan.sigmaS() * 1e9), 0.001, 1e9) * 1e-9;
    v[ServoParameters.F_TRACK_EXIT_S] = r.number("servo.track_exit_ns", Math.max(1000, 100 * plan.sigmaS() * 1e9), 0.002, 1e10) * 1e-9;
    v[ServoParameters.F_COAST_AFTER_S] = r.number("servo.coast_after_s", Math.max(60, 3 * plan.everyS()), 1, 1e6);
    v[ServoParameters.F_COAST_MAX_S] = r.number("servo.coast_max_h", 24 * 7, 0.001, 24 * 365) * 3600;
    v[ServoParameters.F_PHASE_STEP_THRESHOLD_S] = r.number("servo.phase_step_threshold_ns", 1000, 0, 1e10) * 1e-9;
    v[ServoParameters.F_PHASE_STEP_RESOLUTION_S] = r.number("servo.phase_step_resolution_ns", 1, 0, 1e6) * 1e-9;
    v[ServoParameters.F_MEASUREMENT_MAX_AGE_S] = Math.max(10, 2 * plan.everyS());
    return v;
  }

  /** Typed, range-checked access to the YAML tree. */
  private static final class Reader {
    final String file;
    final JsonNode root;

    Reader(String file, JsonNode root) {
      this.file = file;
      this.root = root;
    }

    JsonNode node(String key) {
      JsonNode n = root;
      for (String part : key.split("\\.")) {
        if (n == null || !n.isObject()) {
          return null;
        }
        n = n.get(part);
      }
      return n;
    }

    void known(String section, String... keys) {
      final JsonNode n = section.isEmpty() ? root : node(section);
      if (n == null) {
        return;
      }
      if (!n.isObject()) {
        throw new ScenarioException(file + ": key '" + section + "' must be a mapping");
      }
      final Set<String> allowed = Set.of(keys);
      final Iterator<Map.Entry<String, JsonNode>> it = n.fields();
      while (it.hasNext()) {
        final String k = it.next().getKey();
        if (!allowed.contains(k)) {
          throw new ScenarioException(file + ": unknown key '" + (section.isEmpty() ? "" : section + ".") + k
              + "' (allowed: " + String.join(", ", new java.util.TreeSet<>(allowed)) + ")");
        }
      }
    }

    String text(String key, String def) {
      final JsonNode n = node(key);
      if (n == null || n.isNull()) {
        if (def == null) {
          throw new ScenarioException(file + ": key '" + key + "' is required");
        }
        return def;
      }
      if (!n.isValueNode()) {
        throw new ScenarioException(file + ": key '" + key + "' must be a text value");
      }
      return n.asText();
    }

    double number(String key, double def, double min, double max) {
      final JsonNode n = node(key);
      if (n == null || n.isNull()) {
        if (Double.isNaN(def)) {
          throw new ScenarioException(file + ": key '" + key + "' is required (range " + min + " .. " + max + ")");
        }
        return def;
      }
      if (!n.isNumber()) {
        throw new ScenarioException(file + ": key '" + key + "' = '" + n.asText() + "' is not a number (range "
            + min + " .. " + max + ")");
      }
      final double v = n.asDouble();
      if (!(v >= min && v <= max)) {
        throw new ScenarioException(file + ": key '" + key + "' = " + n.asText() + " is outside the allowed range "
            + min + " .. " + max);
      }
      return v;
    }

    OscillatorModel preset(String key, String def) {
      final String p = text(key, def);
      try {
        return OscillatorModel.preset(p);
      } catch (IllegalArgumentException e) {
        throw new ScenarioException(file + ": key '" + key + "' = '" + p + "': " + e.getMessage());
      }
    }
  }
}
