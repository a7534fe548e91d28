package org.eigenzeit.ground.fuzz;

import static org.eigenzeit.ground.fuzz.FuzzSp3Cases.slug;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.Dir;

/**
 * Epoch cases (one line {@code epoch<TAB>time system} per file) and command-line cases (one
 * argument per line; {@code ${dir}} is the case directory, {@code ${tmp}} a fresh folder). A
 * command-line refusal must name its option in the first line of standard error.
 */
final class FuzzCliCases {
  private FuzzCliCases() {}

  static Dir epochs() {
    final Dir d = new Dir("epochs", "txt");
    final String[][] ok = {{"2026-10-01T00:00:00", "TT"}, {"2026-274T00:00:00", "TT"}, {"2026-10-01T12:34:56.789", "TAI"},
      {"2016-12-31T23:59:60.5", "UTC"}, {"2026-10-01T00:00:00Z", "UTC"}, {"2016-366T12:00:00", "GPS"},
      {"2000-02-29T00:00:00", "TT"}, {"2100-12-31T23:59:59.999999999", "TT"}, {"1972-01-01T00:00:00", "UTC"},
      {"2026-10-01T00:00:00", "gps"}};
    for (String[] c : ok) {
      d.acceptBytes("ok-" + slug(c[0] + "-" + c[1]), line(c), "valid " + c[1] + " epoch " + c[0]);
    }
    final String[][] bad = {{"2026-00-01T00:00:00", "TT", "month 0"}, {"2026-13-01T00:00:00", "TT", "month 13"},
      {"2026-01-00T00:00:00", "TT", "day 0"}, {"2026-01-32T00:00:00", "TT", "day 32"},
      {"2026-01-45T00:00:00", "TT", "day 45"}, {"2015-02-29T00:00:00", "TT", "29 February 2015"},
      {"2100-02-29T00:00:00", "TT", "29 February 2100"}, {"2026-04-31T00:00:00", "TT", "31 April"},
      {"2026-000T00:00:00", "TT", "day of year 0"}, {"2015-366T00:00:00", "TT", "day 366 of 2015"},
      {"2016-367T00:00:00", "TT", "day 367"}, {"2026-10-01T24:00:00", "TT", "hour 24"},
      {"2026-10-01T25:00:00", "TT", "hour 25"}, {"2026-10-01T00:60:00", "TT", "minute 60"},
      {"2026-10-01T00:00:60", "TT", "second 60 in TT"}, {"2026-10-01T00:00:75", "TT", "second 75"},
      {"2026-10-01T00:00:99.5", "TT", "second 99.5"}, {"2015-12-31T23:59:60", "UTC", "60 on a day without leap"},
      {"2016-12-31T23:58:60", "UTC", "60 at 23:58"}, {"2016-12-31T23:59:60", "TAI", "60 in TAI"},
      {"2026-10-01 00:00:00", "TT", "space instead of T"}, {"2026-10-1T00:00:00", "TT", "one-digit day"},
      {"2026-10-01T00:00", "TT", "no seconds"}, {"2026-10-01T00:00:00.", "TT", "trailing point"},
      {"2026-10-01T00:00:00.5e3", "TT", "exponent"}, {"+2026-10-01T00:00:00", "TT", "sign"},
      {"2026-1O-01T00:00:00", "TT", "letter O for zero"}, {"0x7EA-10-01T00:00:00", "TT", "hex year"},
      {"NaN", "TT", "NaN"}, {"", "TT", "empty"}, {"2026-10-01T00:00:00Z", "TT", "Z in TT"},
      {"2026-10-01T00:00:00ZZ", "UTC", "ZZ"}, {" 2026-10-01T00:00:00", "TT", "leading blank"},
      {"2026-10-01t00:00:00", "TT", "lower-case t"}, {"1899-12-31T00:00:00", "TT", "year 1899"},
      {"2201-01-01T00:00:00", "TT", "year 2201"}, {"1960-01-01T00:00:00", "UTC", "UTC before 1972"},
      {"2030-01-01T00:00:00", "UTC", "UTC after the leap table's expiry"}, {"2026-10-01T00:00:00", "TCB", "TCB"},
      {"2026-10-01T00:00:00", "TDB", "TDB"}, {"2026-10-01T00:00:00", "UT1", "UT1"}, {"2026-10-01T00:00:00", "", "no scale"},
      {"2026-10-01T00:00:00", "T T", "scale 'T T'"}, {"2026-10-01T00:00:00.1234567890123456", "TT", "16 fraction digits"},
      {"20261001T000000", "TT", "basic ISO form"}, {"2026-10-01T00:00:00+01:00", "TT", "time zone offset"}};
    for (String[] c : bad) {
      d.refuseBytes("bad-" + slug(c[2]), line(c), 1, c[2]);
    }
    final byte[] utf = "2026-10-01T00:00:00\u00a0\tTT\n".getBytes(StandardCharsets.UTF_8);
    d.refuseBytes("bad-non-ascii", utf, 1, "no-break space after the epoch");
    return d;
  }

  private static byte[] line(String[] c) {
    return (c[0] + "\t" + c[1] + "\n").getBytes(StandardCharsets.UTF_8);
  }

  static List<Dir> commands() {
    final List<Dir> out = new ArrayList<>();
    out.add(budget());
    out.add(demo());
    out.add(campaign());
    out.add(referenceSpeed());
    out.add(top());
    return out;
  }

  private static final String[] SHORT = {"--span-h", "0.1", "--step-s", "60"};

  private static String[] budgetArgs(String... args) {
    final String[] a = new String[args.length + 1];
    a[0] = "budget";
    System.arraycopy(args, 0, a, 1, args.length);
    return a;
  }

  private static String[] sma(String... more) {
    final List<String> l = new ArrayList<>(List.of("budget", "--sma-km", "7000"));
    l.addAll(List.of(more));
    return l.toArray(new String[0]);
  }

  private static String[] shortRun(String... args) {
    final List<String> l = new ArrayList<>(List.of(args));
    l.addAll(List.of(SHORT));
    return l.toArray(new String[0]);
  }

  private static Dir budget() {
    final Dir d = new Dir("cli-budget", "args");
    d.cli("state-km", null, "the documented --state-km form", shortRun(budgetArgs("--state-km", "7000,0,0,0,7.546,0")));
    d.cli("elements", null, "GPS-like elements", shortRun(budgetArgs("--sma-km", "26561.75", "--ecc", "0.01",
        "--inc-deg", "55", "--json")));
    d.cli("tides-off", null, "--core-tides off", shortRun(sma("--core-tides", "off")));
    d.cli("tides-false", null, "--core-tides false", shortRun(sma("--core-tides", "false")));
    d.cli("moon-j2", null, "lunar orbit, default level j2", shortRun(budgetArgs("--body", "moon", "--sma-km", "1838")));
    d.cli("utc-epoch", null, "UTC epoch", shortRun(sma("--epoch", "2026-01-01T00:00:00", "--time-scale", "UTC")));
    final String[] bad = {"NaN", "Infinity", "-Infinity", "1e400", "0x1p3", "1.5d", "1,5", "abc", ""};
    final String[] options = {"--sma-km", "--ecc", "--inc-deg", "--raan-deg", "--argp-deg", "--anomaly-deg", "--span-h",
      "--step-s", "--sma-km"};
    for (int i = 0; i < bad.length; i++) {
      final String o = options[i];
      final String[] args = o.equals("--sma-km") ? budgetArgs(o, bad[i]) : sma(o, bad[i]);
      d.cli("number-" + slug(o) + "-" + slug(bad[i]), o, o + " '" + bad[i] + "'", args);
    }
    d.cli("degree-1-5", "--degree", "--degree 1.5", sma("--degree", "1.5"));
    d.cli("degree-x", "--degree", "--degree x", sma("--degree", "x"));
    final String[][] ranges = {{"--ecc", "1.2"}, {"--ecc", "-0.1"}, {"--inc-deg", "400"}, {"--inc-deg", "-1"},
      {"--raan-deg", "361"}, {"--argp-deg", "-400"}, {"--anomaly-deg", "1e3"}, {"--span-h", "0"},
      {"--span-h", "1000"}, {"--span-h", "-24"}, {"--step-s", "0.5"}, {"--step-s", "601"}, {"--degree", "1"},
      {"--degree", "37"}, {"--degree", "-2"}};
    for (String[] r : ranges) {
      d.cli("range-" + slug(r[0]) + "-" + slug(r[1]), r[0], r[0] + " " + r[1], sma(r[0], r[1]));
    }
    d.cli("sma-6000", "--sma-km", "--sma-km 6000 (inside the Earth)", budgetArgs("--sma-km", "6000"));
    d.cli("sma-huge", "--sma-km", "--sma-km 3e6", budgetArgs("--sma-km", "3e6"));
    d.cli("perigee", "--ecc", "perigee inside the Earth", sma("--ecc", "0.5"));
    d.cli("step-over-span", "--step-s", "--step-s longer than --span-h", sma("--step-s", "600", "--span-h", "0.1"));
    d.cli("degree-j2", "--degree", "--degree with --core-level j2", sma("--degree", "8", "--core-level", "j2"));
    d.cli("moon-harmonics", "--core-level", "--body moon --core-level harmonics",
        budgetArgs("--body", "moon", "--sma-km", "1838", "--core-level", "harmonics"));
    d.cli("moon-degree", "--degree", "--body moon --degree 8", budgetArgs("--body", "moon", "--sma-km", "1838",
        "--degree", "8"));
    d.cli("level-full", "--core-level", "--core-level full", sma("--core-level", "full"));
    d.cli("tides-maybe", "--core-tides", "--core-tides maybe", sma("--core-tides", "maybe"));
    d.cli("tides-1", "--core-tides", "--core-tides 1", sma("--core-tides", "1"));
    d.cli("body-mars", "--body", "--body mars", sma("--body", "mars"));
    d.cli("body-non-ascii", "--body", "--body with a non-ASCII letter", sma("--body", "m\u00f6\u00f6n"));
    d.cli("scale-tcb", "--time-scale", "--time-scale TCB", sma("--time-scale", "TCB"));
    d.cli("epoch-month", "--epoch", "--epoch month 13", sma("--epoch", "2026-13-01T00:00:00"));
    d.cli("epoch-form", "--epoch", "--epoch 01/10/2026", sma("--epoch", "01/10/2026"));
    d.cli("epoch-de405", "--epoch", "--epoch outside DE405", sma("--epoch", "1990-01-01T00:00:00"));
    d.cli("epoch-de405-end", "--epoch", "--epoch and span beyond DE405", sma("--epoch", "2040-01-25T00:00:00"));
    d.cli("epoch-utc-expired", "--epoch", "UTC epoch after the leap table's expiry", sma("--epoch",
        "2030-01-01T00:00:00", "--time-scale", "UTC"));
    d.cli("state-5", "--state-km", "--state-km with 5 numbers", budgetArgs("--state-km", "7000,0,0,0,7.5"));
    d.cli("state-7", "--state-km", "--state-km with 7 numbers", budgetArgs("--state-km", "7000,0,0,0,7.5,0,1"));
    d.cli("state-twice", "--state-km", "--state-km given twice", budgetArgs("--state-km", "7000,0,0,0,7.5,0",
        "--state-km", "7000,0,0,0,7.5,0"));
    d.cli("state-nan", "--state-km", "--state-km with NaN", budgetArgs("--state-km", "7000,0,0,0,NaN,0"));
    d.cli("state-inside", "--state-km", "--state-km inside the Earth", budgetArgs("--state-km", "3000,0,0,0,7.5,0"));
    d.cli("state-light", "--state-km", "--state-km faster than light", budgetArgs("--state-km", "7000,0,0,0,300000,0"));
    d.cli("state-escape", "--state-km", "--state-km above escape speed", budgetArgs("--state-km", "7000,0,0,0,12,0"));
    d.cli("state-far", "--state-km", "--state-km 3 million km away", budgetArgs("--state-km", "3000000,0,0,0,0.1,0"));
    d.cli("state-zero", "--state-km", "--state-km all zero", budgetArgs("--state-km", "0,0,0,0,0,0"));
    d.cli("state-spaces", null, "--state-km with blanks after the commas (read as numbers)",
        shortRun(budgetArgs("--state-km", "7000, 0, 0, 0, 7.546, 0")));
    d.cli("moon-state-inside", "--state-km", "lunar state inside the Moon", budgetArgs("--body", "moon",
        "--state-km", "1000,0,0,0,1.6,0"));
    d.cli("missing-orbit", "--sma-km", "no orbit", budgetArgs("--span-h", "1"));
    d.cli("both-orbits", "--state-km", "elements and state", budgetArgs("--sma-km", "7000", "--state-km",
        "7000,0,0,0,7.5,0"));
    d.cli("repeated", "--span-h", "--span-h twice", sma("--span-h", "1", "--span-h", "2"));
    d.cli("unknown", "--foo", "unknown option", sma("--foo"));
    d.cli("positional", "extra", "unexpected argument", sma("extra"));
    d.cli("no-value", "--ecc", "--ecc without a value", sma("--ecc"));
    return d;
  }

  private static Dir demo() {
    final Dir d = new Dir("cli-demo", "args");
    d.cli("budgets-only", null, "demo budgets, 0.1 h, no loop", "demo", "--no-loop", "--span-h", "0.1", "--out",
        "${tmp}/demo");
    final String[][] bad = {{"--seeds", "0"}, {"--seeds", "-1"}, {"--seeds", "101"}, {"--seeds", "1.5"},
      {"--seeds", "x"}, {"--span-h", "0"}, {"--span-h", "NaN"}, {"--span-h", "1000"}, {"--span-h", "0x1p2"}};
    for (String[] b : bad) {
      d.cli(slug(b[0]) + "-" + slug(b[1]), b[0], "demo " + b[0] + " " + b[1], "demo", b[0], b[1]);
    }
    d.cli("out-nul", "--out", "--out with a NUL character", "demo", "--out", "a" + (char) 0 + "b");
    d.cli("unknown", "--foo", "unknown option", "demo", "--foo");
    d.cli("no-value", "--seeds", "--seeds without a value", "demo", "--seeds");
    return d;
  }

  private static Dir campaign() {
    final Dir d = new Dir("cli-campaign", "args");
    d.extra("bad-scenario.yaml", "name: fuzz-bad\nfrobnicate: 1\n");
    d.cli("help", null, "campaign --help", "campaign", "--help");
    final String[][] bad = {{"--seeds", "-3"}, {"--seeds", "0"}, {"--seeds", "1.9"}, {"--seeds", "x"},
      {"--seeds", "100001"}, {"--seeds", "NaN"}, {"--threads", "0"}, {"--threads", "-1"}, {"--threads", "257"},
      {"--threads", "x"}, {"--threads", "2.5"}};
    for (String[] b : bad) {
      d.cli(slug(b[0]) + "-" + slug(b[1]), b[0], "campaign " + b[0] + " " + b[1], "campaign", b[0], b[1],
          "${dir}/bad-scenario.yaml");
    }
    d.cli("no-file", "SCENARIO.yaml", "scenario file missing", "campaign", "${dir}/nowhere.yaml");
    d.cli("no-argument", "SCENARIO.yaml", "no scenario argument", "campaign");
    d.cli("bad-scenario", "bad-scenario.yaml", "a scenario with an unknown key", "campaign", "--out", "${tmp}/c",
        "${dir}/bad-scenario.yaml");
    d.cli("unknown", "--foo", "unknown option", "campaign", "--foo", "${dir}/bad-scenario.yaml");
    final java.util.List<String> sp3 = new ArrayList<>(FuzzCorpusGenerator.Bases.sp3());
    sp3.set(23, sp3.get(23).substring(0, 4) + "           NaN" + sp3.get(23).substring(18));
    d.extra("broken.sp3", String.join("\n", sp3) + "\n");
    d.extra("broken-trajectory.yaml", "name: fuzz-broken-sp3\norbit:\n  trajectory:\n    format: sp3\n"
        + "    file: broken.sp3\n    satellite: G05\n");
    d.cli("broken-trajectory", "broken.sp3:24:", "a scenario whose SP3 file has NaN at line 24 (read while running)",
        "campaign", "--out", "${tmp}/c", "${dir}/broken-trajectory.yaml");
    return d;
  }

  private static Dir referenceSpeed() {
    final Dir d = new Dir("cli-reference-speed", "args");
    d.cli("help", null, "reference-speed --help", "reference-speed", "--help");
    for (String v : new String[] {"0", "-1", "101", "x", "NaN", "2.5"}) {
      d.cli("repeats-" + slug(v), "--repeats", "--repeats " + v, "reference-speed", "--repeats", v);
    }
    d.cli("unknown", "--foo", "unknown option", "reference-speed", "--foo");
    return d;
  }

  private static Dir top() {
    final Dir d = new Dir("cli-eigenzeit", "args");
    d.cli("help", null, "eigenzeit --help", "--help");
    d.cli("version", null, "eigenzeit --version", "--version");
    d.cli("help-budget", null, "eigenzeit help budget", "help", "budget");
    d.cli("none", "no command given", "no command", new String[0]);
    d.cli("unknown-command", "frobnicate", "unknown command", "frobnicate");
    d.cli("unknown-option", "--foo", "unknown option", "--foo");
    return d;
  }
}
