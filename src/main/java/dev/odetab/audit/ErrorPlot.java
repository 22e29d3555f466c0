package dev.odetab.audit;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * The error plot: signed error in ulps against x, one circle per entry, and the tolerance
 * drawn as two horizontal lines at ±tolerance. Made with JFreeChart; SVG by JFreeSVG.
 *
 * <p>Trust level: Heuristic (presentation). The circles (filled, no outline) are the only curved
 * shapes drawn, so the SVG holds exactly one {@code <path>} with cubic segments ({@code C}) per
 * entry (no legend); the y axis is linear
 * and always includes ±tolerance. The SVG is deterministic (fixed definition ids, no
 * timestamps); the PNG depends on the platform's font rasterizer.
 */
public final class ErrorPlot {
    static final int WIDTH = 900;
    static final int HEIGHT = 500;

    private ErrorPlot() {
    }

    /**
     * Heuristic (presentation): the chart, its error axis spanning the tolerance and every finite
     * error; infinite errors (an infinite entry, or one beyond the format's range) are drawn on
     * the edge of the axis, on their side.
     */
    private static JFreeChart chart(AuditResult a) {
        double max = a.tolerance();
        for (AuditResult.Row r : a.rows()) {
            if (Double.isFinite(r.ulps())) {
                max = Math.max(max, Math.abs(r.ulps()));
            }
        }
        XYSeries s = new XYSeries("error", false, true);
        for (AuditResult.Row r : a.rows()) {
            double u = r.ulps();
            s.add(r.x().doubleEstimate(), Double.isFinite(u) ? u : Math.copySign(1.05 * max, u));
        }
        String title = String.format(Locale.ROOT, "%s vs %s#%s (%s)", a.entries().name(), a.table().name(), a.column(),
                a.table().format().name());
        JFreeChart chart = ChartFactory.createScatterPlot(title, "x", "error (ulp)", new XYSeriesCollection(s),
                PlotOrientation.VERTICAL, false, false, false);
        chart.setBackgroundPaint(Color.WHITE);
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        renderer.setDrawOutlines(false);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        renderer.setSeriesPaint(0, new Color(0x1f, 0x5f, 0xa8));
        plot.setRenderer(renderer);
        for (double t : new double[] {a.tolerance(), -a.tolerance()}) {
            ValueMarker m = new ValueMarker(t, new Color(0xc0, 0x30, 0x30), new BasicStroke(1.5f));
            plot.addRangeMarker(m);
        }
        plot.getRangeAxis().setRange(-1.1 * max, 1.1 * max);
        return chart;
    }

    /** Heuristic (presentation): the plot as a PNG image. */
    public static byte[] png(AuditResult a) {
        BufferedImage img = chart(a).createBufferedImage(WIDTH, HEIGHT);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** Heuristic (presentation): the plot as an SVG document, deterministic bytes. */
    public static byte[] svg(AuditResult a) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        g.setDefsKeyPrefix("odetab");
        chart(a).draw(g, new Rectangle(0, 0, WIDTH, HEIGHT));
        return (g.getSVGDocument() + "\n").getBytes(StandardCharsets.UTF_8);
    }
}
