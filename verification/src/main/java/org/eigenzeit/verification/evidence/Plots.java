package org.eigenzeit.verification.evidence;

import java.awt.Color;
import java.awt.Paint;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.report.Charts;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.data.category.DefaultCategoryDataset;

/** The package's plots (JFreeChart), each written as PNG and SVG. */
final class Plots {
  private static final Color PASS = new Color(0x2E7D32);
  private static final Color FAIL = new Color(0xC62828);
  private static final Color GREY = new Color(0x9E9E9E);

  private Plots() {}

  /**
   * Margin factor per requirement on a log axis: bars grow right of 1 for a passed requirement
   * (how many times the criterion could tighten), left of 1 for a failed one.
   */
  static byte[] margins(List<Assessment> results, Path dir) throws IOException {
    final DefaultCategoryDataset data = new DefaultCategoryDataset();
    for (Assessment a : results) {
      final double m = Double.isNaN(a.value()) ? 1.0 : a.requirement().criterion().margin(a.value());
      data.addValue(Math.max(m, 1e-3), "margin", a.requirement().id());
    }
    final LogAxis axis = new LogAxis("margin factor (criterion / measured; 1 = at the limit)");
    axis.setBase(10);
    axis.setRange(1e-1, 2e6);
    axis.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(1.0)); // one tick per decade
    final BarRenderer renderer = new BarRenderer() {
      private static final long serialVersionUID = 1L;

      @Override
      public Paint getItemPaint(int row, int column) {
        final String verdict = results.get(column).verdict();
        return Assessment.PASS.equals(verdict) ? PASS : Assessment.FAIL.equals(verdict) ? FAIL : GREY;
      }
    };
    renderer.setBase(1.0);
    renderer.setBarPainter(new StandardBarPainter());
    renderer.setShadowVisible(false);
    final CategoryPlot plot = new CategoryPlot(data, new CategoryAxis("requirement"), axis, renderer);
    plot.setOrientation(PlotOrientation.HORIZONTAL);
    plot.setBackgroundPaint(Color.WHITE);
    plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
    final JFreeChart chart = new JFreeChart("Margin of each requirement (green pass, red fail, grey not measured)",
        JFreeChart.DEFAULT_TITLE_FONT, plot, false);
    chart.setBackgroundPaint(Color.WHITE);
    return Charts.save(chart, dir, "margins", 900, Math.max(420, 60 + 18 * results.size()));
  }

  /** Worst error found per orbit class against its bound (log axis, ps per day). */
  static byte[] envelope(List<String> classes, double[] worstPs, double[] boundPs, Path dir) throws IOException {
    final DefaultCategoryDataset data = new DefaultCategoryDataset();
    for (int i = 0; i < classes.size(); i++) {
      data.addValue(Math.max(worstPs[i], 1e-6), "worst found", classes.get(i));
      data.addValue(boundPs[i], "bound", classes.get(i));
    }
    final LogAxis axis = new LogAxis("core minus reference, ps per day");
    axis.setBase(10);
    axis.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(1.0));
    final BarRenderer renderer = new BarRenderer();
    renderer.setBase(1e-6);
    renderer.setBarPainter(new StandardBarPainter());
    renderer.setShadowVisible(false);
    renderer.setSeriesPaint(0, PASS);
    renderer.setSeriesPaint(1, GREY);
    final CategoryPlot plot = new CategoryPlot(data, new CategoryAxis("orbit class"), axis, renderer);
    plot.setBackgroundPaint(Color.WHITE);
    plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
    final JFreeChart chart = new JFreeChart("Worst orbit found per class against the bound (one day, full model)",
        JFreeChart.DEFAULT_TITLE_FONT, plot, true);
    chart.setBackgroundPaint(Color.WHITE);
    return Charts.save(chart, dir, "envelope", 900, 420);
  }

  /** Branch coverage per package of onboard-core, in percent. */
  static byte[] coverage(java.util.Map<String, int[]> byPackage, Path dir) throws IOException {
    final DefaultCategoryDataset data = new DefaultCategoryDataset();
    byPackage.forEach((pkg, c) -> data.addValue(c[1] == 0 ? 100.0 : 100.0 * c[0] / c[1], "branches", pkg));
    final org.jfree.chart.axis.NumberAxis axis = new org.jfree.chart.axis.NumberAxis("branches covered, %");
    axis.setRange(0, 100);
    final BarRenderer renderer = new BarRenderer();
    renderer.setBarPainter(new StandardBarPainter());
    renderer.setShadowVisible(false);
    renderer.setSeriesPaint(0, PASS);
    final CategoryAxis packages = new CategoryAxis("package of onboard-core");
    packages.setMaximumCategoryLabelLines(2);
    final CategoryPlot plot = new CategoryPlot(data, packages, axis, renderer);
    plot.setBackgroundPaint(Color.WHITE);
    plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
    final JFreeChart chart = new JFreeChart(String.format(Locale.ROOT, "Branch coverage per package (JaCoCo)"),
        JFreeChart.DEFAULT_TITLE_FONT, plot, false);
    chart.setBackgroundPaint(Color.WHITE);
    return Charts.save(chart, dir, "coverage", 900, 380);
  }
}
