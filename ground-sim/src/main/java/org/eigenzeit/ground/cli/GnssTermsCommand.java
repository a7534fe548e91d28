package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.gnss.BroadcastCheck;
import org.eigenzeit.ground.gnss.ClockFile;
import org.eigenzeit.ground.gnss.NavFile;
import org.eigenzeit.ground.gnss.OrbitComparison;
import org.eigenzeit.ground.gnss.PreciseOrbit;
import org.eigenzeit.ground.gnss.TermSurvey;
import org.eigenzeit.ground.report.Charts;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit gnss-terms}: the relativistic clock terms of real GNSS satellites, any day. */
@Command(name = "gnss-terms", mixinStandardHelpOptions = true,
    header = "Relativistic terms of real GNSS satellites for a day.",
    description = {"The relativistic clock terms of real GNSS satellites from their product files, for any day: "
        + "per satellite and epoch -2 r.v/c^2 from the precise orbit (SP3-c/d), the broadcast F e sqrt(A) sin E "
        + "(RINEX 2 GPS and QZSS navigation) and their difference, -2 r.v/c^2 of the broadcast orbit (GPS, QZSS, "
        + "GLONASS), Kouba's J2 periodic term and the clock rate; per satellite the secular rate, RMS and maximum, "
        + "and the reason for every exclusion. Every broadcast record is checked first (values, health, duplicates "
        + "under another satellite, position against the precise orbit, IODE); rejected records are listed with "
        + "their reasons. Without --sp3 the broadcast orbits serve as the orbit. With --estimate-orbit, a second "
        + "orbit product (e.g. an ultra-rapid prediction) is compared with --sp3 as an onboard estimate would be. "
        + "Writes epochs.csv, satellites.csv, records.csv, summary.json and plots to --out.",
      "",
      "Example:",
      "  eigenzeit gnss-terms --sp3 igs15904.sp3 --nav brdc1820.10n --clock igs15904.clk"},
    sortOptions = false)
final class GnssTermsCommand implements Callable<Integer> {
  private static final int PLOT_W = 1000;
  private static final int PLOT_H = 500;

  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Option(names = "--sp3", paramLabel = "FILE", description = "Precise orbit, SP3-c or SP3-d (plain or .gz); its %%c time system is applied (no default; "
          + "optional when --nav is given, then the broadcast orbits serve).")
  Path sp3;

  @Option(names = "--nav", paramLabel = "FILE", description = "RINEX 2 navigation file: GPS, QZSS (2.12) or GLONASS; repeatable (default: none).")
  List<Path> navFiles = new ArrayList<>();

  @Option(names = "--clock", paramLabel = "FILE", description = "RINEX clock file (satellite 'AS' records); repeatable (default: none).")
  List<Path> clockFiles = new ArrayList<>();

  @Option(names = "--estimate-orbit", paramLabel = "FILE",
      description = "A second SP3 product treated as an onboard orbit estimate and compared with --sp3 (no default).")
  Path estimate;

  @Option(names = "--step-s", defaultValue = "0", paramLabel = "S",
      description = "Epoch step, s: 0, or 1 to 3600; 0 takes the SP3 interval, or 900 s without --sp3 "
          + "(default ${DEFAULT-VALUE}).")
  double stepS;

  @Option(names = "--ut1-minus-utc-s", defaultValue = "0", paramLabel = "S",
      description = "UT1 - UTC, s, for the inertial rotation of the clock rate only, -0.9 to 0.9 "
          + "(default ${DEFAULT-VALUE}).")
  double ut1MinusUtcS;

  @Option(names = "--out", paramLabel = "DIR", defaultValue = "eigenzeit-out/gnss-terms", description = "Output folder (default ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--json", description = "Print summary.json instead of the tables.")
  boolean json;

  @Override
  public Integer call() throws IOException {
    if (sp3 == null && navFiles.isEmpty()) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(), "give --sp3 FILE, --nav FILE, or both");
    }
    if (estimate != null && sp3 == null) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(), "--estimate-orbit needs --sp3 to compare with");
    }
    if (!(stepS == 0 || (stepS >= 1 && stepS <= 3600))) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(), "--step-s: out of range, found "
          + OptionChecks.format(stepS) + ", allowed 0, or 1 to 3600");
    }
    OptionChecks.range(spec.commandLine(), "--ut1-minus-utc-s", ut1MinusUtcS, -0.9, 0.9);
    final PreciseOrbit precise = sp3 == null ? null : PreciseOrbit.read(sp3);
    final List<NavFile> nav = new ArrayList<>();
    for (Path p : navFiles) {
      nav.add(NavFile.read(p));
    }
    final List<ClockFile> clocks = new ArrayList<>();
    for (Path p : clockFiles) {
      clocks.add(ClockFile.read(p));
    }
    final TermSurvey.Result r = new TermSurvey(precise, nav, clocks, stepS, ut1MinusUtcS).run();
    final PreciseOrbit est = estimate == null ? null : PreciseOrbit.read(estimate);
    final List<OrbitComparison.Satellite> cmp = est == null ? List.of()
        : OrbitComparison.compare(precise, est, stepS, ut1MinusUtcS);
    Files.createDirectories(out);
    final Map<String, Object> summary = summary(precise, r, cmp);
    if (est != null) {
      summary.put("estimateOrbit", est.describe());
      summary.put("estimateNotes", est.header().warnings());
    }
    final String text = new ObjectMapper().writerWithDefaultPrettyPrinter().writeValueAsString(summary);
    Files.writeString(out.resolve("summary.json"), text, StandardCharsets.UTF_8);
    writeEpochs(out.resolve("epochs.csv"), r);
    writeSatellites(out.resolve("satellites.csv"), r);
    writeRecords(out.resolve("records.csv"), r);
    if (!cmp.isEmpty()) {
      writeEstimate(out.resolve("estimate.csv"), cmp);
    }
    plots(out.resolve("plots"), r);
    final PrintWriter pw = spec.commandLine().getOut();
    if (json) {
      pw.println(text);
    } else {
      printTables(pw, precise, est, r, cmp);
      pw.println("Wrote " + out.resolve("summary.json") + ", epochs.csv, satellites.csv, records.csv"
          + (cmp.isEmpty() ? "" : ", estimate.csv") + " and plots/");
      pw.println(Caution.TEXT);
    }
    pw.flush();
    return 0;
  }

  private static Object num(double x) {
    return Double.isFinite(x) ? x : null;
  }

  private static Map<String, Object> summary(PreciseOrbit precise, TermSurvey.Result r, List<OrbitComparison.Satellite> cmp) {
    final Map<String, Object> m = new LinkedHashMap<>();
    m.put("caution", Caution.TEXT);
    m.put("orbit", r.orbitSource());
    if (precise != null) {
      m.put("orbitTimeSystem", precise.timeSystem().name());
      m.put("orbitAgency", precise.header().agency());
      m.put("analysisCentres", precise.header().analysisCentres());
    }
    m.put("fileNotes", r.fileNotes());
    m.put("navigationFiles", r.navigationFiles());
    m.put("clockFiles", r.clockFiles());
    m.put("firstEpochGps", GnssTimeSystem.gpsCalendar(r.firstGpsS()));
    m.put("firstGpsWeek", GnssTimeSystem.gpsWeek(r.firstGpsS()));
    m.put("firstGpsSecondsOfWeek", GnssTimeSystem.secondsOfWeek(r.firstGpsS()));
    m.put("lastEpochGps", GnssTimeSystem.gpsCalendar(r.lastGpsS()));
    final List<Map<String, Object>> sats = new ArrayList<>();
    for (TermSurvey.Satellite s : r.satellites()) {
      final Map<String, Object> x = new LinkedHashMap<>();
      x.put("id", s.id());
      x.put("system", s.system());
      x.put("epochs", s.epochs());
      x.put("compared", s.compared());
      x.put("rmsDifferenceNs", num(s.rmsDifferenceS() * 1e9));
      x.put("maxDifferenceNs", num(s.maxDifferenceS() * 1e9));
      x.put("rmsOrbitPartNs", num(s.rmsOrbitPartS() * 1e9));
      x.put("maxOrbitPartNs", num(s.maxOrbitPartS() * 1e9));
      x.put("maxFormulaBoundNs", num(s.maxFormulaBoundS() * 1e9));
      x.put("maxJ2TermNs", num(s.maxJ2TermS() * 1e9));
      x.put("secularRate", num(s.secularRate()));
      x.put("secularMicrosecondsPerDay", num(s.secularMicrosecondsPerDay()));
      x.put("secularSpanS", s.secularSpanS());
      x.put("rmsModelResidualNs", num(s.rmsModelResidualS() * 1e9));
      x.put("maxModelResidualNs", num(s.maxModelResidualS() * 1e9));
      x.put("rmsResidualWithoutJ2Ns", num(s.rmsResidualWithoutJ2S() * 1e9));
      x.put("maxResidualWithoutJ2Ns", num(s.maxResidualWithoutJ2S() * 1e9));
      x.put("orbitBoundNs", num(s.orbitBoundS() * 1e9));
      x.put("meanBroadcastEccentricity", num(s.eccentricity()));
      x.put("recordsAccepted", s.recordsAccepted());
      x.put("recordsRepeated", s.recordsRepeated());
      x.put("recordsRejected", s.recordsRejected());
      x.put("exclusion", s.exclusion());
      x.put("notes", s.notes());
      sats.add(x);
    }
    m.put("satellites", sats);
    final List<Map<String, Object>> rej = new ArrayList<>();
    for (BroadcastCheck.Verdict v : r.verdicts()) {
      if (v.outcome() == BroadcastCheck.Outcome.REJECTED) {
        final Map<String, Object> x = new LinkedHashMap<>();
        x.put("record", v.where());
        x.put("id", v.id());
        x.put("referenceEpochGps", GnssTimeSystem.gpsCalendar(v.referenceGpsS()));
        x.put("positionErrorM", num(v.positionErrorM()));
        x.put("reasons", v.reasons());
        rej.add(x);
      }
    }
    m.put("rejectedRecords", rej);
    m.put("repeatedRecords", r.verdicts().stream().filter(v -> v.outcome() == BroadcastCheck.Outcome.REPEAT).count());
    if (!cmp.isEmpty()) {
      final List<Map<String, Object>> est = new ArrayList<>();
      for (OrbitComparison.Satellite s : cmp) {
        final Map<String, Object> x = new LinkedHashMap<>();
        x.put("id", s.id());
        x.put("epochs", s.epochs());
        x.put("predictedEpochs", s.predictedEpochs());
        x.put("rmsPositionM", num(s.rmsPositionM()));
        x.put("maxPositionM", num(s.maxPositionM()));
        x.put("rmsTermDifferencePs", num(s.rmsTermS() * 1e12));
        x.put("maxTermDifferencePs", num(s.maxTermS() * 1e12));
        x.put("maxJ2DifferencePs", num(s.maxJ2DifferenceS() * 1e12));
        x.put("secularRateDifference", num(s.secularDifference()));
        x.put("secularDifferencePsPerDay", num(s.secularDifferenceNsPerDay() * 1e3));
        x.put("exclusion", s.exclusion());
        est.add(x);
      }
      m.put("estimate", est);
    }
    return m;
  }

  private static String f(String fmt, double x) {
    return Double.isFinite(x) ? String.format(Locale.ROOT, fmt, x) : "";
  }

  private static String csv(String s) {
    return s == null ? "" : "\"" + s.replace("\"", "\"\"") + "\"";
  }

  private static void writeEpochs(Path file, TermSurvey.Result r) throws IOException {
    final StringBuilder b = new StringBuilder("satellite,gps_time,gps_week,gps_seconds_of_week,orbit_source,"
        + "orbit_term_ns,broadcast_term_ns,difference_ns,broadcast_orbit_term_ns,orbit_part_ns,formula_bound_ns,"
        + "j2_term_ns,rate,smooth_rate,record,clock_s,predicted\n");
    for (TermSurvey.Row x : r.rows()) {
      b.append(x.id()).append(',').append(x.gpsTime()).append(',').append(x.gpsWeek()).append(',')
          .append(f("%.3f", x.secondsOfWeek())).append(',').append(x.orbitSource()).append(',')
          .append(f("%.6f", x.orbitTermS() * 1e9)).append(',').append(f("%.6f", x.broadcastTermS() * 1e9)).append(',')
          .append(f("%.6f", x.differenceS() * 1e9)).append(',').append(f("%.6f", x.broadcastOrbitTermS() * 1e9))
          .append(',').append(f("%.7f", x.orbitPartS() * 1e9)).append(',').append(f("%.6f", x.formulaBoundS() * 1e9))
          .append(',').append(f("%.6f", x.j2TermS() * 1e9)).append(',').append(f("%.9e", x.rate())).append(',')
          .append(f("%.9e", x.smoothRate())).append(',').append(x.record()).append(',')
          .append(f("%.12e", x.clockS())).append(',').append(x.predicted()).append('\n');
    }
    Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
  }

  private static void writeSatellites(Path file, TermSurvey.Result r) throws IOException {
    final StringBuilder b = new StringBuilder("satellite,system,epochs,compared,rms_difference_ns,max_difference_ns,"
        + "rms_orbit_part_ns,max_orbit_part_ns,max_formula_bound_ns,max_j2_term_ns,secular_rate,secular_us_per_day,"
        + "secular_span_s,rms_model_residual_ns,max_model_residual_ns,rms_residual_without_j2_ns,"
        + "max_residual_without_j2_ns,orbit_bound_ns,records_accepted,records_repeated,records_rejected,exclusion,notes\n");
    for (TermSurvey.Satellite s : r.satellites()) {
      b.append(s.id()).append(',').append(s.system()).append(',').append(s.epochs()).append(',').append(s.compared())
          .append(',').append(f("%.6f", s.rmsDifferenceS() * 1e9)).append(',').append(f("%.6f", s.maxDifferenceS() * 1e9))
          .append(',').append(f("%.7f", s.rmsOrbitPartS() * 1e9)).append(',').append(f("%.7f", s.maxOrbitPartS() * 1e9))
          .append(',').append(f("%.6f", s.maxFormulaBoundS() * 1e9)).append(',').append(f("%.6f", s.maxJ2TermS() * 1e9))
          .append(',').append(f("%.9e", s.secularRate())).append(',').append(f("%.6f", s.secularMicrosecondsPerDay()))
          .append(',').append(f("%.0f", s.secularSpanS())).append(',').append(f("%.6f", s.rmsModelResidualS() * 1e9))
          .append(',').append(f("%.6f", s.maxModelResidualS() * 1e9)).append(',')
          .append(f("%.6f", s.rmsResidualWithoutJ2S() * 1e9)).append(',').append(f("%.6f", s.maxResidualWithoutJ2S() * 1e9))
          .append(',').append(f("%.6f", s.orbitBoundS() * 1e9)).append(',').append(s.recordsAccepted()).append(',')
          .append(s.recordsRepeated()).append(',').append(s.recordsRejected()).append(',').append(csv(s.exclusion()))
          .append(',').append(csv(String.join("; ", s.notes()))).append('\n');
    }
    Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
  }

  private static void writeRecords(Path file, TermSurvey.Result r) throws IOException {
    final StringBuilder b = new StringBuilder("record,satellite,reference_epoch_gps,outcome,health,position_error_m,reasons,notes\n");
    for (BroadcastCheck.Verdict v : r.verdicts()) {
      b.append(v.where()).append(',').append(v.id()).append(',').append(GnssTimeSystem.gpsCalendar(v.referenceGpsS()))
          .append(',').append(v.outcome()).append(',').append(v.health()).append(',').append(f("%.3f", v.positionErrorM()))
          .append(',').append(csv(String.join("; ", v.reasons()))).append(',').append(csv(String.join("; ", v.notes())))
          .append('\n');
    }
    Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
  }

  private static void writeEstimate(Path file, List<OrbitComparison.Satellite> cmp) throws IOException {
    final StringBuilder b = new StringBuilder("satellite,epochs,predicted_epochs,rms_position_m,max_position_m,"
        + "rms_term_difference_ps,max_term_difference_ps,max_j2_difference_ps,secular_rate_difference,"
        + "secular_difference_ps_per_day,exclusion\n");
    for (OrbitComparison.Satellite s : cmp) {
      b.append(s.id()).append(',').append(s.epochs()).append(',').append(s.predictedEpochs()).append(',')
          .append(f("%.4f", s.rmsPositionM())).append(',').append(f("%.4f", s.maxPositionM())).append(',')
          .append(f("%.5f", s.rmsTermS() * 1e12)).append(',').append(f("%.5f", s.maxTermS() * 1e12)).append(',')
          .append(f("%.6f", s.maxJ2DifferenceS() * 1e12)).append(',').append(f("%.4e", s.secularDifference())).append(',')
          .append(f("%.5f", s.secularDifferenceNsPerDay() * 1e3)).append(',').append(csv(s.exclusion())).append('\n');
    }
    Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
  }

  private static void plots(Path dir, TermSurvey.Result r) throws IOException {
    final XYSeriesCollection terms = new XYSeriesCollection();
    final XYSeriesCollection diffs = new XYSeriesCollection();
    final XYSeriesCollection j2 = new XYSeriesCollection();
    final Map<String, XYSeries[]> by = new LinkedHashMap<>();
    for (TermSurvey.Row x : r.rows()) {
      final XYSeries[] s = by.computeIfAbsent(x.id(), k -> new XYSeries[] {new XYSeries(k), new XYSeries(k), new XYSeries(k)});
      final double h = (x.gpsS() - r.firstGpsS()) / 3600;
      s[0].add(h, x.orbitTermS() * 1e9);
      if (Double.isFinite(x.differenceS())) {
        s[1].add(h, x.differenceS() * 1e9);
      }
      s[2].add(h, x.j2TermS() * 1e9);
    }
    for (XYSeries[] s : by.values()) {
      terms.addSeries(s[0]);
      if (s[1].getItemCount() > 0) {
        diffs.addSeries(s[1]);
      }
      j2.addSeries(s[2]);
    }
    final String from = " (hours from " + GnssTimeSystem.gpsCalendar(r.firstGpsS()) + " GPS)";
    Charts.save(Charts.lines("-2 r.v/c^2 per satellite", "time" + from, "ns", terms), dir, "periodic-term", PLOT_W, PLOT_H);
    if (diffs.getSeriesCount() > 0) {
      Charts.save(Charts.lines("-2 r.v/c^2 minus broadcast F e sqrt(A) sin E", "time" + from, "ns", diffs),
          dir, "difference", PLOT_W, PLOT_H);
    }
    Charts.save(Charts.lines("J2 periodic term (Kouba 2004)", "time" + from, "ns", j2), dir, "j2-term", PLOT_W, PLOT_H);
  }

  private static void printTables(PrintWriter pw, PreciseOrbit precise, PreciseOrbit est, TermSurvey.Result r,
      List<OrbitComparison.Satellite> cmp) {
    pw.println("Orbit: " + r.orbitSource());
    if (precise != null && !precise.header().analysisCentres().isEmpty()) {
      pw.println("  combination of analysis centres: " + String.join(" ", precise.header().analysisCentres()));
    }
    for (String note : r.fileNotes()) {
      pw.println("  note: " + note);
    }
    pw.println("Navigation: " + (r.navigationFiles().isEmpty() ? "none" : String.join(", ", r.navigationFiles()))
        + "; clocks: " + (r.clockFiles().isEmpty() ? "none" : String.join(", ", r.clockFiles())));
    pw.printf(Locale.ROOT, "Epochs %s to %s GPS (week %d, %.0f s of week at the first)%n",
        GnssTimeSystem.gpsCalendar(r.firstGpsS()), GnssTimeSystem.gpsCalendar(r.lastGpsS()),
        GnssTimeSystem.gpsWeek(r.firstGpsS()), GnssTimeSystem.secondsOfWeek(r.firstGpsS()));
    pw.printf(Locale.ROOT, "%-4s %6s %6s %9s %9s %9s %9s %11s %10s  %s%n", "sat", "epochs", "compd", "rms ns", "max ns",
        "bound ns", "|J2| ns", "sec us/day", "rec a/r/x", "exclusion / notes");
    for (TermSurvey.Satellite s : r.satellites()) {
      pw.printf(Locale.ROOT, "%-4s %6d %6d %9s %9s %9s %9s %11s %10s  %s%n", s.id(), s.epochs(), s.compared(),
          f("%.4f", s.rmsDifferenceS() * 1e9), f("%.4f", s.maxDifferenceS() * 1e9), f("%.4f", s.maxFormulaBoundS() * 1e9),
          f("%.4f", s.maxJ2TermS() * 1e9), f("%.4f", s.secularMicrosecondsPerDay()),
          s.recordsAccepted() + "/" + s.recordsRepeated() + "/" + s.recordsRejected(),
          s.exclusion() != null ? "EXCLUDED: " + s.exclusion() : String.join("; ", s.notes()));
    }
    pw.println("rms/max: -2 r.v/c^2 of the orbit minus the broadcast F e sqrt(A) sin E; bound: what that formula omits"
        + " (second-harmonic radial correction); rec a/r/x: records accepted/repeats/rejected");
    final long rejected = r.verdicts().stream().filter(v -> v.outcome() == BroadcastCheck.Outcome.REJECTED).count();
    if (!r.navigationFiles().isEmpty()) {
      pw.println("Rejected broadcast records: " + rejected);
    }
    for (BroadcastCheck.Verdict v : r.verdicts()) {
      if (v.outcome() == BroadcastCheck.Outcome.REJECTED) {
        pw.println("  " + v.where() + " " + v.id() + " " + GnssTimeSystem.gpsCalendar(v.referenceGpsS()) + ": "
            + String.join("; ", v.reasons()));
      }
    }
    if (!cmp.isEmpty()) {
      pw.println("Orbit estimate " + est.describe() + " against the precise orbit (what its error does to the correction):");
      for (String note : est.header().warnings()) {
        pw.println("  note: " + note);
      }
      pw.printf(Locale.ROOT, "%-4s %6s %5s %9s %9s %10s %10s %10s %12s  %s%n", "sat", "epochs", "pred", "rms m", "max m",
          "rms ps", "max ps", "J2 ps", "sec ps/day", "exclusion");
      for (OrbitComparison.Satellite s : cmp) {
        pw.printf(Locale.ROOT, "%-4s %6d %5d %9s %9s %10s %10s %10s %12s  %s%n", s.id(), s.epochs(), s.predictedEpochs(),
            f("%.3f", s.rmsPositionM()), f("%.3f", s.maxPositionM()), f("%.4f", s.rmsTermS() * 1e12),
            f("%.4f", s.maxTermS() * 1e12), f("%.5f", s.maxJ2DifferenceS() * 1e12),
            f("%.5f", s.secularDifferenceNsPerDay() * 1e3), s.exclusion() == null ? "" : s.exclusion());
      }
    }
  }
}
