package org.eigenzeit.ground.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.ground.pipeline.RunResult;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Writes the campaign report: per scenario, the time error against time (every seed), ADEV and
 * TDEV of the time error on log-log axes with the oscillator's own ADEV, and the distribution of
 * the RMS time error across seeds; for scenarios run at several model levels, the same scenario
 * side by side at each level. Plots go to {@code plots/} as PNG and SVG; {@code report.html}
 * embeds the PNGs so that it opens on its own.
 */
public final class HtmlReport {
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
      t[i - 1] = Double.parseDouble(f[0]);
      e[i - 1] = Double.parseDouble(f[1]);
    }
    return new double[][] {t, e};
  }

  private static String base(String scenario) {
    final int at = scenario.indexOf('@');
    return at < 0 ? scenario : scenario.substring(0, at);
  }

  /**
   * Writes the report.
   *
   * @param out campaign folder
   * @param runs every run with its series
   * @param title report title
   * @return the HTML file
   * @throws IOException when a file cannot be written
   */
  public static Path write(Path out, List<RunData> runs, String title) throws IOException {
    final Path plots = out.resolve("plots");
    final Map<String, List<RunData>> byScenario = new LinkedHashMap<>();
    final Map<String, List<RunData>> byBase = new LinkedHashMap<>();
    for (RunData d : runs) {
      byScenario.computeIfAbsent(d.result().scenario(), k -> new ArrayList<>()).add(d);
      byBase.computeIfAbsent(base(d.result().scenario()), k -> new ArrayList<>()).add(d);
    }
    final StringBuilder html = new StringBuilder(1 << 16);
    html.append("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>").append(esc(title))
        .append("</title><style>body{font-family:sans-serif;max-width:980px;margin:2em auto;color:#222}"
            + "table{border-collapse:collapse;margin:1em 0}td,th{border:1px solid #bbb;padding:3px 8px;text-align:right}"
            + "th{background:#eee}.caution{border:2px solid #b00;padding:.6em;background:#fff4f4}img{max-width:100%}"
            + "</style></head><body>");
    html.append("<h1>").append(esc(title)).append("</h1>");
    html.append("<p class=\"caution\"><b>Caution.</b> Timing errors on navigation satellites endanger users. These "
        + "simulation results support the mission's own verification and do not replace it; the applicable "
        + "interface specifications and standards govern. Demo scenarios are invented missions with typical "
        + "oscillator values.</p>");
    html.append("<h2>Summary</h2><table><tr><th>scenario</th><th>level</th><th>seeds</th><th>settle (s)</th>"
        + "<th>RMS time error (ns)</th><th>max time error (ns)</th><th>max incl. settling (ns)</th>"
        + "<th>freq. error RMS (100 s)</th><th>true rel. rate</th><th>model rel. rate</th><th>faults</th></tr>");
    for (Map.Entry<String, List<RunData>> e : byScenario.entrySet()) {
      final List<RunData> l = e.getValue();
      double rms = 0;
      double max = 0;
      double maxAll = 0;
      double freq = 0;
      double settle = 0;
      int faults = 0;
      for (RunData d : l) {
        rms += d.result().rmsTimeErrorNs() / l.size();
        max = Math.max(max, d.result().maxAbsTimeErrorNs());
        maxAll = Math.max(maxAll, d.result().maxAbsTimeErrorAllNs());
        freq += d.result().fractionalFrequencyErrorRms() / l.size();
        settle += d.result().settleTimeS() / l.size();
        faults += d.result().faults().values().stream().mapToInt(Integer::intValue).sum();
      }
      final RunResult r0 = l.get(0).result();
      html.append(String.format(Locale.ROOT, "<tr><td style=\"text-align:left\">%s</td><td>%s</td><td>%d</td><td>%.0f</td>"
          + "<td>%.3f</td><td>%.3f</td><td>%.1f</td><td>%.2e</td><td>%.4e</td><td>%.4e</td><td>%d</td></tr>",
          esc(base(e.getKey())), esc(r0.modelLevel()), l.size(), settle, rms, max, maxAll, freq,
          r0.trueRelativisticRate(), r0.modelRelativisticRate(), faults));
    }
    html.append("</table>");
    int chartNo = 0;
    for (Map.Entry<String, List<RunData>> e : byBase.entrySet()) {
      final String name = e.getKey();
      final List<RunData> all = e.getValue();
      html.append("<h2>").append(esc(name)).append("</h2>");
      final Map<String, List<RunData>> levels = new LinkedHashMap<>();
      for (RunData d : all) {
        levels.computeIfAbsent(d.result().modelLevel() + (d.result().scenario().contains("@") ? "@" : ""),
            k -> new ArrayList<>()).add(d);
      }
      final List<RunData> main = new ArrayList<>();
      for (RunData d : all) {
        if (!d.result().scenario().contains("@")) {
          main.add(d);
        }
      }
      if (!main.isEmpty()) {
        final XYSeriesCollection te = new XYSeriesCollection();
        for (RunData d : main) {
          te.addSeries(series("seed " + d.result().seed(), d.tS(), d.errorNs(), 1.0 / 3600, d.result().settleTimeS()));
        }
        img(html, Charts.save(Charts.lines(name + ": time error against time (after settling)", "time (h)",
            "corrected time - true scale (ns)",
            te, false, false), plots, name + "-time-error"), "time error");
        final RunData d0 = main.get(0);
        final XYSeriesCollection ad = new XYSeriesCollection();
        final XYSeriesCollection td = new XYSeriesCollection();
        for (RunData d : main) {
          final XYSeries adev = new XYSeries("time error, seed " + d.result().seed());
          final XYSeries tdev = new XYSeries("time error, seed " + d.result().seed());
          for (RunResult.StabilityPoint p : d.result().stability()) {
            if (p.adev() > 0) {
              adev.add(Math.log10(p.tauS()), Math.log10(p.adev()));
            }
            if (p.tdev() > 0) {
              tdev.add(Math.log10(p.tauS()), Math.log10(p.tdev()));
            }
          }
          ad.addSeries(adev);
          td.addSeries(tdev);
        }
        final XYSeries osc = new XYSeries("free oscillator (" + d0.result().oscillator() + ")");
        for (RunResult.StabilityPoint p : d0.result().stability()) {
          osc.add(Math.log10(p.tauS()), Math.log10(p.oscillatorAdev()));
        }
        ad.addSeries(osc);
        img(html, Charts.save(Charts.lines(name + ": Allan deviation (log-log)", "log10 averaging time tau (s)",
            "log10 ADEV", ad, false, false), plots, name + "-adev"), "ADEV");
        img(html, Charts.save(Charts.lines(name + ": time deviation (log-log)", "log10 averaging time tau (s)",
            "log10 TDEV (s)", td, false, false), plots, name + "-tdev"), "TDEV");
        final DefaultCategoryDataset dist = new DefaultCategoryDataset();
        for (RunData d : main) {
          dist.addValue(d.result().rmsTimeErrorNs(), "RMS time error (ns)", "seed " + d.result().seed());
        }
        img(html, Charts.save(Charts.bars(name + ": RMS time error across seeds", "seed", "RMS time error (ns)", dist),
            plots, name + "-seeds"), "distribution across seeds");
      }
      final List<RunData> compared = new ArrayList<>();
      for (RunData d : all) {
        if (d.result().scenario().contains("@") && d.result().seed() == 0) {
          compared.add(d);
        }
      }
      if (!compared.isEmpty()) {
        html.append("<h3>What each relativistic term does</h3><p>The same scenario with the onboard model at each "
            + "level (seed 0): none (no relativistic correction; the servo must absorb the secular rate and cannot "
            + "follow the periodic term), point mass, J2, and the full model.</p>");
        final XYSeriesCollection lv = new XYSeriesCollection();
        for (RunData d : compared) {
          lv.addSeries(series(d.result().modelLevel(), d.tS(), d.errorNs(), 1.0 / 3600, d.result().settleTimeS()));
        }
        img(html, Charts.save(Charts.lines(name + ": time error by model level (after settling)", "time (h)",
            "corrected time - true scale (ns)", lv, false, false), plots, name + "-levels"), "levels");
        html.append("<table><tr><th>level</th><th>RMS time error after settling (ns)</th><th>max (ns)</th>"
            + "<th>freq. error RMS (100 s)</th></tr>");
        for (RunData d : compared) {
          html.append(String.format(Locale.ROOT, "<tr><td>%s</td><td>%.3f</td><td>%.3f</td><td>%.2e</td></tr>",
              esc(d.result().modelLevel()), d.result().rmsTimeErrorNs(), d.result().maxAbsTimeErrorNs(),
              d.result().fractionalFrequencyErrorRms()));
        }
        html.append("</table>");
      }
      chartNo++;
    }
    html.append("<p>").append(chartNo).append(" scenario groups. Per-run data: <code>runs/&lt;scenario&gt;/seed-&lt;n&gt;/"
        + "summary.json</code> and <code>timeseries.csv</code>; plots as PNG and SVG in <code>plots/</code>.</p>");
    html.append("</body></html>\n");
    final Path file = out.resolve("report.html");
    Files.writeString(file, html.toString(), StandardCharsets.UTF_8);
    return file;
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

  private static String esc(String s) {
    return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
  }
}
