package org.eigenzeit.ground.report;

import java.awt.Color;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.pipeline.RunResult;
import org.eigenzeit.ground.pipeline.ScenarioVerdict;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.TimingBudget;
import org.jfree.chart.JFreeChart;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * Writes the campaign report a review board can judge: the provenance; per scenario its inputs
 * restated (orbit, oscillator, measurement plan, faults, budget) and whose they are, the verdict
 * against its timing budget across seeds (nearest-rank percentile and worst case), the time error
 * after settling with the budget band and the outages shaded, ADEV and TDEV of the time error on
 * log-log axes at octave-spaced taus with 1-sigma error bars beside the free oscillator's ADEV,
 * and for scenarios run at every model level the comparison with what each term leaves. Plots go to
 * {@code plots/} as PNG and SVG; {@code report.html} embeds the PNGs so that it opens on its own.
 */
public final class HtmlReport {
  private static final Color OUTAGE = new Color(0xf0a030);
  private static final Color GAP = new Color(0x9aa7b8);

  private HtmlReport() {}

  /** A run's result with its time series columns (time s, time error ns). */
  public record RunData(RunResult result, double[] tS, double[] errorNs) {
    /** Defensive copies. */
    public RunData {
      tS = tS.clone();
      errorNs = errorNs.clone();
    }

    @Override
    public double[] tS() {
      return tS.clone();
    }

    @Override
    public double[] errorNs() {
      return errorNs.clone();
    }
  }

  /**
   * One scenario's part of the report.
   *
   * @param scenario the resolved scenario
   * @param origin its file or "built-in demo ..."
   * @param builtIn a built-in demo mission (invented) rather than the user's
   * @param verdict its verdict across seeds
   * @param runs its seeds' runs
   * @param levels its model-level comparison runs (empty when not run)
   */
  public record Section(Scenario scenario, String origin, boolean builtIn, ScenarioVerdict verdict, List<RunData> runs,
      List<RunData> levels) {
    /** Immutable copies. */
    public Section {
      runs = List.copyOf(runs);
      levels = List.copyOf(levels);
    }
  }

  /**
   * What the report shows.
   *
   * @param title the title
   * @param provenance rows of (item, value)
   * @param sections one per scenario
   */
  public record Input(String title, List<String[]> provenance, List<Section> sections) {
    /** Immutable copies. */
    public Input {
      provenance = List.copyOf(provenance);
      sections = List.copyOf(sections);
    }
  }

  /**
   * Reads timeseries.csv columns t_s and time_error_ns.
   *
   * @param csv the file
   * @return {t, error}
   * @throws IOException when unreadable
   */
  public static double[][] readSeries(Path csv) throws IOException {
    final List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
    final double[] t = new double[lines.size() - 1];
    final double[] e = new double[lines.size() - 1];
    for (int i = 1; i < lines.size(); i++) {
      final String[] f = lines.get(i).split(",", 3);
      try {
        t[i - 1] = Double.parseDouble(f[0]);
        e[i - 1] = Double.parseDouble(f[1]);
      } catch (NumberFormatException | ArrayIndexOutOfBoundsException ex) {
        throw new IOException(csv + ":" + (i + 1) + ": not a time-series row written by eigenzeit", ex);
      }
    }
    return new double[][] {t, e};
  }

  /**
   * Writes the report.
   *
   * @param out campaign folder
   * @param in what to show
   * @return the HTML file
   * @throws IOException when a file cannot be written
   */
  public static Path write(Path out, Input in) throws IOException {
    final Path plots = out.resolve("plots");
    final StringBuilder html = new StringBuilder(1 << 16);
    html.append("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>").append(esc(in.title()))
        .append("</title><style>body{font-family:sans-serif;max-width:1240px;margin:2em auto;color:#222;line-height:1.4}"
            + "table{border-collapse:collapse;margin:.6em 0}td,th{border:1px solid #aaa;padding:3px 8px;text-align:right;"
            + "white-space:nowrap}th{background:#e8e8e8}td.l,th.l{text-align:left}.wrap{overflow-x:auto}"
            + ".caution{border:2px solid #b00;padding:.6em;background:#fff4f4}.pass{color:#1e6b2e;font-weight:bold}"
            + ".fail{color:#b00000;font-weight:bold}.kind{display:inline-block;padding:2px 8px;border-radius:4px;"
            + "background:#eef;border:1px solid #99c}img{max-width:100%}td.v{white-space:normal;text-align:left}"
            + "</style></head><body>");
    html.append("<h1>").append(esc(in.title())).append("</h1>");
    html.append("<p class=\"caution\"><b>Caution.</b> Timing errors on navigation satellites endanger users. These "
        + "simulation results support the mission's own verification and do not replace it; the applicable interface "
        + "specifications and standards govern. Each scenario below says whose it is: the built-in demo missions are "
        + "invented, with typical oscillator values; a user's scenario is reported as given.</p>");
    html.append("<h2>Provenance</h2><div class=\"wrap\"><table>");
    for (String[] row : in.provenance()) {
      html.append("<tr><th class=\"l\">").append(esc(row[0])).append("</th><td class=\"v\"><code>").append(esc(row[1]))
          .append("</code></td></tr>");
    }
    html.append("</table></div>");
    verdictOverview(html, in);
    for (Section s : in.sections()) {
      section(html, s, plots);
    }
    html.append("<p>Per-run data: <code>runs/&lt;scenario&gt;/seed-&lt;n&gt;/summary.json</code> and "
        + "<code>timeseries.csv</code>; the resolved inputs in <code>inputs/</code>; plots as PNG and SVG in "
        + "<code>plots/</code>. Error bars: the simple 1-sigma estimate sigma/&radic;N, N the number of non-overlapping "
        + "averaging intervals less one (Riley, <i>Handbook of Frequency Stability Analysis</i>, NIST SP 1065, 2008, "
        + "section 5.3). Percentiles: nearest rank.</p>");
    html.append("</body></html>\n");
    final Path file = out.resolve("report.html");
    Files.writeString(file, html.toString(), StandardCharsets.UTF_8);
    return file;
  }

  private static void verdictOverview(StringBuilder html, Input in) {
    html.append("<h2>Verdicts</h2><div class=\"wrap\"><table><tr><th class=\"l\">scenario</th><th class=\"l\">whose</th>"
        + "<th>seeds</th><th>verdict</th><th>seeds passing</th><th>RMS after settling (ns), mean</th>"
        + "<th>settling time (s), worst</th></tr>");
    for (Section s : in.sections()) {
      double rms = 0;
      double settle = 0;
      for (RunData d : s.runs()) {
        rms += d.result().rmsTimeErrorNs() / s.runs().size();
        settle = Math.max(settle, d.result().settleTimeS() < 0 ? Double.POSITIVE_INFINITY : d.result().settleTimeS());
      }
      final String st = s.verdict().status();
      html.append("<tr><td class=\"l\">").append(esc(s.scenario().name())).append("</td><td class=\"l\">")
          .append(s.builtIn() ? "demo (invented)" : "user").append("</td><td>").append(s.runs().size())
          .append("</td><td class=\"").append(st.equals("no budget") ? "" : st).append("\">").append(esc(st))
          .append("</td><td>").append(st.equals("no budget") ? "-" : s.verdict().seedsPassing() + " of " + s.runs().size())
          .append(String.format(Locale.ROOT, "</td><td>%.3f</td><td>%s</td></tr>", rms,
              Double.isInfinite(settle) ? "never" : String.format(Locale.ROOT, "%.0f", settle)));
    }
    html.append("</table></div>");
  }

  private static void section(StringBuilder html, Section s, Path plots) throws IOException {
    final Scenario sc = s.scenario();
    final String name = sc.name();
    html.append("<h2 id=\"").append(esc(name)).append("\">").append(esc(name)).append("</h2><p><span class=\"kind\">")
        .append(s.builtIn() ? "built-in demo mission: invented for the demonstration, typical values"
            : "scenario supplied by the user: " + esc(s.origin()))
        .append("</span> ").append(esc(sc.description())).append("</p>");
    inputs(html, s);
    verdict(html, s);
    if (!s.runs().isEmpty()) {
      runsTable(html, s);
      timeError(html, s, plots);
      stability(html, s, plots, true);
      stability(html, s, plots, false);
      final DefaultCategoryDataset dist = new DefaultCategoryDataset();
      for (RunData d : s.runs()) {
        dist.addValue(d.result().rmsTimeErrorNs(), "RMS time error (ns)", "seed " + d.result().seed());
      }
      final JFreeChart bars = Charts.bars(name + ": RMS time error after settling, by seed", "seed", "RMS (ns)", dist);
      if (sc.budget().hasRms()) {
        final org.jfree.chart.plot.ValueMarker m = new org.jfree.chart.plot.ValueMarker(sc.budget().rmsTimeErrorNs(),
            Charts.BUDGET, new java.awt.BasicStroke(1.6f));
        m.setLabel("budget " + num(sc.budget().rmsTimeErrorNs()) + " ns");
        m.setLabelPaint(Charts.BUDGET);
        bars.getCategoryPlot().addRangeMarker(m);
        final var axis = bars.getCategoryPlot().getRangeAxis();
        axis.setUpperBound(Math.max(axis.getUpperBound(), 1.1 * sc.budget().rmsTimeErrorNs()));
      }
      img(html, Charts.save(bars, plots, name + "-seeds"), "RMS time error by seed");
    }
    if (!s.levels().isEmpty()) {
      levels(html, s, plots);
    }
  }

  private static void inputs(StringBuilder html, Section s) {
    final Scenario sc = s.scenario();
    final List<String[]> rows = new ArrayList<>();
    final Scenario.Timing t = sc.timing();
    rows.add(new String[] {"run", String.format(Locale.ROOT, "%s h at a %d s cycle from %s %s; UT1 - TT %s s; initial "
        + "time error %s ns", num(t.spanH()), t.cycleS(), t.epoch(), t.timeScale(), Double.toString(t.ut1MinusTtS()),
        num(t.initialTimeErrorNs()))});
    final Scenario.OrbitInput o = sc.orbit();
    if (o.elements() != null) {
      final Scenario.Elements e = o.elements();
      rows.add(new String[] {"orbit", String.format(Locale.ROOT, "%s: a = %s km, e = %s, i = %s deg, RAAN = %s deg, "
          + "argument of perigee = %s deg, true anomaly = %s deg; truth with radiation pressure Cr A/m = %s m2/kg, "
          + "drag Cd A/m = %s m2/kg", e.body(), num(e.smaKm()), num(e.ecc()), num(e.incDeg()), num(e.raanDeg()),
          num(e.argpDeg()), num(e.anomalyDeg()), num(o.srp()), num(o.drag()))});
    } else {
      rows.add(new String[] {"orbit", "external " + o.trajectory().format().toUpperCase(Locale.ROOT) + " file "
          + o.trajectory().file().getFileName() + (o.trajectory().satellite().isEmpty() ? "" : ", satellite "
          + o.trajectory().satellite()) + ", SHA-256 " + o.trajectory().sha256()});
    }
    final var osc = sc.oscillator();
    rows.add(new String[] {"oscillator", String.format(Locale.ROOT, "%s: white PM %s ps, white FM %s at 1 s, flicker "
        + "floor %s, random-walk FM %s at 1 s, drift %s per day, initial frequency %s", osc.name(),
        num(osc.whitePmSigmaXS() * 1e12), num(osc.whiteFmAdev1s()), num(osc.flickerFmFloor()),
        num(osc.randomWalkFmAdev1s()), num(osc.driftPerDay()), num(osc.initialFrequency()))});
    rows.add(new String[] {"onboard model", "level " + sc.model().level() + (sc.model().degree() > 0
        ? ", degree " + sc.model().degree() : ", degree recommended for the orbit")});
    final var m = sc.measurements();
    rows.add(new String[] {"measurement plan", String.format(Locale.ROOT, "source %d, %s ns white noise %s; %s; outliers "
        + "of %s ns with probability %s", m.source(), num(m.sigmaS() * 1e9), m.everyS() > 0 ? "every " + num(m.everyS())
        + " s" : "never", m.outageStartS() >= 0 ? String.format(Locale.ROOT, "outage from %s h for %s h",
        num(m.outageStartS() / 3600), num(m.outageLengthS() / 3600)) : "no outage", num(m.outlierS() * 1e9),
        num(m.outlierProbability()))});
    final var er = sc.errors();
    rows.add(new String[] {"orbit estimate faults", String.format(Locale.ROOT, "noise %s m and %s m/s per axis, radial bias "
        + "%s m, %s, corrupted samples (NaN or a 50 km jump) with probability %s", num(er.positionNoiseM()),
        num(er.velocityNoiseMPerS()), num(er.radialBiasM()), er.gapEveryS() > 0 ? "gaps of " + num(er.gapLengthS())
        + " s every " + num(er.gapEveryS()) + " s" : "no gaps", num(er.corruptProbability()))});
    final var sv = sc.servo();
    rows.add(new String[] {"servo and actuator", String.format(Locale.ROOT, "time constants %s s (track), %s s (acquire); "
        + "track enter/exit %s/%s ns; coast after %s s, at most %s h; actuator quantum %s, delay %d cycles",
        num(sv.timeConstantTrackS()), num(sv.timeConstantAcquireS()), num(sv.trackEnterNs()), num(sv.trackExitNs()),
        num(sv.coastAfterS()), num(sv.coastMaxH()), num(sc.actuator().quantum()), sc.actuator().delayCycles())});
    final TimingBudget b = sc.budget();
    rows.add(new String[] {"timing budget", !b.stated() ? "none stated (settling band: the servo's track-exit threshold "
        + num(sv.trackExitNs()) + " ns; no verdict)" : String.format(Locale.ROOT, "settle within %s s into |time error| "
        + "<= %s ns and stay there%s%s; verdict at the %s th percentile of the seeds", num(b.settleWithinS()),
        num(b.maxAbsTimeErrorNs()), b.hasRms() ? "; RMS after settling <= " + num(b.rmsTimeErrorNs()) + " ns" : "",
        b.hasAdev() ? "; ADEV at " + num(b.adevTauS()) + " s <= " + num(b.adevMax()) : "", num(b.percentile()))});
    rows.add(new String[] {"content hash", sc.contentHash() + " (inputs/" + sc.name() + ".yaml)"});
    html.append("<h3>Inputs</h3><div class=\"wrap\"><table>");
    for (String[] r : rows) {
      html.append("<tr><th class=\"l\">").append(esc(r[0])).append("</th><td class=\"v\">").append(esc(r[1]))
          .append("</td></tr>");
    }
    html.append("</table></div>");
  }

  private static void verdict(StringBuilder html, Section s) {
    final ScenarioVerdict v = s.verdict();
    if (v.status().equals("no budget")) {
      html.append("<p>No timing budget stated: no verdict.</p>");
      return;
    }
    html.append("<h3>Verdict: <span class=\"").append(v.status()).append("\">").append(v.status().toUpperCase(Locale.ROOT))
        .append("</span></h3><p>").append(v.seedsPassing()).append(" of ").append(v.seeds())
        .append(" seeds pass on their own. The verdict takes each figure's ").append(num(v.percentile()))
        .append(" th percentile across the seeds (nearest rank); the worst case is shown beside it.</p>")
        .append("<div class=\"wrap\"><table><tr><th class=\"l\">figure</th><th>budget</th><th>")
        .append(num(v.percentile())).append(" th percentile</th><th>worst seed</th><th>percentile</th><th>worst</th></tr>");
    for (ScenarioVerdict.Figure f : v.figures()) {
      html.append("<tr><td class=\"l\">").append(esc(f.name())).append(f.unit().isEmpty() ? "" : " (" + f.unit() + ")")
          .append("</td><td>").append(num(f.budget())).append("</td><td>").append(fig(f.atPercentile())).append("</td><td>")
          .append(fig(f.worst())).append("</td>").append(passCell(f.percentileWithin())).append(passCell(f.worstWithin()))
          .append("</tr>");
    }
    html.append("</table></div>");
  }

  private static String passCell(boolean ok) {
    return ok ? "<td class=\"pass\">within</td>" : "<td class=\"fail\">exceeds</td>";
  }

  private static void runsTable(StringBuilder html, Section s) {
    final TimingBudget b = s.scenario().budget();
    html.append("<h3>Runs</h3><div class=\"wrap\"><table><tr><th>seed</th><th>settled (s)</th><th>band (ns)</th>"
        + "<th>RMS after settling (ns)</th><th>max after settling (ns)</th><th>max incl. settling (ns)</th>"
        + "<th>freq. error RMS (100 s)</th>").append(b.hasAdev() ? "<th>ADEV at " + num(b.adevTauS()) + " s</th>" : "")
        .append("<th>faults</th><th class=\"l\">verdict</th></tr>");
    for (RunData d : s.runs()) {
      final RunResult r = d.result();
      int faults = 0;
      for (int c : r.faults().values()) {
        faults += c;
      }
      html.append(String.format(Locale.ROOT, "<tr><td>%d</td><td>%s</td><td>%s</td><td>%.3f</td><td>%.3f</td><td>%.1f</td>"
          + "<td>%.2e</td>", r.seed(), r.settleTimeS() < 0 ? "never" : String.format(Locale.ROOT, "%.0f", r.settleTimeS()),
          num(r.settlingBandNs()), r.rmsTimeErrorNs(), r.maxAbsTimeErrorNs(), r.maxAbsTimeErrorAllNs(),
          r.fractionalFrequencyErrorRms()));
      if (b.hasAdev()) {
        html.append("<td>").append(fig(r.verdict().adevAtBudgetTau())).append("</td>");
      }
      html.append("<td>").append(faults).append("</td><td class=\"l\">").append(esc(r.verdict().status()))
          .append(r.verdict().reasons().isEmpty() ? "" : ": " + esc(String.join("; ", r.verdict().reasons())))
          .append("</td></tr>");
    }
    html.append("</table></div>");
    lunarTable(html, s);
  }

  /** Moon-centred runs: the time error against TL is the table above; TL - TT and TT from the core. */
  private static void lunarTable(StringBuilder html, Section s) {
    if (s.runs().isEmpty() || s.runs().get(0).result().lunar() == null) {
      return;
    }
    html.append("<h3>Lunar time (TL realised; offset against TT from the uplinked table)</h3><p>The corrected time "
        + "realises TL; TT comes from the core's TL - TT table, checked here against the ground's relation along DE405. "
        + "A held (flagged) value is never extrapolated. Simulation only: the mission's own verification and the "
        + "applicable lunar time standards govern.</p><div class=\"wrap\"><table><tr><th>seed</th><th class=\"l\">"
        + "table uplink</th><th>stated accuracy (ps)</th><th>rows valid / held</th><th>max |TL - TT core - ground| (ps)"
        + "</th><th>max |TT error| (ns)</th><th>TL - TT at end (s)</th><th>clock - TT at end (us)</th>"
        + "<th class=\"l\">last status</th></tr>");
    for (RunData d : s.runs()) {
      final org.eigenzeit.ground.timescale.LunarRecord l = d.result().lunar();
      if (l == null) {
        continue;
      }
      html.append(String.format(Locale.ROOT, "<tr><td>%d</td><td class=\"l\">%s</td><td>%.2f</td><td>%d / %d</td>"
          + "<td>%s</td><td>%s</td><td>%.12f</td><td>%.4f</td><td class=\"l\">%s</td></tr>", d.result().seed(),
          esc(l.uplinkStatus()), l.tableAccuracyS() * 1e12, l.rowsValid(), l.rowsHeld(),
          Double.isNaN(l.maxTableErrorS()) ? "none valid" : String.format(Locale.ROOT, "%.3f", l.maxTableErrorS() * 1e12),
          Double.isNaN(l.maxTtErrorS()) ? "none valid" : String.format(Locale.ROOT, "%.3f", l.maxTtErrorS() * 1e9),
          l.tlMinusTtEndS(), l.clockMinusTtEndS() * 1e6, esc(l.lastStatus())));
    }
    html.append("</table></div>");
  }

  private static void timeError(StringBuilder html, Section s, Path plots) throws IOException {
    final Scenario sc = s.scenario();
    final XYSeriesCollection te = new XYSeriesCollection();
    for (RunData d : s.runs()) {
      te.addSeries(series("seed " + d.result().seed(), d.tS(), d.errorNs(), 1.0 / 3600,
          Math.max(0, d.result().settleTimeS())));
    }
    final double band = s.runs().get(0).result().settlingBandNs();
    final JFreeChart c = Charts.lines(sc.name() + ": time error after settling", "time (h)",
        "corrected time - true scale (ns)", te);
    Charts.budgetLine(c, band, true, sc.budget().stated() ? "budget +/-" + num(band) + " ns" : "band +/-" + num(band) + " ns");
    shadeOutages(c, sc);
    img(html, Charts.save(c, plots, sc.name() + "-time-error"), "time error");
    html.append("<p>Each seed from its own settling time (the time after which |time error| stays within the band). "
        + "Shaded: measurement outage (orange), orbit-estimate gaps (grey).</p>");
  }

  private static void shadeOutages(JFreeChart c, Scenario sc) {
    final var m = sc.measurements();
    if (m.outageStartS() >= 0) {
      Charts.shade(c, m.outageStartS() / 3600, Math.min(sc.timing().spanS(), m.outageStartS() + m.outageLengthS()) / 3600,
          OUTAGE, "measurement outage");
    }
    final var e = sc.errors();
    if (e.gapEveryS() > 0 && sc.timing().spanS() / e.gapEveryS() <= 200) {
      for (double t = e.gapEveryS() - e.gapLengthS(); t < sc.timing().spanS(); t += e.gapEveryS()) {
        Charts.shade(c, t / 3600, (t + e.gapLengthS()) / 3600, GAP, null);
      }
    }
  }

  private static void stability(StringBuilder html, Section s, Path plots, boolean adev) throws IOException {
    final Scenario sc = s.scenario();
    final YIntervalSeriesCollection data = new YIntervalSeriesCollection();
    for (RunData d : s.runs()) {
      final YIntervalSeries y = new YIntervalSeries("time error, seed " + d.result().seed());
      for (RunResult.StabilityPoint p : d.result().stability()) {
        final double v = adev ? p.adev() : p.tdev();
        final double err = adev ? p.adevError() : p.tdevError();
        if (v > 0) {
          y.add(p.tauS(), v, Math.max(v - err, v * 0.05), v + err);
        }
      }
      data.addSeries(y);
    }
    if (adev) {
      final YIntervalSeries osc = new YIntervalSeries("free-running oscillator (" + sc.oscillator().name() + ")");
      for (RunResult.StabilityPoint p : s.runs().get(0).result().stability()) {
        osc.add(p.tauS(), p.oscillatorAdev(), p.oscillatorAdev(), p.oscillatorAdev());
      }
      data.addSeries(osc);
    }
    final JFreeChart c = Charts.stability(sc.name() + (adev ? ": Allan deviation of the time error"
        : ": time deviation of the time error"), adev ? "overlapping ADEV sigma_y(tau)" : "TDEV sigma_x(tau) (s)", data, adev);
    if (adev && sc.budget().hasAdev()) {
      Charts.budgetLine(c, sc.budget().adevMax(), false, "ADEV budget " + num(sc.budget().adevMax()) + " at tau = "
          + num(sc.budget().adevTauS()) + " s");
    }
    img(html, Charts.save(c, plots, sc.name() + (adev ? "-adev" : "-tdev")), adev ? "ADEV" : "TDEV");
  }

  private static void levels(StringBuilder html, Section s, Path plots) throws IOException {
    final String name = s.scenario().name();
    html.append("<h3>What each relativistic term does</h3><p>The same scenario (seed 0, the same noise) with the onboard "
        + "model at each level: none (no relativistic correction: the servo must absorb the secular rate and cannot follow "
        + "the periodic terms), point mass, J2, and the full model (harmonics and tides). The rate error is the mean rate "
        + "the core applied (none at level none) minus the true mean rate; over the span it is the offset the servo "
        + "must remove.</p>");
    final XYSeriesCollection lv = new XYSeriesCollection();
    for (RunData d : s.levels()) {
      lv.addSeries(series(d.result().modelLevel(), d.tS(), d.errorNs(), 1.0 / 3600, Math.max(0, d.result().settleTimeS())));
    }
    final JFreeChart c = Charts.lines(name + ": time error by model level (after settling)", "time (h)",
        "corrected time - true scale (ns)", lv);
    shadeOutages(c, s.scenario());
    img(html, Charts.save(c, plots, name + "-levels"), "levels");
    html.append("<div class=\"wrap\"><table><tr><th class=\"l\">level</th><th>RMS after settling (ns)</th><th>max after "
        + "settling (ns)</th><th>settled (s)</th><th>applied mean rate - true mean rate</th><th>over the span (ns)</th></tr>");
    for (RunData d : s.levels()) {
      final RunResult r = d.result();
      final double dr = appliedRate(r) - r.trueRelativisticRate();
      html.append(String.format(Locale.ROOT, "<tr><td class=\"l\">%s</td><td>%.3f</td><td>%.3f</td><td>%s</td><td>%.2e</td>"
          + "<td>%.3f</td></tr>", esc(r.modelLevel()), r.rmsTimeErrorNs(), r.maxAbsTimeErrorNs(), r.settleTimeS() < 0
          ? "never" : String.format(Locale.ROOT, "%.0f", r.settleTimeS()), dr, dr * r.spanS() * 1e9));
    }
    html.append("</table></div>").append(explainLevels(s.levels()));
  }

  /** The mean rate the core applied: its model's, or none at level "none" (the model runs but is not applied). */
  private static double appliedRate(RunResult r) {
    return "none".equals(r.modelLevel()) ? 0 : r.modelRelativisticRate();
  }

  /** Words for each step up the levels: whether it mattered, and why not when it did not. */
  static String explainLevels(List<RunData> levels) {
    final StringBuilder sb = new StringBuilder("<ul>");
    for (int i = 1; i < levels.size(); i++) {
      final RunResult a = levels.get(i - 1).result();
      final RunResult b = levels.get(i).result();
      final double gain = a.rmsTimeErrorNs() - b.rmsTimeErrorNs();
      final double rel = Math.abs(gain) / Math.max(b.rmsTimeErrorNs(), 1e-9);
      final double leftA = Math.abs(appliedRate(a) - a.trueRelativisticRate()) * a.spanS() * 1e9;
      final double leftB = Math.abs(appliedRate(b) - b.trueRelativisticRate()) * b.spanS() * 1e9;
      sb.append("<li><b>").append(esc(a.modelLevel())).append(" &rarr; ").append(esc(b.modelLevel())).append("</b>: ");
      if (rel >= 0.05) {
        sb.append(String.format(Locale.ROOT, "matters here: the RMS time error goes from %.3f to %.3f ns; the mean rate "
            + "error the model leaves over the span goes from %.3g to %.3g ns.", a.rmsTimeErrorNs(), b.rmsTimeErrorNs(),
            leftA, leftB));
      } else {
        sb.append(String.format(Locale.ROOT, "does not matter here (RMS %.3f vs %.3f ns): the term it adds changes the "
            + "model's mean rate error over the span from %.3g to %.3g ns, and its periodic part is below what this "
            + "loop resolves: the servo absorbs a constant rate error as a frequency offset, and the measurement noise "
            + "and oscillator dominate the rest.", a.rmsTimeErrorNs(), b.rmsTimeErrorNs(), leftA, leftB));
      }
      sb.append("</li>");
    }
    return sb.append("</ul>").toString();
  }

  private static XYSeries series(String key, double[] t, double[] y, double tScale, double fromS) {
    final XYSeries s = new XYSeries(key, false, true);
    for (int i = 0; i < t.length; i++) {
      if (t[i] >= fromS) {
        s.add(t[i] * tScale, y[i]);
      }
    }
    return s;
  }

  private static void img(StringBuilder html, byte[] png, String alt) {
    html.append("<p><img alt=\"").append(esc(alt)).append("\" src=\"data:image/png;base64,")
        .append(Base64.getEncoder().encodeToString(png)).append("\"></p>");
  }

  private static String fig(double v) {
    if (Double.isInfinite(v)) {
      return "never";
    }
    if (Double.isNaN(v)) {
      return "-";
    }
    return num(v);
  }

  static String num(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e7) {
      return Long.toString((long) v);
    }
    final double a = Math.abs(v);
    if (a >= 1e-3 && a < 1e7) {
      return String.format(Locale.ROOT, "%.4g", v).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "");
    }
    return String.format(Locale.ROOT, "%.3e", v).replaceAll("\\.?0+e", "e").replace("e+0", "e").replace("e-0", "e-")
        .replace("e+", "e");
  }

  static String esc(String s) {
    return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
  }
}
