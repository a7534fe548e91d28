package org.eigenzeit.ground.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * Chart building and export to PNG and SVG (the export is shared with the evidence package), in
 * the conventions of the field: stability plots on log-log axes with decade labels, the free
 * oscillator in one fixed colour, budget lines, shaded outages, strong colours only.
 */
public final class Charts {
  static final int WIDTH = 900;
  static final int HEIGHT = 420;
  /** Seed colours: strong and distinct on white (no yellow, no pale tints). */
  static final Color[] PALETTE = {new Color(0x1f4e9c), new Color(0xc0392b), new Color(0x1e8449), new Color(0x7d3c98),
    new Color(0xd35400), new Color(0x117a8b), new Color(0x6e2c00), new Color(0x34495e)};
  /** The free-running oscillator, always. */
  static final Color OSCILLATOR = Color.BLACK;
  /** Budget lines, always. */
  static final Color BUDGET = new Color(0xb00000);

  private Charts() {}

  private static void style(JFreeChart chart) {
    System.setProperty("java.awt.headless", "true");
    chart.getTitle().setFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
    final XYPlot plot = chart.getXYPlot();
    plot.setBackgroundPaint(Color.WHITE);
    plot.setDomainGridlinePaint(new Color(0xbbbbbb));
    plot.setRangeGridlinePaint(new Color(0xbbbbbb));
  }

  /**
   * A line chart on linear axes, one colour of the palette per series.
   *
   * @param title chart title
   * @param x domain-axis label
   * @param y range-axis label
   * @param data the series
   * @return the chart
   */
  public static JFreeChart lines(String title, String x, String y, XYSeriesCollection data) {
    System.setProperty("java.awt.headless", "true");
    final JFreeChart chart = ChartFactory.createXYLineChart(title, x, y, data, PlotOrientation.VERTICAL, true, false, false);
    style(chart);
    final XYPlot plot = chart.getXYPlot();
    if (plot.getRangeAxis() instanceof org.jfree.chart.axis.NumberAxis na) {
      na.setAutoRangeIncludesZero(false);
    }
    final XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
    for (int i = 0; i < data.getSeriesCount(); i++) {
      r.setSeriesStroke(i, new BasicStroke(1.4f));
      r.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
    }
    plot.setRenderer(r);
    return chart;
  }

  /** A horizontal budget line at y (and -y when symmetric), with the range axis widened to show it. */
  static void budgetLine(JFreeChart chart, double y, boolean symmetric, String label) {
    final XYPlot plot = chart.getXYPlot();
    final org.jfree.data.Range r = plot.getDataRange(plot.getRangeAxis());
    if (r != null && plot.getRangeAxis() instanceof org.jfree.chart.axis.NumberAxis) {
      final double lo = Math.min(r.getLowerBound(), symmetric ? -1.1 * y : r.getLowerBound());
      final double hi = Math.max(r.getUpperBound(), 1.1 * y);
      plot.getRangeAxis().setRange(lo, hi);
    } else if (r != null && y > 0) {
      plot.getRangeAxis().setRange(Math.min(r.getLowerBound(), y / 2), Math.max(r.getUpperBound(), y * 2));
    }
    for (double v : symmetric ? new double[] {y, -y} : new double[] {y}) {
      final ValueMarker m = new ValueMarker(v, BUDGET, new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER,
          10f, new float[] {8f, 5f}, 0f));
      m.setLabel(label);
      m.setLabelPaint(BUDGET);
      m.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
      m.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_LEFT);
      m.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_LEFT);
      plot.addRangeMarker(m, Layer.FOREGROUND);
    }
  }

  /** A shaded span of the x axis (an outage), drawn behind the data. */
  static void shade(JFreeChart chart, double from, double to, Color colour, String label) {
    final IntervalMarker m = new IntervalMarker(from, to, colour);
    m.setAlpha(0.35f);
    if (label != null) {
      m.setLabel(label);
      m.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
      m.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP);
      m.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.TOP_CENTER);
    }
    chart.getXYPlot().addDomainMarker(m, Layer.BACKGROUND);
  }

  /**
   * A stability plot: log-log axes labelled at decades, points with error bars, joined by lines.
   *
   * @param title title
   * @param y y-axis label
   * @param data series with their intervals; the last series drawn in the oscillator colour when {@code lastIsOscillator}
   * @param lastIsOscillator whether the last series is the free oscillator
   * @return the chart
   */
  static JFreeChart stability(String title, String y, YIntervalSeriesCollection data, boolean lastIsOscillator) {
    System.setProperty("java.awt.headless", "true");
    final JFreeChart chart = ChartFactory.createXYLineChart(title, "averaging time tau (s)", y, data,
        PlotOrientation.VERTICAL, true, false, false);
    style(chart);
    final XYPlot plot = chart.getXYPlot();
    plot.setDomainAxis(decades("averaging time tau (s)"));
    plot.setRangeAxis(decades(y));
    final XYErrorRenderer r = new XYErrorRenderer();
    r.setDrawXError(false);
    r.setDefaultLinesVisible(true);
    r.setDefaultShapesVisible(true);
    r.setErrorStroke(new BasicStroke(1.2f));
    r.setErrorPaint(null);
    for (int i = 0; i < data.getSeriesCount(); i++) {
      final boolean osc = lastIsOscillator && i == data.getSeriesCount() - 1;
      r.setSeriesPaint(i, osc ? OSCILLATOR : PALETTE[i % PALETTE.length]);
      r.setSeriesStroke(i, osc ? new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
          new float[] {6f, 4f}, 0f) : new BasicStroke(1.4f));
      r.setSeriesShapesVisible(i, !osc);
    }
    plot.setRenderer(r);
    return chart;
  }

  /** A base-10 log axis with a tick at every decade, labelled 10 with the exponent raised. */
  static LogAxis decades(String label) {
    final LogAxis a = new LogAxis(label);
    a.setBase(10);
    a.setBaseSymbol("10");
    a.setAutoTickUnitSelection(false);
    a.setTickUnit(new NumberTickUnit(1.0));
    a.setMinorTickCount(9);
    a.setMinorTickMarksVisible(true);
    a.setSmallestValue(1e-30);
    // The default minimum range (1e-8) is larger than a whole ADEV curve and would push the lower bound below 0.
    a.setAutoRangeMinimumSize(1e-300);
    return a;
  }

  static JFreeChart bars(String title, String cat, String value, DefaultCategoryDataset data) {
    System.setProperty("java.awt.headless", "true");
    final JFreeChart chart = ChartFactory.createBarChart(title, cat, value, data, PlotOrientation.VERTICAL, false, false, false);
    chart.getTitle().setFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
    chart.getCategoryPlot().setBackgroundPaint(Color.WHITE);
    chart.getCategoryPlot().setRangeGridlinePaint(new Color(0xbbbbbb));
    chart.getCategoryPlot().getRenderer().setSeriesPaint(0, PALETTE[0]);
    ((org.jfree.chart.renderer.category.BarRenderer) chart.getCategoryPlot().getRenderer())
        .setBarPainter(new org.jfree.chart.renderer.category.StandardBarPainter());
    return chart;
  }

  /** Writes name.png and name.svg at the report size; returns the PNG bytes (for embedding). */
  static byte[] save(JFreeChart chart, Path dir, String name) throws IOException {
    return save(chart, dir, name, WIDTH, HEIGHT);
  }

  /**
   * Writes {@code name.png} and {@code name.svg} into a directory. The output depends only on the
   * chart: the SVG definitions prefix (by default a clock reading) is fixed.
   *
   * @param chart the chart
   * @param dir the directory (created)
   * @param name file name without extension
   * @param width width in pixels
   * @param height height in pixels
   * @return the PNG bytes (for embedding)
   * @throws IOException on a write failure
   */
  public static byte[] save(JFreeChart chart, Path dir, String name, int width, int height) throws IOException {
    System.setProperty("java.awt.headless", "true");
    Files.createDirectories(dir);
    final ByteArrayOutputStream png = new ByteArrayOutputStream();
    ChartUtils.writeChartAsPNG(png, chart, width, height);
    Files.write(dir.resolve(name + ".png"), png.toByteArray());
    final SVGGraphics2D g2 = new SVGGraphics2D(width, height);
    g2.setDefsKeyPrefix("ez-" + name);
    chart.draw(g2, new Rectangle2D.Double(0, 0, width, height));
    Files.writeString(dir.resolve(name + ".svg"), g2.getSVGDocument(), StandardCharsets.UTF_8);
    return png.toByteArray();
  }
}
