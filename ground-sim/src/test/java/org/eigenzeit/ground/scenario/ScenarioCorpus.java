package org.eigenzeit.ground.scenario;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Generator of the malformed-scenario corpus (test scope): a valid base scenario and systematic
 * mutations of it, each with its expected verdict ("refuse" or "accept") and a fragment the
 * refusal message must contain. {@link ScenarioCorpusTest} checks that the committed corpus under
 * {@code src/test/resources/scenario-corpus/} is what this generator writes, and runs every case.
 */
final class ScenarioCorpus {
  private ScenarioCorpus() {}

  /**
   * One case.
   *
   * @param file file name
   * @param bytes the scenario file's bytes
   * @param verdict "refuse" or "accept"
   * @param fragment text the refusal must contain ("" for accept)
   */
  record Case(String file, byte[] bytes, String verdict, String fragment) {}

  /** The valid base scenario, section by section (top-level keys under ""). */
  static Map<String, Map<String, String>> base() {
    final Map<String, Map<String, String>> m = new LinkedHashMap<>();
    m.put("", map("name", "corpus-base", "description", "corpus base scenario", "span_h", "2", "cycle_s", "1",
        "epoch", "\"2026-10-01T00:00:00\"", "time_scale", "TT", "initial_time_error_ns", "100", "seeds", "2",
        "output_every_s", "60", "ut1_minus_tt_s", "-69.184"));
    m.put("orbit", map("body", "earth", "sma_km", "26561.75", "ecc", "0.01", "inc_deg", "55", "raan_deg", "10",
        "argp_deg", "20", "anomaly_deg", "30", "srp_cr_area_over_mass_m2_per_kg", "0.02",
        "drag_cd_area_over_mass_m2_per_kg", "0"));
    m.put("oscillator", map("preset", "rubidium", "white_pm_sigma_ps", "1", "white_fm_adev_1s", "3.0e-12",
        "flicker_fm_floor", "3.0e-15", "random_walk_fm_adev_1s", "1.0e-16", "drift_per_day", "1.0e-13",
        "initial_frequency", "5.0e-11"));
    m.put("model", map("level", "full", "degree", "8"));
    m.put("estimate_errors", map("position_noise_m", "1", "velocity_noise_m_per_s", "0.01", "radial_bias_m", "0",
        "gap_every_s", "3600", "gap_length_s", "60", "corrupt_probability", "0.0001"));
    m.put("measurements", map("source", "1", "sigma_ns", "1", "every_s", "10", "outage_start_h", "1",
        "outage_length_h", "0.5", "outlier_probability", "0.001", "outlier_ns", "100"));
    m.put("servo", map("time_constant_track_s", "1000", "time_constant_acquire_s", "100", "steer_resolution", "1.0e-15",
        "steer_max", "1.0e-7", "slew_max_per_s", "1.0e-10", "gate_sigma", "6", "track_enter_ns", "10",
        "track_exit_ns", "500", "coast_after_s", "120", "coast_max_h", "24", "phase_step_threshold_ns", "1000",
        "phase_step_resolution_ns", "1"));
    m.put("actuator", map("quantum", "1.0e-15", "delay_cycles", "1"));
    m.put("budget", map("max_abs_time_error_ns", "20", "settle_within_s", "1800", "rms_time_error_ns", "5",
        "adev_max", "1.0e-12", "adev_tau_s", "100", "percentile", "95"));
    return m;
  }

  private static Map<String, String> map(String... kv) {
    final Map<String, String> m = new LinkedHashMap<>();
    for (int i = 0; i < kv.length; i += 2) {
      m.put(kv[i], kv[i + 1]);
    }
    return m;
  }

  static String render(Map<String, Map<String, String>> m) {
    final StringBuilder sb = new StringBuilder("# corpus case\n");
    for (Map.Entry<String, Map<String, String>> s : m.entrySet()) {
      final String ind = s.getKey().isEmpty() ? "" : "  ";
      if (!s.getKey().isEmpty()) {
        sb.append(s.getKey()).append(":\n");
      }
      for (Map.Entry<String, String> e : s.getValue().entrySet()) {
        sb.append(ind).append(e.getKey()).append(':').append(e.getValue().isEmpty() ? "" : " " + e.getValue()).append('\n');
      }
    }
    return sb.toString();
  }

  /** Numeric keys with a value below and above their range (or NaN where a side is open). */
  private static final String[][] RANGES = {
    {"", "span_h", "0.001", "721"}, {"", "cycle_s", "0", "61"}, {"", "initial_time_error_ns", "-2e9", "2e9"},
    {"", "seeds", "0", "10001"}, {"", "output_every_s", "0", "86401"}, {"", "ut1_minus_tt_s", "-1001", "1001"},
    {"orbit", "sma_km", "100", "3e6"}, {"orbit", "ecc", "-0.1", "0.96"}, {"orbit", "inc_deg", "-1", "181"},
    {"orbit", "raan_deg", "-361", "361"}, {"orbit", "argp_deg", "-361", "361"}, {"orbit", "anomaly_deg", "-361", "361"},
    {"orbit", "srp_cr_area_over_mass_m2_per_kg", "-0.1", "2"}, {"orbit", "drag_cd_area_over_mass_m2_per_kg", "-0.1", "2"},
    {"oscillator", "white_pm_sigma_ps", "-1", "2e6"}, {"oscillator", "white_fm_adev_1s", "-1e-12", "1e-7"},
    {"oscillator", "flicker_fm_floor", "-1e-15", "1e-7"}, {"oscillator", "random_walk_fm_adev_1s", "-1e-16", "1e-7"},
    {"oscillator", "drift_per_day", "-1e-6", "1e-6"}, {"oscillator", "initial_frequency", "-1e-4", "1e-4"},
    {"model", "degree", "-1", "37"}, {"estimate_errors", "position_noise_m", "-1", "2e4"},
    {"estimate_errors", "velocity_noise_m_per_s", "-1", "101"}, {"estimate_errors", "radial_bias_m", "-2e4", "2e4"},
    {"estimate_errors", "corrupt_probability", "-0.1", "0.6"}, {"measurements", "source", "-1", "4"},
    {"measurements", "sigma_ns", "0", "2e6"}, {"measurements", "every_s", "-10", "86410"},
    {"measurements", "outlier_probability", "-0.1", "0.6"}, {"measurements", "outlier_ns", "-1", "2e9"},
    {"servo", "time_constant_track_s", "5", "2e6"}, {"servo", "time_constant_acquire_s", "0.5", "NaN"},
    {"servo", "steer_resolution", "-1e-15", "1e-8"}, {"servo", "steer_max", "1e-13", "1e-3"},
    {"servo", "slew_max_per_s", "1e-19", "1e-5"}, {"servo", "gate_sigma", "1", "101"},
    {"servo", "track_enter_ns", "0.0001", "NaN"}, {"servo", "coast_after_s", "0.5", "2e6"},
    {"servo", "coast_max_h", "0.0001", "9000"}, {"servo", "phase_step_threshold_ns", "-1", "2e10"},
    {"servo", "phase_step_resolution_ns", "-1", "2e6"}, {"actuator", "quantum", "-1e-15", "1e-8"},
    {"actuator", "delay_cycles", "-1", "101"}, {"budget", "max_abs_time_error_ns", "0", "2e9"},
    {"budget", "settle_within_s", "-1", "8000"}, {"budget", "rms_time_error_ns", "0", "2e9"},
    {"budget", "adev_max", "0", "1e-2"}, {"budget", "adev_tau_s", "0.5", "2000"}, {"budget", "percentile", "49", "101"},
  };

  static List<Case> cases() {
    final List<Case> out = new ArrayList<>();
    add(out, "base", base(), "accept", "");
    for (String[] r : RANGES) {
      final String key = r[0].isEmpty() ? r[1] : r[0] + "." + r[1];
      for (int side = 2; side <= 3; side++) {
        if (!r[side].equals("NaN")) {
          out.add(mutate(out.size(), key + (side == 2 ? "-below" : "-above"), r[0], r[1], r[side], key + ": "));
        }
      }
      out.add(mutate(out.size(), key + "-text", r[0], r[1], "abc", key + ": not a"));
      out.add(mutate(out.size(), key + "-empty", r[0], r[1], "", key + ": no value"));
    }
    for (String[] v : new String[][] {{".inf", "not a decimal number"}, {".nan", "not a decimal number"},
      {"1e400", "out of range"}, {"0x1A", "not a decimal number"}, {"1_000", "not a decimal number"},
      {"\"12\"", "not a decimal number"}, {"[1, 2]", "lists are not part"}, {"{a: 1}", "must be a single value"}}) {
      out.add(mutate(out.size(), "sigma-" + v[0].replaceAll("[^a-z0-9]", "x"), "measurements", "sigma_ns", v[0],
          "measurements.sigma_ns: " + v[1]));
    }
    for (String[] f : new String[][] {{"", "seeds", "1.9"}, {"", "cycle_s", "1.5"}, {"", "output_every_s", "60.5"},
      {"measurements", "source", "1.5"}, {"actuator", "delay_cycles", "0.5"}, {"model", "degree", "8.5"},
      {"", "seeds", "2.0"}, {"", "seeds", "1e1"}}) {
      final String key = f[0].isEmpty() ? f[1] : f[0] + "." + f[1];
      out.add(mutate(out.size(), key + "-fraction-" + f[2], f[0], f[1], f[2], key + ": not a whole number"));
    }
    for (String[] e : new String[][] {{"2026-13-01T00:00:00", "no such month"}, {"2026-02-45T00:00:00", "no such day"},
      {"2026-02-29T00:00:00", "no such day"}, {"2026-10-01T25:00:00", "no such time of day"},
      {"2026-10-01T00:61:00", "no such time of day"}, {"2026-10-01T00:00:75", "no such time of day"},
      {"2026-366T00:00:00", "no such day of the year"}, {"1900-01-01T00:00:00", "year outside"},
      {"next tuesday", "not an epoch"}, {"2026-10-01", "not an epoch"}, {"2026/10/01T00:00:00", "not an epoch"}}) {
      out.add(mutate(out.size(), "epoch-" + e[1].replace(' ', '-'), "", "epoch", "\"" + e[0] + "\"", "epoch: " + e[1]));
    }
    final Map<String, Map<String, String>> utcLate = base();
    utcLate.get("").put("time_scale", "UTC");
    utcLate.get("").put("epoch", "\"2027-07-01T00:00:00\"");
    add(out, "utc-after-leap-table-expiry", utcLate, "refuse", "epoch: the run ends after the leap-second table expires");
    final Map<String, Map<String, String>> utcOk = base();
    utcOk.get("").put("time_scale", "UTC");
    add(out, "utc-before-expiry-accepted", utcOk, "accept", "");
    final Map<String, Map<String, String>> doy = base();
    doy.get("").put("epoch", "\"2026-274T00:00:00\"");
    add(out, "day-of-year-epoch-accepted", doy, "accept", "");
    for (String[] c : new String[][] {{"", "time_scale", "UT1", "time_scale: not one of"},
      {"model", "level", "magic", "model.level: not one of"}, {"oscillator", "preset", "sundial", "oscillator.preset: not one of"},
      {"orbit", "body", "mars", "orbit.body: not one of"}, {"", "name", "\"x y\"", "name: not a valid scenario name"},
      {"servo", "track_exit_ns", "5", "servo.track_exit_ns: the track-exit threshold must exceed"},
      {"servo", "time_constant_acquire_s", "2000", "servo.time_constant_acquire_s: the acquisition time constant exceeds"},
      {"servo", "coast_max_h", "0.01", "servo.coast_max_h: the longest coast is shorter"},
      {"oscillator", "flicker_fm_floor", "1.0e-7", "oscillator.flicker_fm_floor: out of range"},
      {"measurements", "outage_start_h", "3", "measurements.outage_start_h: the outage starts after the run ends"},
      {"measurements", "outage_start_h", "-0.5", "measurements.outage_start_h: not a start time"},
      {"measurements", "outage_length_h", "0", "measurements.outage_length_h: an outage needs a length"},
      {"measurements", "every_s", "1.5", "measurements.every_s: not a whole number of cycles"},
      {"measurements", "outlier_ns", "0", "measurements.outlier_ns: outliers need a size"},
      {"estimate_errors", "gap_length_s", "0", "gap_length_s: gaps need both"},
      {"estimate_errors", "gap_length_s", "3600", "estimate_errors.gap_length_s: a gap as long as its period"},
{"orbit", "sma_km", "6000", "orbit.sma_km: out of range"},
      {"orbit", "ecc", "0.9", "orbit.ecc: the perigee is below"}, {"model", "degree", "1", "model.degree: degree 1"}}) {
      out.add(mutate(out.size(), (c[0] + "-" + c[1] + "-" + c[2]).replaceAll("[^A-Za-z0-9.-]", "x"), c[0], c[1], c[2],
          c[3]));
    }
    final Map<String, Map<String, String>> cyc = base();
    cyc.get("").put("cycle_s", "10");
    add(out, "output-every-not-a-multiple-of-cycle", withKey(cyc, "", "output_every_s", "45"), "refuse",
        "output_every_s: not a whole number of cycles");
    final Map<String, Map<String, String>> rw = base();
    rw.get("servo").put("time_constant_track_s", "10");
    rw.get("servo").put("time_constant_acquire_s", "5");
    add(out, "filter-noise-beyond-table", withKey(rw, "oscillator", "flicker_fm_floor", "9.0e-9"), "refuse",
        "oscillator.flicker_fm_floor: the filter's random-walk FM noise");
    final Map<String, Map<String, String>> moon = base();
    moon.get("orbit").put("body", "moon");
    moon.get("orbit").put("sma_km", "1838");
    add(out, "moon-with-harmonic-degree", moon, "refuse", "model.degree: the Moon's onboard model has no harmonic degree");
    for (String s : base().keySet()) {
      if (!s.isEmpty()) {
        out.add(mutate(out.size(), "unknown-key-in-" + s, s, "colour", "red", s + ".colour: unknown key"));
      }
    }
    out.add(mutate(out.size(), "unknown-top-level-key", "", "colour", "red", "colour: unknown key"));
    final Map<String, Map<String, String>> noName = base();
    noName.get("").remove("name");
    add(out, "missing-name", noName, "refuse", "name: required key missing");
    final Map<String, Map<String, String>> noSma = base();
    noSma.get("orbit").remove("sma_km");
    add(out, "missing-sma", noSma, "refuse", "orbit.sma_km: required key missing");
    final Map<String, Map<String, String>> noMax = base();
    noMax.get("budget").remove("max_abs_time_error_ns");
    add(out, "budget-without-band", noMax, "refuse", "budget.max_abs_time_error_ns: required key missing");
    final Map<String, Map<String, String>> tauOnly = base();
    tauOnly.get("budget").remove("adev_max");
    add(out, "budget-tau-without-adev", tauOnly, "refuse", "budget.adev_tau_s: an averaging time without");
    final Map<String, Map<String, String>> traj = base();
    traj.get("orbit").put("trajectory", "");
    traj.get("orbit").put("  format", "sp3");
    traj.get("orbit").put("  file", "nowhere.sp3");
    add(out, "trajectory-with-elements", traj, "refuse", "elements and a trajectory file together");
    final String b = render(base());
    raw(out, "duplicate-top-level-key", b + "seeds: 3\n", "refuse", "seeds: duplicate key");
    raw(out, "duplicate-nested-key", b.replace("  ecc: 0.01\n", "  ecc: 0.01\n  ecc: 0.02\n"), "refuse",
        "orbit.ecc: duplicate key");
    raw(out, "duplicate-section", b + "orbit:\n  sma_km: 7000\n", "refuse", "orbit: duplicate key");
    raw(out, "second-document", b + "---\nname: other\n", "refuse", "a second YAML document");
    raw(out, "second-document-empty-map", b + "---\n{}\n", "refuse", "a second YAML document");
    raw(out, "document-is-a-list", "- a\n- b\n", "refuse", "the document must be a mapping");
    raw(out, "document-is-a-scalar", "just text\n", "refuse", "the document must be a mapping");
    raw(out, "empty-file", "", "refuse", "holds no YAML document");
    raw(out, "comment-only", "# nothing\n", "refuse", "holds no YAML document");
    raw(out, "section-is-a-scalar", b.replace("actuator:\n  quantum: 1.0e-15\n  delay_cycles: 1\n", "actuator: 5\n"),
        "refuse", "actuator: must be a section");
    raw(out, "broken-yaml", b.replace("  ecc: 0.01\n", "  ecc: \"0.01\n"), "refuse", "not valid YAML");
    raw(out, "bad-indentation", b.replace("  ecc: 0.01\n", "    ecc: 0.01\n"), "refuse", "not valid YAML");
    raw(out, "tab-indentation", b.replace("  ecc: 0.01\n", "\tecc: 0.01\n"), "refuse", "a tab in the indentation");
    raw(out, "anchor-and-alias", b.replace("  ecc: 0.01\n", "  ecc: &e 0.01\n  inc_deg_copy: *e\n"), "refuse",
        "aliases are not accepted");
    raw(out, "alias-only", b.replace("  inc_deg: 55\n", "  inc_deg: *nothing\n"), "refuse", "");
    raw(out, "tag", b.replace("  ecc: 0.01\n", "  ecc: !!float 0.01\n"), "refuse", "tags are not accepted");
    raw(out, "control-character", b.replace("corpus base scenario", "\"corpus\\u0007base\""), "refuse",
        "description: a control character");
    raw(out, "moved-ut1-key", b.replace("orbit:\n  body: earth\n", "orbit:\n  trajectory:\n    ut1_minus_tt_s: -69\n"),
        "refuse", "orbit.trajectory.ut1_minus_tt_s: this key moved");
    raw(out, "reordered-and-commented-accepted", "# a comment\n" + b.replace("name: corpus-base\n", "")
        + "name: corpus-base   # at the end\n", "accept", "");
    final byte[] bom = ("\uFEFF" + b).getBytes(StandardCharsets.UTF_8);
    out.add(new Case(String.format("%03d-utf8-bom-accepted.yaml", out.size()), bom, "accept", ""));
    final byte[] latin1 = b.replace("corpus base scenario", "corpus b\u00e4se").getBytes(StandardCharsets.ISO_8859_1);
    out.add(new Case(String.format("%03d-not-utf8.yaml", out.size()), latin1, "refuse", "the text is not UTF-8"));
    return out;
  }

  private static Map<String, Map<String, String>> withKey(Map<String, Map<String, String>> m, String section, String key,
      String value) {
    m.get(section).put(key, value);
    return m;
  }

  private static Case mutate(int n, String name, String section, String key, String value, String fragment) {
    final Map<String, Map<String, String>> m = base();
    m.get(section).put(key, value);
    return new Case(String.format("%03d-%s.yaml", n, name), render(m).getBytes(StandardCharsets.UTF_8), "refuse", fragment);
  }

  private static void add(List<Case> out, String name, Map<String, Map<String, String>> m, String verdict, String fragment) {
    out.add(new Case(String.format("%03d-%s.yaml", out.size(), name), render(m).getBytes(StandardCharsets.UTF_8), verdict,
        fragment));
  }

  private static void raw(List<Case> out, String name, String text, String verdict, String fragment) {
    out.add(new Case(String.format("%03d-%s.yaml", out.size(), name), text.getBytes(StandardCharsets.UTF_8), verdict,
        fragment));
  }
}
