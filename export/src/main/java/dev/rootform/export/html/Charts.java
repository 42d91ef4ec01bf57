package dev.rootform.export.html;

import dev.rootform.numeric.plot.FrequencyPlot;
import dev.rootform.numeric.plot.Sample;
import dev.rootform.numeric.plot.TimePlot;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.util.ShapeUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * The report page's plots drawn with JFreeChart into inline SVG (JFreeSVG). Draws only the samples
 * it is given; computes nothing. The SVG scales to the page width (a view box, no fixed size).
 *
 * @since 0.3
 */
final class Charts {
    static final Color SOLUTION = new Color(0x0b, 0x5c, 0xad);
    static final Color TRANSIENT = new Color(0xd1, 0x6b, 0x00);
    static final Color STEADY = new Color(0x1a, 0x7f, 0x37);
    static final Color MARK = new Color(0xb3, 0x1d, 0x28);
    static final Color BOUNDARY = new Color(0x6e, 0x77, 0x81);
    private static final int WIDTH = 720;
    /** The complex plane is drawn square, so the unit circle stays round. */
    private static final int SQUARE = 440;
    private static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);

    private Charts() {
    }

    /** One titled series of points. */
    record Series(String name, List<Sample> samples) {
    }

    /** The legend entry of the points the user asked values at (squares). */
    static final String REQUESTED = "--values-at points";
    /** The legend entry of the points where the answer was compared with an independent computation (rings). */
    static final String CHECKED = "cross-check points";

    /**
     * The solution against t or n, with its parts; every marked point is one the user asked values
     * at. The SVG is {@code time-plot}.
     */
    static String time(TimePlot p, String variable, String function, List<Series> parts) {
        return time(p, variable, function, parts, p.marks(), List.of(), "time");
    }

    /**
     * The same with the marked points given apart: {@code requested} (squares, {@link #REQUESTED}) and
     * {@code checked} (rings, {@link #CHECKED}), each in the legend only when there are some; the SVG
     * element is {@code id-plot}, for a page with several such plots.
     */
    static String time(TimePlot p, String variable, String function, List<Series> parts, List<Sample> requested,
            List<Sample> checked, String id) {
        XYPlot plot = new XYPlot();
        NumberAxis x = new NumberAxis(variable);
        x.setAutoRangeIncludesZero(false);
        ValueAxis y = p.logScale() ? new LogAxis("|" + function + "| (log scale)") : new NumberAxis(function);
        if (y instanceof NumberAxis linear) {
            linear.setAutoRangeIncludesZero(true);
        }
        plot.setDomainAxis(x);
        plot.setRangeAxis(y);
        int index = 0;
        if (!requested.isEmpty()) {
            plot.setDataset(index, collection(List.of(new Series(REQUESTED, requested))));
            plot.setRenderer(index++, points(MARK, new Rectangle2D.Double(-4.5, -4.5, 9, 9)));
        }
        if (!checked.isEmpty()) {
            plot.setDataset(index, collection(List.of(new Series(CHECKED, checked))));
            XYLineAndShapeRenderer rings = points(BOUNDARY, new Ellipse2D.Double(-5, -5, 10, 10));
            rings.setSeriesShapesFilled(0, false);
            rings.setSeriesOutlineStroke(0, new BasicStroke(1.4f));
            rings.setUseOutlinePaint(false);
            plot.setRenderer(index++, rings);
        }
        for (Series s : parts) {
            Color color = s.name().startsWith("transient") ? TRANSIENT : s.name().startsWith("steady") ? STEADY : SOLUTION;
            XYSeriesCollection data = collection(List.of(s));
            plot.setDataset(index, data);
            if (p.stems() && !p.logScale()) {
                data.setIntervalWidth(0.08);
                XYBarRenderer bars = new XYBarRenderer();
                bars.setShadowVisible(false);
                bars.setBarPainter(new org.jfree.chart.renderer.xy.StandardXYBarPainter());
                bars.setSeriesPaint(0, color);
                bars.setUseYInterval(false);
                plot.setRenderer(index++, bars);
                XYSeriesCollection heads = collection(List.of(new Series(s.name() + " ", s.samples())));
                plot.setDataset(index, heads);
                XYLineAndShapeRenderer dots = points(color, new Ellipse2D.Double(-3, -3, 6, 6));
                dots.setSeriesVisibleInLegend(0, false);
                plot.setRenderer(index++, dots);
            } else {
                XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, p.stems());
                line.setDrawSeriesLineAsPath(true);
                line.setSeriesPaint(0, color);
                line.setSeriesStroke(0, new BasicStroke(s.name().startsWith("solution") ? 2.2f : 1.5f));
                line.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
                plot.setRenderer(index++, line);
            }
        }
        if (!p.logScale()) {
            plot.addRangeMarker(new ValueMarker(0, BOUNDARY, new BasicStroke(0.8f)));
        }
        return svg(chart(plot, true), WIDTH, 330, id);
    }

    /** How one kind of point in the complex plane is drawn. */
    record Look(Color color, Shape shape, boolean filled) {
    }

    /** A root of a characteristic polynomial. */
    static final Look ROOT = new Look(SOLUTION, new Ellipse2D.Double(-5, -5, 10, 10), true);
    /** The dominant root. */
    static final Look DOMINANT = new Look(MARK, new Rectangle2D.Double(-6, -6, 12, 12), true);
    /** A pole of a transfer function: a cross. */
    static final Look POLE = new Look(MARK, ShapeUtils.createDiagonalCross(6, 1.2f), true);
    /** A zero of a transfer function: a ring. */
    static final Look ZERO = new Look(SOLUTION, new Ellipse2D.Double(-5.5, -5.5, 11, 11), false);

    /** Points of one kind, each {re, im} with a label (e.g. its multiplicity), named in the legend. */
    record Marks(String name, Look look, List<double[]> points, List<String> labels) {
        Marks {
            points = List.copyOf(points);
            labels = List.copyOf(labels);
        }
    }

    /**
     * The roots in the complex plane against the stability boundary: the imaginary axis
     * (continuous) or the unit circle (discrete); labels give multiplicities above 1.
     */
    static String roots(List<double[]> roots, List<String> labels, int dominant, boolean discrete) {
        List<double[]> top = new ArrayList<>();
        List<String> topLabels = new ArrayList<>();
        List<double[]> rest = new ArrayList<>();
        List<String> restLabels = new ArrayList<>();
        for (int i = 0; i < roots.size(); i++) {
            (i == dominant ? top : rest).add(roots.get(i));
            (i == dominant ? topLabels : restLabels).add(labels.get(i));
        }
        return plane(List.of(new Marks("dominant root", DOMINANT, top, topLabels), new Marks("roots", ROOT, rest, restLabels)),
                discrete, "λ", "roots");
    }

    /**
     * Points in the complex plane of {@code variable} against the stability boundary: the imaginary
     * axis (continuous) or the unit circle (discrete); drawn square, so the circle stays round.
     *
     * @param id the SVG element is {@code id-plot}
     */
    static String plane(List<Marks> marks, boolean discrete, String variable, String id) {
        List<Marks> drawn = marks.stream().filter(m -> !m.points().isEmpty()).toList();
        XYPlot plot = new XYPlot();
        NumberAxis re = new NumberAxis("Re " + variable);
        NumberAxis im = new NumberAxis("Im " + variable);
        double extent = 0;
        for (Marks m : drawn) {
            for (double[] r : m.points()) {
                extent = Math.max(extent, Math.max(Math.abs(r[0]), Math.abs(r[1])));
            }
        }
        extent = Math.max(extent, discrete ? 1 : 0.5) * 1.2;
        re.setRange(-extent, extent);
        im.setRange(-extent, extent);
        plot.setDomainAxis(re);
        plot.setRangeAxis(im);
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer shapes = new XYLineAndShapeRenderer(false, true);
        for (int i = 0; i < drawn.size(); i++) {
            Marks m = drawn.get(i);
            XYSeries series = new XYSeries(m.name(), false, true);
            m.points().forEach(p -> series.add(p[0], p[1]));
            data.addSeries(series);
            shapes.setSeriesPaint(i, m.look().color());
            shapes.setSeriesShape(i, m.look().shape());
            shapes.setSeriesShapesFilled(i, m.look().filled());
        }
        shapes.setDefaultItemLabelGenerator((dataset, series, item) -> drawn.get(series).labels().get(item));
        shapes.setDefaultItemLabelsVisible(true);
        shapes.setDefaultItemLabelFont(FONT);
        plot.setDataset(0, data);
        plot.setRenderer(0, shapes);
        if (discrete) {
            XYSeries circle = new XYSeries("unit circle |" + variable + "| = 1", false, true);
            for (int k = 0; k <= 180; k++) {
                double a = 2 * Math.PI * k / 180;
                circle.add(Math.cos(a), Math.sin(a));
            }
            XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
            line.setSeriesPaint(0, BOUNDARY);
            line.setSeriesStroke(0, dashed());
            plot.setDataset(1, new XYSeriesCollection(circle));
            plot.setRenderer(1, line);
        } else {
            ValueMarker axis = new ValueMarker(0, BOUNDARY, dashed());
            axis.setLabel("Re " + variable + " = 0");
            axis.setLabelFont(FONT);
            axis.setLabelOffset(new RectangleInsets(4, 4, 4, 4));
            plot.addDomainMarker(axis);
        }
        plot.addRangeMarker(new ValueMarker(0, BOUNDARY, new BasicStroke(0.6f)));
        return svg(chart(plot, true), SQUARE, SQUARE + 40, id);
    }

    /** Magnitude (dB) above phase (degrees) against frequency, the input frequencies marked. */
    static String frequency(FrequencyPlot p) {
        ValueAxis w = p.discrete() ? new NumberAxis("θ (rad per sample)") : decades("ω (rad per unit of t, log scale)");
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(w);
        plot.setGap(12);
        plot.add(panel(p.magnitudeDb(), "|H| (dB)", p.inputs()), 1);
        plot.add(panel(p.phaseDegrees(), "arg H (°)", p.inputs()), 1);
        return svg(chart(plot, false), WIDTH, 420, "frequency");
    }

    /** A log axis ticked once per decade, labelled as plain numbers. */
    private static LogAxis decades(String label) {
        LogAxis axis = new LogAxis(label);
        axis.setTickUnit(new NumberTickUnit(1));
        axis.setNumberFormatOverride(new DecimalFormat("0.####"));
        return axis;
    }

    private static XYPlot panel(List<Sample> samples, String label, List<Double> inputs) {
        NumberAxis axis = new NumberAxis(label);
        axis.setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
        line.setDrawSeriesLineAsPath(true);
        line.setSeriesPaint(0, SOLUTION);
        line.setSeriesStroke(0, new BasicStroke(2f));
        XYPlot plot = new XYPlot(collection(List.of(new Series(label, samples))), null, axis, line);
        for (double input : inputs) {
            ValueMarker m = new ValueMarker(input, MARK, dashed());
            m.setLabel(label.startsWith("|") ? "input" : "");
            m.setLabelFont(FONT);
            m.setLabelOffset(new RectangleInsets(4, 4, 4, 4));
            plot.addDomainMarker(m);
        }
        return plot;
    }

    private static XYLineAndShapeRenderer points(Color color, Shape shape) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        r.setSeriesPaint(0, color);
        r.setSeriesShape(0, shape);
        return r;
    }

    private static BasicStroke dashed() {
        return new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f);
    }

    private static XYSeriesCollection collection(List<Series> series) {
        XYSeriesCollection c = new XYSeriesCollection();
        for (Series s : series) {
            XYSeries xy = new XYSeries(s.name(), false, true);
            s.samples().forEach(p -> xy.add(p.x(), p.y()));
            c.addSeries(xy);
        }
        return c;
    }

    private static JFreeChart chart(org.jfree.chart.plot.Plot plot, boolean legend) {
        JFreeChart chart = new JFreeChart(null, FONT, plot, legend);
        chart.setBackgroundPaint(Color.WHITE);
        if (legend) {
            chart.getLegend().setItemFont(FONT);
            chart.getLegend().setFrame(org.jfree.chart.block.BlockBorder.NONE);
        }
        if (plot instanceof XYPlot xy) {
            style(xy);
        } else if (plot instanceof CombinedDomainXYPlot combined) {
            combined.getSubplots().forEach(s -> style((XYPlot) s));
        }
        return chart;
    }

    private static void style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        for (ValueAxis axis : new ValueAxis[] {plot.getDomainAxis(), plot.getRangeAxis()}) {
            if (axis != null) {
                axis.setLabelFont(FONT);
                axis.setTickLabelFont(FONT.deriveFont(12f));
            }
        }
        plot.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setOutlinePaint(BOUNDARY);
    }

    /** The chart as an SVG element that scales down to the page width, at most its own width. */
    private static String svg(JFreeChart chart, int width, int height, String prefix) {
        SVGGraphics2D g2 = new SVGGraphics2D(width, height);
        g2.setDefsKeyPrefix(prefix);
        chart.draw(g2, new Rectangle(0, 0, width, height));
        String svg = g2.getSVGElement(prefix + "-plot", false, new ViewBox(0, 0, width, height), null, null);
        return svg.replaceFirst("<svg ", "<svg style=\"max-width: " + width + "px\" ");
    }
}
