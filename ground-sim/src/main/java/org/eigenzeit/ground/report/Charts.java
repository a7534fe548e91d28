package org.eigenzeit.ground.report;

import java.awt.BasicStroke;
import java.awt.Color;
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
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/** Chart building and export to PNG and SVG (the export is shared with the evidence package). */
public final class Charts {
  static final int WIDTH = 900;
  static final int HEIGHT = 420;

  private Charts() {}

  public static JFreeChart lines(String title, String x, String y, XYSeriesCollection data, boolean logX, boolean logY) {
    System.setProperty("java.awt.headless", "true");
    final JFreeChart chart = ChartFactory.createXYLineChart(title, x, y, data, PlotOrientation.VERTICAL, true, false, false);
    final XYPlot plot = chart.getXYPlot();
    plot.setBackgroundPaint(Color.WHITE);
    plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
    plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
    if (logX) {
      final LogAxis ax = new LogAxis(x);
      ax.setBase(10);
      plot.setDomainAxis(ax);
    }
    if (logY) {
      final LogAxis ay = new LogAxis(y);
      ay.setBase(10);
      plot.setRangeAxis(ay);
    }
    if (!logY && plot.getRangeAxis() instanceof org.jfree.chart.axis.NumberAxis na) {
      na.setAutoRangeIncludesZero(false);
    }
    final XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, logX);
    for (int i = 0; i < data.getSeriesCount(); i++) {
      r.setSeriesStroke(i, new BasicStroke(1.2f));
    }
    plot.setRenderer(r);
    return chart;
  }

  static JFreeChart bars(String title, String cat, String value, DefaultCategoryDataset data) {
    System.setProperty("java.awt.headless", "true");
    final JFreeChart chart = ChartFactory.createBarChart(title, cat, value, data, PlotOrientation.VERTICAL, false, false, false);
    chart.getCategoryPlot().setBackgroundPaint(Color.WHITE);
    chart.getCategoryPlot().setRangeGridlinePaint(Color.LIGHT_GRAY);
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
