package org.eigenzeit.ground.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import org.eigenzeit.ground.truth.EstimateErrors;
import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.ground.truth.OscillatorModel;
import org.eigenzeit.onboard.body.CentralBody;

/**
 * Reads scenario files strictly. One YAML document holding one mapping; every key known, once; no
 * lists, aliases, anchors or tags; numbers written as decimal numbers (no quotes, no {@code .inf},
 * hex or underscores), whole numbers where a count is meant; every value inside its range and
 * consistent with the others; epochs calendar-valid and, in UTC, before the leap-second table's
 * expiry. Every refusal reads {@code file:line: key: what, found X, allowed Y}.
 */
public final class ScenarioReader {
  private static final Pattern DECIMAL = Pattern.compile("[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?");
  private static final Pattern WHOLE = Pattern.compile("[-+]?\\d+");
  private static final Pattern NAME = Pattern.compile("[A-Za-z0-9_-]{1,64}");
  private static final int MAX_BYTES = 1 << 20;

  private ScenarioReader() {}

  /**
   * Reads a scenario file; relative trajectory files resolve against its folder.
   *
   * @param path the YAML file
   * @return the scenario
   * @throws IOException when the file cannot be read
   * @throws ScenarioException when anything in it is refused
   */
  public static Scenario read(Path path) throws IOException {
    final Path abs = path.toAbsolutePath();
    final Path dir = abs.getParent();
    return parse(String.valueOf(path), Files.readAllBytes(path), dir == null ? Path.of(".") : dir);
  }

  /**
   * Reads a scenario from a stream (built-in scenarios); relative files resolve against ".".
   *
   * @param file name for messages
   * @param in the YAML bytes
   * @return the scenario
   * @throws IOException when the stream cannot be read
   */
  public static Scenario parse(String file, InputStream in) throws IOException {
    return parse(file, in.readAllBytes(), Path.of("."));
  }

  /**
   * Reads a scenario from bytes.
   *
   * @param file name for messages
   * @param bytes the YAML bytes (UTF-8)
   * @param baseDir folder for relative trajectory files
   * @return the scenario
   */
  public static Scenario parse(String file, byte[] bytes, Path baseDir) {
    if (bytes.length > MAX_BYTES) {
      throw new ScenarioException(file, 1, "", "the file is too large for a scenario", bytes.length + " bytes",
          "up to " + MAX_BYTES + " bytes");
    }
    return parse(file, decode(file, bytes), baseDir);
  }

  /**
   * Reads a scenario from text.
   *
   * @param file name for messages
   * @param text the YAML text
   * @param baseDir folder for relative trajectory files
   * @return the scenario
   */
  public static Scenario parse(String file, String text, Path baseDir) {
    final String t = text.startsWith("\uFEFF") ? text.substring(1) : text;
    final String[] lines = t.split("\n", -1);
    for (int i = 0; i < lines.length; i++) {
      final String l = lines[i];
      int k = 0;
      while (k < l.length() && (l.charAt(k) == ' ' || l.charAt(k) == '\t')) {
        if (l.charAt(k) == '\t') {
          throw new ScenarioException(file, i + 1, "", "a tab in the indentation", "a tab character",
              "spaces for indentation");
        }
        k++;
      }
    }
    return new Resolver(file, YamlTree.parse(file, t), baseDir).scenario();
  }

  static Scenario fromResolved(String label, Map<String, String> resolved) {
    return parse(label, CanonicalYaml.write(resolved), Path.of("."));
  }

  private static String decode(String file, byte[] bytes) {
    try {
      return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
          .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
    } catch (CharacterCodingException e) {
      int bad = 0;
      while (bad < bytes.length && bytes[bad] >= 0) {
        bad++;
      }
      // The first non-ASCII byte is where decoding can first fail; name its line.
      int line = 1;
      for (int i = 0; i < bad && i < bytes.length; i++) {
        if (bytes[i] == '\n') {
          line++;
        }
      }
      throw new ScenarioException(file, line, "", "the text is not UTF-8",
          String.format(Locale.ROOT, "byte 0x%02X", bytes[Math.min(bad, bytes.length - 1)] & 0xff), "UTF-8 text");
    }
  }

  /** Typed, range-checked access to the tree; records every resolved key in canonical order. */
  private static final class Resolver {
    final String file;
    final YamlTree.Mapping root;
    final Path baseDir;
    final Map<String, String> resolved = new LinkedHashMap<>();

    Resolver(String file, YamlTree.Mapping root, Path baseDir) {
      this.file = file;
      this.root = root;
      this.baseDir = baseDir;
    }

    Scenario scenario() {
      known("", "name", "description", "span_h", "cycle_s", "epoch", "time_scale", "ut1_minus_tt_s",
          "initial_time_error_ns", "seeds", "output_every_s", "orbit", "oscillator", "model", "estimate_errors",
          "measurements", "servo", "actuator", "budget", "lunar_table");
      final String name = text("name", null);
      if (!NAME.matcher(name).matches()) {
        fail("name", "not a valid scenario name", "'" + YamlTree.clip(name) + "'", "letters, digits, '-' and '_', 1 to 64");
      }
      final String description = text("description", "");
      final double spanH = number("span_h", 24, 0.01, 24 * 30);
      final int cycleS = whole("cycle_s", 1, 1, 60);
      final String timeScale = choice("time_scale", "TT", List.of("TT", "TAI", "GPS", "UTC"), true);
      final String epoch = text("epoch", "2026-10-01T00:00:00");
      long label = 0;
      try {
        label = EpochCheck.check(epoch, timeScale, spanH * 3600);
      } catch (EpochCheck.Refusal e) {
        fail(node("epoch") == null ? "time_scale" : "epoch", e.what, e.found, e.allowed);
      }
      // Default UT1 - TT = -(TT - TAI) - (TAI - UTC) + (UT1 - UTC) with UT1 - UTC taken as 0: TT - TAI =
      // 32.184 s (IAU 1991 Resolution A4), TAI - UTC from the shipped leap-second list at the epoch,
      // and |UT1 - UTC| < 0.9 s by the definition of UTC (ITU-R TF.460-6), so the default is within 0.9 s.
      final long utcLabel = "UTC".equals(timeScale) ? label : label - 60;
      final double ut1 = number("ut1_minus_tt_s", -(32.184 + EpochCheck.taiMinusUtcS(utcLabel)), -1000, 1000);
      final double initialNs = number("initial_time_error_ns", 1000, -1e9, 1e9);
      final int seeds = whole("seeds", 2, 1, 10_000);
      final int outputEvery = whole("output_every_s", 10, 1, 86_400);
      if (outputEvery % cycleS != 0) {
        fail("output_every_s", "not a whole number of cycles", Integer.toString(outputEvery),
            "a multiple of cycle_s = " + cycleS);
      }
      final Scenario.OrbitInput orbit = orbit();
      final OscillatorModel osc = oscillator();
      final Scenario.OnboardModel model = model(orbit.body());
      final EstimateErrors errors = errors();
      final MeasurementPlan plan = measurements(cycleS, spanH);
      final ServoSettings servo = servo(osc, plan);
      known("actuator", "quantum", "delay_cycles");
      final Scenario.ActuatorSpec actuator = new Scenario.ActuatorSpec(number("actuator.quantum", 0, 0, 1e-9),
          whole("actuator.delay_cycles", 1, 0, 100));
      final TimingBudget budget = budget(spanH);
      final Scenario.LunarTable lunarTable = lunarTable(orbit, spanH);
      return new Scenario(name, description, new Scenario.Timing(spanH, cycleS, epoch, timeScale, outputEvery, seeds,
          initialNs, ut1), orbit, osc, model, errors, plan, servo, actuator, budget, lunarTable, resolved);
    }

    /**
     * The uplinked lunar time table of a Moon-centred run (none for the Earth): its span from the run's
     * start (default: one hour before it to one hour after its end) and an optional damage.
     */
    private Scenario.LunarTable lunarTable(Scenario.OrbitInput orbit, double spanH) {
      if (orbit.body().centre() != org.eigenzeit.onboard.body.CentralBody.CENTRE_MOON) {
        if (node("lunar_table") != null) {
          fail("lunar_table", "a lunar time table for an Earth orbit", "orbit.body earth", "lunar_table only with "
              + "orbit.body moon");
        }
        return null;
      }
      known("lunar_table", "start_h", "span_h", "damage");
      final double startH = number("lunar_table.start_h", -1, -24, spanH);
      final double tableH = number("lunar_table.span_h", spanH + 1 - startH, 1, 64 * 24);
      final String damage = choice("lunar_table.damage", "none", List.of("none", "crc", "absent"), false);
      return new Scenario.LunarTable(startH, tableH, damage);
    }

    private Scenario.OrbitInput orbit() {
      known("orbit", "body", "trajectory", "sma_km", "ecc", "inc_deg", "raan_deg", "argp_deg", "anomaly_deg",
          "srp_cr_area_over_mass_m2_per_kg", "drag_cd_area_over_mass_m2_per_kg");
      Scenario.Elements elements = null;
      Scenario.ExternalOrbit trajectory = null;
      if (node("orbit.trajectory") != null) {
        if (node("orbit.trajectory.ut1_minus_tt_s") != null) {
          fail("orbit.trajectory.ut1_minus_tt_s", "this key moved", "it under orbit.trajectory",
              "the top-level key ut1_minus_tt_s (one UT1 - TT for the whole run)");
        }
        for (String k : List.of("body", "sma_km", "ecc", "inc_deg", "raan_deg", "argp_deg", "anomaly_deg")) {
          if (node("orbit." + k) != null) {
            fail("orbit." + k, "elements and a trajectory file together", "both 'orbit." + k + "' and 'orbit.trajectory'",
                "either the elements or 'orbit.trajectory' (an Earth orbit)");
          }
        }
        trajectory = trajectory();
      } else {
        elements = elements();
      }
      final double srp = number("orbit.srp_cr_area_over_mass_m2_per_kg", 0, 0, 1);
      final double drag = number("orbit.drag_cd_area_over_mass_m2_per_kg", 0, 0, 1);
      return new Scenario.OrbitInput(elements, trajectory, srp, drag);
    }

    private Scenario.Elements elements() {
      final String body = choice("orbit.body", "earth", List.of("earth", "moon"), false);
      final CentralBody cb = "moon".equals(body) ? CentralBody.MOON : CentralBody.EARTH;
      final double aKm = number("orbit.sma_km", Double.NaN, cb.minRadiusM() / 1e3, 2e6);
      final double e = number("orbit.ecc", 0, 0, 0.95);
      if (aKm * 1e3 * (1 - e) < cb.minRadiusM()) {
        fail("orbit.ecc", "the perigee is below the body's surface",
            String.format(Locale.ROOT, "perigee radius %.0f km from sma_km = %s and ecc = %s", aKm * (1 - e), num(aKm),
                num(e)), String.format(Locale.ROOT, "a perigee radius of at least %.0f km", cb.minRadiusM() / 1e3));
      }
      return new Scenario.Elements(body, aKm, e, number("orbit.inc_deg", 0, 0, 180), number("orbit.raan_deg", 0, -360, 360),
          number("orbit.argp_deg", 0, -360, 360), number("orbit.anomaly_deg", 0, -360, 360));
    }

    private Scenario.ExternalOrbit trajectory() {
      known("orbit.trajectory", "format", "file", "satellite", "sha256");
      final String format = choice("orbit.trajectory.format", null, List.of("oem", "sp3"), false);
      final String given = text("orbit.trajectory.file", null);
      final Path f = baseDir.resolve(given).toAbsolutePath().normalize();
      if (!Files.isRegularFile(f)) {
        fail("orbit.trajectory.file", "no such file", "'" + YamlTree.clip(given) + "' (" + YamlTree.clip(f.toString()) + ")",
            "an existing OEM or SP3 file, relative to the scenario file's folder");
      }
      resolved.put("orbit.trajectory.file", CanonicalYaml.quote(f.toString()));
      final String sat = text("orbit.trajectory.satellite", format.equals("sp3") ? null : "");
      final String actual;
      try {
        actual = Scenario.sha256Hex(Files.readAllBytes(f));
      } catch (IOException e) {
        throw new ScenarioException(file, lineOf("orbit.trajectory.file"), "orbit.trajectory.file",
            "the file cannot be read", "'" + YamlTree.clip(f.toString()) + "'", "a readable file");
      }
      final String stated = text("orbit.trajectory.sha256", actual).toLowerCase(Locale.ROOT);
      if (!stated.equals(actual)) {
        fail("orbit.trajectory.sha256", "the trajectory file's content changed", "SHA-256 " + actual + " of the file",
            "the stated " + YamlTree.clip(stated));
      }
      resolved.put("orbit.trajectory.sha256", CanonicalYaml.quote(actual));
      return new Scenario.ExternalOrbit(format, f, sat, actual);
    }

    private OscillatorModel oscillator() {
      final String[] keys = {"white_pm_sigma_ps", "white_fm_adev_1s", "flicker_fm_floor", "random_walk_fm_adev_1s",
        "drift_per_day", "initial_frequency"};
      known("oscillator", "preset", keys[0], keys[1], keys[2], keys[3], keys[4], keys[5]);
      final String preset = choice("oscillator.preset", "rubidium", List.of("quartz", "rubidium", "passive-maser",
          "caesium"), false);
      final OscillatorModel base = OscillatorModel.preset(preset);
      final double pm = number("oscillator.white_pm_sigma_ps", base.whitePmSigmaXS() * 1e12, 0, 1e6);
      final double wfm = number("oscillator.white_fm_adev_1s", base.whiteFmAdev1s(), 0, 1e-8);
      final double ffm = number("oscillator.flicker_fm_floor", base.flickerFmFloor(), 0, 1e-8);
      final double rw = number("oscillator.random_walk_fm_adev_1s", base.randomWalkFmAdev1s(), 0, 1e-8);
      final double drift = number("oscillator.drift_per_day", base.driftPerDay(), -1e-7, 1e-7);
      final double f0 = number("oscillator.initial_frequency", base.initialFrequency(), -1e-5, 1e-5);
      final OscillatorModel m = new OscillatorModel(base.name(), pm * 1e-12, wfm, ffm, rw, drift, f0);
      final List<String> changed = new ArrayList<>();
      final double[] a = {m.whitePmSigmaXS(), wfm, ffm, rw, drift, f0};
      final double[] b = {base.whitePmSigmaXS(), base.whiteFmAdev1s(), base.flickerFmFloor(), base.randomWalkFmAdev1s(),
        base.driftPerDay(), base.initialFrequency()};
      for (int i = 0; i < a.length; i++) {
        if (Double.compare(a[i], b[i]) != 0) {
          changed.add(keys[i]);
        }
      }
      if (changed.isEmpty()) {
        return m;
      }
      return new OscillatorModel("user-defined (" + preset + " preset with " + String.join(", ", changed) + " changed)",
          m.whitePmSigmaXS(), wfm, ffm, rw, drift, f0);
    }

    private Scenario.OnboardModel model(CentralBody body) {
      known("model", "level", "degree");
      final String level = choice("model.level", "full", Scenario.LEVELS, false);
      final int degree = whole("model.degree", 0, 0, 36);
      if (degree == 1) {
        fail("model.degree", "degree 1 has no harmonic term", "1", "0 (recommended for the orbit) or 2 .. 36");
      }
      if (degree != 0 && body.centre() != CentralBody.CENTRE_EARTH) {
        fail("model.degree", "the Moon's onboard model has no harmonic degree", Integer.toString(degree),
            "0 for the Moon (its model is J2)");
      }
      return new Scenario.OnboardModel(level, degree);
    }

    private EstimateErrors errors() {
      known("estimate_errors", "position_noise_m", "velocity_noise_m_per_s", "radial_bias_m", "gap_every_s",
          "gap_length_s", "corrupt_probability");
      final double pos = number("estimate_errors.position_noise_m", 0, 0, 1e4);
      final double vel = number("estimate_errors.velocity_noise_m_per_s", 0, 0, 100);
      final double bias = number("estimate_errors.radial_bias_m", 0, -1e4, 1e4);
      final double gapEvery = number("estimate_errors.gap_every_s", 0, 0, 1e7);
      final double gapLength = number("estimate_errors.gap_length_s", 0, 0, 1e6);
      if (gapEvery > 0 != gapLength > 0) {
        fail(gapEvery > 0 ? "estimate_errors.gap_length_s" : "estimate_errors.gap_every_s",
            "gaps need both a period and a length", "gap_every_s = " + num(gapEvery) + ", gap_length_s = "
                + num(gapLength), "both above 0 (gaps) or both 0 (no gaps)");
      }
      if (gapEvery > 0 && !(gapLength < gapEvery)) {
        fail("estimate_errors.gap_length_s", "a gap as long as its period leaves no orbit samples",
            num(gapLength) + " s with gap_every_s = " + num(gapEvery), "less than gap_every_s");
      }
      return new EstimateErrors(pos, vel, bias, gapEvery, gapLength,
          number("estimate_errors.corrupt_probability", 0, 0, 0.5));
    }

    private MeasurementPlan measurements(int cycleS, double spanH) {
      known("measurements", "source", "sigma_ns", "every_s", "outage_start_h", "outage_length_h", "outlier_probability",
          "outlier_ns");
      final int source = whole("measurements.source", 0, 0, 3);
      final double sigmaNs = number("measurements.sigma_ns", 10, 0.001, 1e6);
      final double every = number("measurements.every_s", 1, 0, 86_400);
      if (every != 0 && (every % cycleS != 0)) {
        fail("measurements.every_s", "not a whole number of cycles", num(every),
            "0 (no measurements) or a multiple of cycle_s = " + cycleS);
      }
      final double outStart = number("measurements.outage_start_h", -1, -1, 24 * 30);
      final double outLength = number("measurements.outage_length_h", 0, 0, 24 * 30);
      if (outStart != -1 && outStart < 0) {
        fail("measurements.outage_start_h", "not a start time", num(outStart), "-1 (no outage) or 0 .. " + num(spanH));
      }
      if (outStart >= 0 && !(outStart < spanH)) {
        fail("measurements.outage_start_h", "the outage starts after the run ends", num(outStart) + " h",
            "before span_h = " + num(spanH) + " h");
      }
      if (outStart >= 0 && !(outLength > 0)) {
        fail("measurements.outage_length_h", "an outage needs a length", num(outLength), "above 0 with outage_start_h");
      }
      if (outStart < 0 && outLength > 0) {
        fail("measurements.outage_length_h", "an outage length without a start", num(outLength) + " h",
            "outage_start_h from 0 (or no outage_length_h)");
      }
      final double outlierP = number("measurements.outlier_probability", 0, 0, 0.5);
      final double outlierNs = number("measurements.outlier_ns", 0, 0, 1e9);
      if (outlierP > 0 && !(outlierNs > 0)) {
        fail("measurements.outlier_ns", "outliers need a size", num(outlierNs), "above 0 with outlier_probability");
      }
      return new MeasurementPlan(source, sigmaNs * 1e-9, every, outStart * 3600, outLength * 3600, outlierP,
          outlierNs * 1e-9);
    }

    private ServoSettings servo(OscillatorModel osc, MeasurementPlan plan) {
      known("servo", "time_constant_track_s", "time_constant_acquire_s", "steer_resolution", "steer_max",
          "slew_max_per_s", "gate_sigma", "track_enter_ns", "track_exit_ns", "coast_after_s", "coast_max_h",
          "phase_step_threshold_ns", "phase_step_resolution_ns");
      final double tTrack = number("servo.time_constant_track_s", 3000, 10, 1e6);
      final double tAcq = number("servo.time_constant_acquire_s", Math.min(100, tTrack), 1, 1e6);
      if (tAcq > tTrack) {
        fail("servo.time_constant_acquire_s", "the acquisition time constant exceeds the tracking one",
            num(tAcq) + " s with time_constant_track_s = " + num(tTrack) + " s", "at most time_constant_track_s");
      }
      final double steerRes = number("servo.steer_resolution", 1e-15, 0, 1e-9);
      final double steerMax = number("servo.steer_max", 1e-7, 1e-12, 1e-4);
      final double slew = number("servo.slew_max_per_s", 1e-10, 1e-18, 1e-6);
      final double gate = number("servo.gate_sigma", 6, 2, 100);
      final double enter = number("servo.track_enter_ns", Math.max(50, 5 * plan.sigmaS() * 1e9), 0.001, 1e9);
      final double exit = number("servo.track_exit_ns", Math.max(1000, 100 * plan.sigmaS() * 1e9), 0.002, 1e10);
      if (!(exit > enter)) {
        fail("servo.track_exit_ns", "the track-exit threshold must exceed the track-enter threshold",
            num(exit) + " ns with track_enter_ns = " + num(enter) + " ns", "more than track_enter_ns");
      }
      final double coastAfter = number("servo.coast_after_s", Math.max(60, 3 * plan.everyS()), 1, 1e6);
      final double coastMaxH = number("servo.coast_max_h", 24 * 7, 0.001, 24 * 365);
      if (coastMaxH * 3600 < coastAfter) {
        fail("servo.coast_max_h", "the longest coast is shorter than the wait before coasting",
            num(coastMaxH) + " h with coast_after_s = " + num(coastAfter) + " s", "at least coast_after_s / 3600 h");
      }
      final double psThreshold = number("servo.phase_step_threshold_ns", 1000, 0, 1e10);
      final double psResolution = number("servo.phase_step_resolution_ns", 1, 0, 1e6);
      final ServoSettings s = new ServoSettings(tTrack, tAcq, steerRes, steerMax, slew, gate, enter, exit, coastAfter,
          coastMaxH, psThreshold, psResolution);
      final double rw = s.randomWalkFm(osc);
      if (rw > 1e-9) {
        fail("oscillator.flicker_fm_floor", "the filter's random-walk FM noise sqrt(random_walk_fm_adev_1s^2 + "
            + "flicker_fm_floor^2 / servo.time_constant_track_s) exceeds the core table's limit",
            num(rw) + " from random_walk_fm_adev_1s = " + num(osc.randomWalkFmAdev1s()) + ", flicker_fm_floor = "
                + num(osc.flickerFmFloor()) + ", time_constant_track_s = " + num(tTrack), "at most 1e-9");
      }
      final int refused = ServoCheck.refusedField(s.tableImage(osc, plan));
      if (refused >= 0) {
        fail("servo", "the onboard core refuses the servo table made from this scenario (its "
            + ServoSettings.fieldName(refused) + ")", "a value outside the core's table limits",
            "values inside the limits in docs/servo.md");
      }
      return s;
    }

    private TimingBudget budget(double spanH) {
      if (node("budget") == null) {
        return TimingBudget.NONE;
      }
      known("budget", "max_abs_time_error_ns", "settle_within_s", "rms_time_error_ns", "adev_max", "adev_tau_s",
          "percentile");
      final double maxAbs = number("budget.max_abs_time_error_ns", Double.NaN, 1e-3, 1e9);
      final double settle = number("budget.settle_within_s", Double.NaN, 0, spanH * 3600);
      final double rms = optional("budget.rms_time_error_ns", 1e-3, 1e9);
      final double adev = optional("budget.adev_max", 1e-20, 1e-3);
      final double tau = Double.isNaN(adev) ? Double.NaN : number("budget.adev_tau_s", Double.NaN, 1, spanH * 3600 / 4);
      if (Double.isNaN(adev) && node("budget.adev_tau_s") != null) {
        fail("budget.adev_tau_s", "an averaging time without an ADEV limit", "adev_tau_s alone",
            "adev_tau_s together with adev_max");
      }
      return new TimingBudget(maxAbs, settle, rms, adev, tau, number("budget.percentile", 95, 50, 100));
    }

    // ---- typed access ----

    YamlTree.Node node(String key) {
      YamlTree.Node n = root;
      for (String part : key.split("\\.")) {
        if (!(n instanceof YamlTree.Mapping m)) {
          return null;
        }
        n = m.entries().get(part);
        if (n == null) {
          return null;
        }
      }
      return n;
    }

    int lineOf(String key) {
      String k = key;
      while (true) {
        final YamlTree.Node n = node(k);
        if (n != null) {
          return n.line();
        }
        final int dot = k.lastIndexOf('.');
        if (dot < 0) {
          return 1;
        }
        k = k.substring(0, dot);
      }
    }

    void fail(String key, String what, String found, String allowed) {
      throw new ScenarioException(file, lineOf(key), key, what, found, allowed);
    }

    void known(String section, String... keys) {
      final YamlTree.Node n = section.isEmpty() ? root : node(section);
      if (n == null) {
        return;
      }
      if (!(n instanceof YamlTree.Mapping m)) {
        fail(section, "must be a section of keys", describe(n), "a mapping (keys indented below '" + section + ":')");
        return;
      }
      final Set<String> allowed = Set.of(keys);
      for (Map.Entry<String, YamlTree.Node> e : m.entries().entrySet()) {
        if (!allowed.contains(e.getKey())) {
          final String full = section.isEmpty() ? e.getKey() : section + "." + e.getKey();
          throw new ScenarioException(file, e.getValue().line(), full, "unknown key",
              "'" + YamlTree.clip(e.getKey()) + "'", String.join(", ", new TreeSet<>(allowed)));
        }
      }
    }

    private YamlTree.Scalar scalar(String key) {
      final YamlTree.Node n = node(key);
      if (n == null) {
        return null;
      }
      if (!(n instanceof YamlTree.Scalar s)) {
        fail(key, "must be a single value", describe(n), "a value, not a section");
        return null;
      }
      if ("empty".equals(s.kind()) && s.text().isEmpty() || "~".equals(s.text()) && "empty".equals(s.kind())) {
        fail(key, "no value", "nothing after the ':'", "a value, or leave the key out for its default");
      }
      return s;
    }

    String text(String key, String def) {
      final YamlTree.Scalar s = scalar(key);
      final String v;
      if (s == null) {
        if (def == null) {
          fail(key, "required key missing", "nothing", "a value (see docs/campaigns.md)");
        }
        v = def;
      } else {
        v = s.text();
        for (int i = 0; i < v.length(); i++) {
          if (Character.isISOControl(v.charAt(i))) {
            fail(key, "a control character in a text value", String.format(Locale.ROOT, "U+%04X", (int) v.charAt(i)),
                "printable text on one line");
          }
        }
        if (v.length() > 400) {
          fail(key, "text too long", v.length() + " characters", "up to 400");
        }
      }
      resolved.put(key, CanonicalYaml.quote(v));
      return v;
    }

    String choice(String key, String def, List<String> allowed, boolean upper) {
      final String raw = text(key, def);
      final String v = upper ? raw.toUpperCase(Locale.ROOT) : raw.toLowerCase(Locale.ROOT);
      if (!allowed.contains(v)) {
        fail(key, "not one of the accepted values", "'" + YamlTree.clip(raw) + "'", String.join(", ", allowed));
      }
      resolved.put(key, CanonicalYaml.quote(v));
      return v;
    }

    double number(String key, double def, double min, double max) {
      final YamlTree.Scalar s = scalar(key);
      final double v;
      if (s == null) {
        if (Double.isNaN(def)) {
          fail(key, "required key missing", "nothing", num(min) + " .. " + num(max));
        }
        v = def;
      } else {
        v = parseNumber(key, s, min, max);
      }
      resolved.put(key, Double.toString(v));
      return v;
    }

    double optional(String key, double min, double max) {
      return node(key) == null ? Double.NaN : number(key, Double.NaN, min, max);
    }

    private double parseNumber(String key, YamlTree.Scalar s, double min, double max) {
      if (s.quoted() || !DECIMAL.matcher(s.text()).matches()) {
        fail(key, "not a decimal number", describe(s), num(min) + " .. " + num(max));
      }
      final double v = Double.parseDouble(s.text());
      if (!(v >= min && v <= max)) {
        fail(key, "out of range", YamlTree.clip(s.text()), num(min) + " .. " + num(max));
      }
      return v;
    }

    int whole(String key, int def, int min, int max) {
      final YamlTree.Scalar s = scalar(key);
      final int v;
      if (s == null) {
        v = def;
      } else {
        if (s.quoted() || !WHOLE.matcher(s.text()).matches()) {
          fail(key, "not a whole number", describe(s), "a whole number " + min + " .. " + max);
        }
        final long l;
        try {
          l = Long.parseLong(s.text().startsWith("+") ? s.text().substring(1) : s.text());
        } catch (NumberFormatException e) {
          fail(key, "out of range", YamlTree.clip(s.text()), min + " .. " + max);
          return def;
        }
        if (l < min || l > max) {
          fail(key, "out of range", s.text(), min + " .. " + max);
        }
        v = (int) l;
      }
      resolved.put(key, Integer.toString(v));
      return v;
    }

    private static String describe(YamlTree.Node n) {
      if (n instanceof YamlTree.Mapping) {
        return "a section of keys";
      }
      final YamlTree.Scalar s = (YamlTree.Scalar) n;
      return s.quoted() ? "quoted text \"" + YamlTree.clip(s.text()) + "\"" : "'" + YamlTree.clip(s.text()) + "'";
    }
  }

  /**
   * A number for messages: plain where short, else in exponent form.
   *
   * @param v the number
   * @return its text
   */
  static String num(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e7) {
      return Long.toString((long) v);
    }
    final double a = Math.abs(v);
    if (a >= 1e-3 && a < 1e7) {
      return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
    return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+e", "e").replace("e+0", "e").replace("e-0", "e-")
        .replace("e+", "e");
  }
}
