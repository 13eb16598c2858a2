package eluvia.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.GradientPaint;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;

import javax.imageio.ImageIO;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.annotations.XYPolygonAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.IntervalBarRenderer;
import org.jfree.chart.renderer.category.StackedBarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.chart.renderer.xy.XYShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.GradientPaintTransformType;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.StandardGradientPaintTransformer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.category.DefaultIntervalCategoryDataset;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYDataset;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Draws {@link ChartSpec}s with JFreeChart in Eluvia's own look ({@link Palette}; a sans-serif face
 * that PDF output maps to Helvetica). Everything is drawn off screen: no window or display is needed
 * (run with {@code java.awt.headless=true} on a server).
 *
 * <p>Plan and section views are drawn to scale: {@link #draw} measures the plot area it will get
 * and widens one axis range so that a unit of easting and of northing (or of distance and depth
 * divided by the vertical exaggeration) take the same length on the page.
 *
 * <p>Every text drawn (titles, axis labels, legend entries, marker and zone labels) goes through a
 * text mapping, so a PDF writer can map characters its fonts lack.
 */
public final class Charts {

    private static final String FACE = "SansSerif";
    private static final Font TITLE_FONT = new Font(FACE, Font.BOLD, 13);
    private static final Font LABEL_FONT = new Font(FACE, Font.PLAIN, 11);
    private static final Font TICK_FONT = new Font(FACE, Font.PLAIN, 10);
    private static final Font NOTE_FONT = new Font(FACE, Font.PLAIN, 9);
    private static final Font ZONE_FONT = new Font(FACE, Font.BOLD, 10);
    private static final Stroke GRID_STROKE = new BasicStroke(0.5f);
    private static final Stroke MARKER_STROKE = new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] { 5f, 3f }, 0f);
    private static final Stroke OUTLINE_STROKE = new BasicStroke(1.6f);
    private static final float[][] DASHES = { null, { 7f, 4f }, { 2f, 3f }, { 9f, 3f, 2f, 3f } };
    private static final Shape POINT_SHAPE = new Ellipse2D.Double(-4, -4, 8, 8);
    /** A white band under outlines drawn over coloured cells, so that the line reads on any cell colour. */
    private static final Stroke HALO_STROKE = new BasicStroke(3.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    private static final Color HALO = new Color(255, 255, 255, 170);
    /** Cells are drawn at least this many image pixels wide on the longer side, so viewers that smooth images keep edges. */
    private static final int CELL_IMAGE_PIXELS = 600;
    /** Margin added around the data of plan and section views, as a fraction of their extent. */
    private static final double MAP_MARGIN = 0.06;

    private Charts() {
    }

    /** The chart for a spec, texts as given. Plan and section views are scaled only by {@link #draw}. */
    public static JFreeChart build(ChartSpec spec) {
        return build(spec, UnaryOperator.identity());
    }

    /**
     * The chart for a spec, every text passed through {@code text}.
     *
     * @param text maps each text before it is drawn (identity for none)
     */
    public static JFreeChart build(ChartSpec spec, UnaryOperator<String> text) {
        ChartDataException.requireNonNull("chart", spec);
        ChartDataException.requireNonNull("text mapping", text);
        JFreeChart chart;
        if (spec instanceof LineChart c) {
            chart = line(c, text);
        } else if (spec instanceof DepthProfile c) {
            chart = depthProfile(c, text);
        } else if (spec instanceof Histogram c) {
            chart = histogram(c, text);
        } else if (spec instanceof Tornado c) {
            chart = tornado(c, text);
        } else if (spec instanceof BarChart c) {
            chart = bars(c, text);
        } else if (spec instanceof PlanView c) {
            chart = plan(c, text);
        } else if (spec instanceof SectionView c) {
            chart = section(c.points(), c.outlines(), c.distanceAxis(), c.depthAxis(), c.valueAxis(), c.logValue(),
                    c.depthMarkers(), text);
        } else {
            throw new IllegalStateException("chart kind without a drawing: " + spec.getClass().getName());
        }
        if (!spec.title().isEmpty()) {
            TextTitle t = new TextTitle(text.apply(spec.title()), TITLE_FONT);
            t.setPaint(Palette.INK);
            t.setPosition(RectangleEdge.TOP);
            t.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
            t.setMargin(new RectangleInsets(0, 4, 6, 0));
            chart.setTitle(t);
        }
        return chart;
    }

    /** Draws the spec into {@code area} of {@code g2} (in the units of g2, e.g. PDF points), texts as given. */
    public static void draw(ChartSpec spec, Graphics2D g2, Rectangle2D area) {
        draw(spec, g2, area, UnaryOperator.identity());
    }

    /**
     * Draws the spec into {@code area} of {@code g2}; plan and section views to scale (see the class
     * comment). Every text goes through {@code text}.
     */
    public static void draw(ChartSpec spec, Graphics2D g2, Rectangle2D area, UnaryOperator<String> text) {
        JFreeChart chart = build(spec, text);
        if (spec instanceof PlanView p) {
            fitToScale(chart, area, 1.0, extent(p), false);
        } else if (spec instanceof SectionView s) {
            fitToScale(chart, area, s.verticalExaggeration(), extent(s.points(), s.outlines()), true);
        }
        chart.draw(g2, area);
    }

    /**
     * The chart as an image of exactly {@code widthPx} x {@code heightPx} pixels, laid out as if it
     * were {@code widthPx / pixelScale} wide (so {@code pixelScale} 2 gives sharp text for a
     * high-density screen or print at the same layout).
     *
     * @param pixelScale pixels per layout unit, dimensionless, 0.5 to 8
     */
    public static BufferedImage image(ChartSpec spec, int widthPx, int heightPx, double pixelScale) {
        if (widthPx < 50 || widthPx > 8000 || heightPx < 50 || heightPx > 8000) {
            throw new ChartDataException("image size", widthPx + " x " + heightPx + " px", "50 to 8000 px each way", null);
        }
        if (!(pixelScale >= 0.5 && pixelScale <= 8)) {
            throw new ChartDataException("pixel scale (dimensionless)", Double.toString(pixelScale), "0.5 to 8",
                    "1 for screen pixels, 2 for sharp print");
        }
        BufferedImage image = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = image.createGraphics();
        try {
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g2.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g2.setPaint(Color.WHITE);
            g2.fillRect(0, 0, widthPx, heightPx);
            g2.scale(pixelScale, pixelScale);
            draw(spec, g2, new Rectangle2D.Double(0, 0, widthPx / pixelScale, heightPx / pixelScale));
        } finally {
            g2.dispose();
        }
        return image;
    }

    /** {@link #image} encoded as PNG. */
    public static byte[] png(ChartSpec spec, int widthPx, int heightPx, double pixelScale) {
        BufferedImage image = image(spec, widthPx, heightPx, pixelScale);
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        try {
            if (!ImageIO.write(image, "png", out)) {
                throw new IllegalStateException("this Java runtime has no PNG writer");
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    // ---------------------------------------------------------------------------------------- kinds

    private static JFreeChart line(LineChart c, UnaryOperator<String> text) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (XySeries s : c.series()) {
            data.addSeries(jfree(s, text));
        }
        ValueAxis x = numberAxis(c.xAxis(), text, false);
        ValueAxis y = c.logY() ? logAxis(c.yAxis(), text) : numberAxis(c.yAxis(), text, false);
        XYPlot plot = new XYPlot(data, x, y, seriesRenderer(c.series(), false));
        for (Marker m : c.xMarkers()) {
            plot.addDomainMarker(marker(m, text, true));
        }
        for (Marker m : c.yMarkers()) {
            plot.addRangeMarker(marker(m, text, false));
        }
        return finish(plot, c.series().size() > 1);
    }

    private static JFreeChart depthProfile(DepthProfile c, UnaryOperator<String> text) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (XySeries s : c.profiles()) {
            data.addSeries(jfree(s, text));
        }
        ValueAxis x = c.logConcentration() ? logAxis(c.concentrationAxis(), text)
                : numberAxis(c.concentrationAxis(), text, false);
        NumberAxis depth = numberAxis(c.depthAxis(), text, false);
        depth.setInverted(true);
        XYPlot plot = new XYPlot(data, x, depth, seriesRenderer(c.profiles(), true));
        plot.setDomainAxisLocation(AxisLocation.TOP_OR_LEFT);
        for (Marker m : c.concentrationMarkers()) {
            plot.addDomainMarker(marker(m, text, true));
        }
        for (Marker m : c.depthMarkers()) {
            plot.addRangeMarker(marker(m, text, false));
        }
        return finish(plot, c.profiles().size() > 1);
    }

    private static JFreeChart histogram(Histogram c, UnaryOperator<String> text) {
        XYIntervalSeries bars = new XYIntervalSeries(text.apply(Histogram.COUNT_LABEL));
        for (Bin b : c.bins()) {
            bars.add(0.5 * (b.lower() + b.upper()), b.lower(), b.upper(), b.count(), 0, b.count());
        }
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(bars);
        NumberAxis value = numberAxis(c.valueAxis(), text, false);
        NumberAxis count = numberAxis(Axis.dimensionless(Histogram.COUNT_LABEL), text, true);
        count.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYBarRenderer r = new XYBarRenderer();
        r.setBarPainter(new StandardXYBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(true);
        r.setSeriesPaint(0, withAlpha(Palette.ACCENT, 0.78));
        r.setSeriesOutlinePaint(0, Color.WHITE);
        r.setSeriesOutlineStroke(0, new BasicStroke(0.6f));
        XYPlot plot = new XYPlot(data, value, count, r);
        for (Marker m : c.markers()) {
            plot.addDomainMarker(marker(m, text, true));
        }
        return finish(plot, false);
    }

    private static JFreeChart tornado(Tornado c, UnaryOperator<String> text) {
        List<TornadoBar> sorted = c.sortedBars();
        int n = sorted.size();
        String[] categories = new String[n];
        Number[][] lowStart = new Number[1][n];
        Number[][] lowEnd = new Number[1][n];
        Number[][] highStart = new Number[1][n];
        Number[][] highEnd = new Number[1][n];
        double base = c.baseResult();
        for (int i = 0; i < n; i++) {
            TornadoBar b = sorted.get(i);
            categories[i] = text.apply(b.input() + "  (" + b.lowInputLabel() + " to " + b.highInputLabel() + ")");
            lowStart[0][i] = Math.min(base, b.resultAtLow());
            lowEnd[0][i] = Math.max(base, b.resultAtLow());
            highStart[0][i] = Math.min(base, b.resultAtHigh());
            highEnd[0][i] = Math.max(base, b.resultAtHigh());
        }
        String lowKey = text.apply("Input at its low value");
        String highKey = text.apply("Input at its high value");
        DefaultIntervalCategoryDataset low = new DefaultIntervalCategoryDataset(new String[] { lowKey }, categories,
                lowStart, lowEnd);
        DefaultIntervalCategoryDataset high = new DefaultIntervalCategoryDataset(new String[] { highKey }, categories,
                highStart, highEnd);
        CategoryAxis inputs = new CategoryAxis(null);
        inputs.setTickLabelFont(TICK_FONT);
        inputs.setTickLabelPaint(Palette.INK);
        inputs.setMaximumCategoryLabelWidthRatio(0.45f);
        inputs.setMaximumCategoryLabelLines(2);
        inputs.setCategoryMargin(0.35);
        NumberAxis result = numberAxis(c.resultAxis(), text, false);
        result.setAutoRangeIncludesZero(false);
        CategoryPlot plot = new CategoryPlot(low, inputs, result, intervalRenderer(Palette.series(2)));
        plot.setDataset(1, high);
        plot.setRenderer(1, intervalRenderer(Palette.series(1)));
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_LEFT);
        ValueMarker baseLine = new ValueMarker(base, Palette.INK, new BasicStroke(1.2f));
        baseLine.setLabel(text.apply("base " + grouped().format(round(base))));
        styleMarkerLabel(baseLine, true);
        plot.addRangeMarker(baseLine, Layer.FOREGROUND);
        styleCategoryPlot(plot);
        plot.setDomainGridlinesVisible(false);
        return chartOf(plot, true);
    }

    private static JFreeChart bars(BarChart c, UnaryOperator<String> text) {
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        for (int i = 0; i < c.categories().size(); i++) {
            for (BarSeries s : c.series()) {
                data.addValue(s.valueAt(i), text.apply(s.name()), text.apply(c.categories().get(i)));
            }
        }
        CategoryAxis categories = new CategoryAxis(text.apply(c.categoryLabel()));
        categories.setLabelFont(LABEL_FONT);
        categories.setLabelPaint(Palette.INK);
        categories.setTickLabelFont(TICK_FONT);
        categories.setTickLabelPaint(Palette.INK);
        categories.setCategoryMargin(0.3);
        categories.setMaximumCategoryLabelLines(2);
        NumberAxis value = numberAxis(c.valueAxis(), text, true);
        value.setNumberFormatOverride(grouped());
        BarRenderer r = c.stacked() ? new StackedBarRenderer() : new BarRenderer();
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(true);
        r.setItemMargin(0.04);
        r.setMaximumBarWidth(0.18);
        for (int i = 0; i < c.series().size(); i++) {
            r.setSeriesPaint(i, Palette.series(i));
            r.setSeriesOutlinePaint(i, Color.WHITE);
            r.setSeriesOutlineStroke(i, new BasicStroke(0.6f));
        }
        CategoryPlot plot = new CategoryPlot(data, categories, value, r);
        styleCategoryPlot(plot);
        plot.setDomainGridlinesVisible(false);
        return chartOf(plot, c.series().size() > 1);
    }

    /**
     * A plan: the grid's cells as one image under everything (nearest-neighbour, so cells keep sharp
     * edges), the outlines by kind over a white halo when there are cells, the points on top; the
     * points, cells and outlines named in a legend under the plot, the colour scale beside it.
     */
    private static JFreeChart plan(PlanView c, UnaryOperator<String> text) {
        DefaultXYZDataset data = new DefaultXYZDataset();
        XYShapeRenderer r = new RingedPoints();
        ValueScale scale = ValueScale.of(c.points(), c.grid(), c.valueMarker(), c.logValue());
        LegendItemCollection legend = new LegendItemCollection();
        if (!c.points().isEmpty()) {
            double[][] xyz = new double[3][c.points().size()];
            for (int i = 0; i < c.points().size(); i++) {
                xyz[0][i] = c.points().get(i).x();
                xyz[1][i] = c.points().get(i).y();
                xyz[2][i] = c.points().get(i).value();
            }
            data.addSeries(text.apply(c.pointsLabel()), xyz);
            r.setPaintScale(scale);
            r.setDrawOutlines(false);
            r.setSeriesShape(0, POINT_SHAPE);
            legend.add(legendShape(text.apply(c.pointsLabel()), RingedPoints.RING, Color.WHITE));
        }
        boolean cells = c.grid() != null;
        if (cells) {
            r.addAnnotation(new CellImage(c.grid(), scale), Layer.BACKGROUND);
            legend.add(legendShape(text.apply(c.grid().name()), new Rectangle2D.Double(-5, -5, 10, 10),
                    scale == null ? Palette.RULE : scale.getPaint(scale.getUpperBound())));
        }
        if (scale != null && c.valueMarker() != null) {
            // a swatch from the colour just below the level to the one just above it
            LegendItem step = legendShape(text.apply("Colour step: " + c.valueMarker().label()),
                    new Rectangle2D.Double(-8, -5, 16, 10), new GradientPaint(0, 0, Palette.belowLevel(1), 16, 0,
                            Palette.aboveLevel(0)));
            step.setFillPaintTransformer(new StandardGradientPaintTransformer(GradientPaintTransformType.HORIZONTAL));
            legend.add(step);
        }
        for (Outline o : c.outlines()) {
            Stroke stroke = outlineStroke(o.kind());
            Color colour = outlineColour(o.kind());
            if (cells) {
                r.addAnnotation(new XYPolygonAnnotation(o.interleaved(), HALO_STROKE, HALO, null), Layer.BACKGROUND);
            }
            Paint fill = o.kind() == Outline.Kind.ZONE && !cells ? withAlpha(Palette.ACCENT, 0.10) : null;
            r.addAnnotation(new XYPolygonAnnotation(o.interleaved(), stroke, colour, fill), Layer.BACKGROUND);
            legend.add(legendLine(text.apply(o.name()), stroke, colour));
        }
        NumberAxis x = numberAxis(c.eastingAxis(), text, false);
        NumberAxis y = numberAxis(c.northingAxis(), text, false);
        double[] e = extent(c);
        x.setRange(padded(e[0], e[1]));
        y.setRange(padded(e[2], e[3]));
        XYPlot plot = new XYPlot(data, x, y, r);
        plot.setFixedLegendItems(legend);
        JFreeChart chart = finish(plot, true);
        chart.getLegend().setItemLabelPadding(new RectangleInsets(2, 3, 2, 10));
        if (scale != null) {
            chart.addSubtitle(colourLegend(scale, c.logValue(), c.valueAxis().title(), text));
        }
        return chart;
    }

    private static Stroke outlineStroke(Outline.Kind kind) {
        return switch (kind) {
        case ZONE -> OUTLINE_STROKE;
        case BOUNDARY -> new BasicStroke(1.0f);
        case PROPOSED -> new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] { 8f, 3f, 2f, 3f }, 0f);
        case ENLARGED -> new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] { 4f, 3f }, 0f);
        };
    }

    private static Color outlineColour(Outline.Kind kind) {
        return switch (kind) {
        case ZONE -> Palette.ACCENT;
        case BOUNDARY -> Palette.MUTED;
        case PROPOSED -> Palette.INK;
        case ENLARGED -> Palette.GROWN;
        };
    }

    private static LegendItem legendShape(String label, Shape shape, Paint fill) {
        return new LegendItem(label, null, null, null, true, shape, true, fill, true, Palette.INK, new BasicStroke(0.8f),
                false, new Line2D.Double(-8, 0, 8, 0), new BasicStroke(1f), Palette.INK);
    }

    private static LegendItem legendLine(String label, Stroke stroke, Paint colour) {
        return new LegendItem(label, null, null, null, false, new Rectangle2D.Double(-1, -1, 2, 2), false, colour, false,
                colour, stroke, true, new Line2D.Double(-11, 0, 11, 0), stroke, colour);
    }

    /** The colour strip beside a map; a logarithmic scale is drawn in log10 space (the strip is subdivided evenly). */
    private static PaintScaleLegend colourLegend(ValueScale scale, boolean logValue, String title,
            UnaryOperator<String> text) {
        NumberAxis legendAxis = new NumberAxis(text.apply(title));
        legendAxis.setAutoRangeIncludesZero(false);
        styleAxis(legendAxis);
        ValueScale strip = scale.inLog10Space();
        legendAxis.setRange(strip.getLowerBound(), strip.getUpperBound());
        if (logValue) {
            legendAxis.setNumberFormatOverride(new PowerOfTenFormat());
            legendAxis.setTickUnit(new NumberTickUnit(1.0));
        }
        PaintScaleLegend legend = new PaintScaleLegend(strip, legendAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        legend.setStripWidth(10);
        legend.setStripOutlineVisible(true);
        legend.setStripOutlinePaint(Palette.RULE);
        legend.setSubdivisionCount(256);
        legend.setAxisOffset(4);
        legend.setMargin(new RectangleInsets(8, 10, 8, 2));
        legend.setBackgroundPaint(Color.WHITE);
        return legend;
    }

    /** A section: depth down, points coloured by value, outlines with their names inside, depth markers. */
    private static JFreeChart section(List<ValuePoint> points, List<Outline> outlines, Axis xAxis, Axis yAxis,
            Axis valueAxis, boolean logValue, List<Marker> yMarkers, UnaryOperator<String> text) {
        DefaultXYZDataset data = new DefaultXYZDataset();
        XYShapeRenderer r = new XYShapeRenderer();
        ValueScale scale = null;
        if (!points.isEmpty()) {
            double[][] xyz = new double[3][points.size()];
            for (int i = 0; i < points.size(); i++) {
                xyz[0][i] = points.get(i).x();
                xyz[1][i] = points.get(i).y();
                xyz[2][i] = points.get(i).value();
            }
            data.addSeries(text.apply(valueAxis.label()), xyz);
            scale = ValueScale.of(xyz[2], logValue);
            r.setPaintScale(scale);
            r.setDrawOutlines(true);
            r.setUseOutlinePaint(true);
            r.setSeriesOutlinePaint(0, Palette.INK);
            r.setSeriesOutlineStroke(0, new BasicStroke(0.6f));
            r.setSeriesShape(0, new Ellipse2D.Double(-4.5, -4.5, 9, 9));
        }
        for (Outline o : outlines) {
            Color colour = outlineColour(o.kind());
            r.addAnnotation(new XYPolygonAnnotation(o.interleaved(), outlineStroke(o.kind()), colour,
                    o.kind() == Outline.Kind.ZONE ? withAlpha(Palette.ACCENT, 0.10) : null), Layer.BACKGROUND);
            // the grown outlines nest about one centre: each label sits inside its outline's lower
            // edge (the edges differ) instead of at the shared centre
            boolean atLowerEdge = o.kind() == Outline.Kind.ENLARGED;
            XYTextAnnotation label = new XYTextAnnotation(text.apply(o.name()), o.labelX(),
                    atLowerEdge ? Arrays.stream(o.y()).max().orElseThrow() : o.labelY());
            if (atLowerEdge) {
                label.setTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_CENTER);
            }
            label.setFont(ZONE_FONT);
            label.setPaint(colour);
            r.addAnnotation(label, Layer.BACKGROUND);
        }
        NumberAxis x = numberAxis(xAxis, text, false);
        NumberAxis y = numberAxis(yAxis, text, false);
        x.setAutoRangeIncludesZero(false);
        y.setAutoRangeIncludesZero(false);
        double[] e = extent(points, outlines);
        x.setRange(padded(e[0], e[1]));
        y.setRange(depthTop(padded(e[2], e[3]), e[2], true));
        y.setInverted(true);
        XYPlot plot = new XYPlot(data, x, y, r);
        for (Marker m : yMarkers) {
            plot.addRangeMarker(marker(m, text, false));
        }
        JFreeChart chart = finish(plot, false);
        if (scale != null) {
            chart.addSubtitle(colourLegend(scale, logValue, valueAxis.title(), text));
        }
        return chart;
    }

    // ------------------------------------------------------------------------------------- scaling

    /** xmin, xmax, ymin, ymax of a plan's points, outline vertices and cells. */
    static double[] extent(PlanView p) {
        double[] e = extent(p.points(), p.outlines());
        ValueGrid g = p.grid();
        if (g != null) {
            grow(e, g.originX(), g.originY());
            grow(e, g.endX(), g.endY());
        }
        return e;
    }

    /** xmin, xmax, ymin, ymax of points and outline vertices. */
    static double[] extent(List<ValuePoint> points, List<Outline> outlines) {
        double[] e = { Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY };
        for (ValuePoint p : points) {
            grow(e, p.x(), p.y());
        }
        for (Outline o : outlines) {
            double[] ox = o.x();
            double[] oy = o.y();
            for (int i = 0; i < ox.length; i++) {
                grow(e, ox[i], oy[i]);
            }
        }
        return e;
    }

    /** A depth range starts at the ground surface (depth 0) when no data lie above it. */
    private static Range depthTop(Range r, double dataTop, boolean depthDown) {
        if (depthDown && dataTop >= 0) {
            return new Range(0, r.getUpperBound());
        }
        return r;
    }

    private static void grow(double[] e, double x, double y) {
        e[0] = Math.min(e[0], x);
        e[1] = Math.max(e[1], x);
        e[2] = Math.min(e[2], y);
        e[3] = Math.max(e[3], y);
    }

    private static Range padded(double lo, double hi) {
        double span = hi - lo;
        double pad = span > 0 ? span * MAP_MARGIN : Math.max(Math.abs(lo) * 0.05, 1.0);
        return new Range(lo - pad, hi + pad);
    }

    /**
     * Sets the axis ranges so that one data unit vertically is {@code exaggeration} times as long as
     * one unit horizontally on the page, with the data in view: lays the chart out (on a scratch
     * image), reads the plot area it gets and widens the tighter range about its centre. Tick labels
     * may change width with the range, so it repeats until the area no longer moves (at most 4 times).
     */
    static void fitToScale(JFreeChart chart, Rectangle2D area, double exaggeration, double[] extent, boolean depthDown) {
        XYPlot plot = chart.getXYPlot();
        Range xData = padded(extent[0], extent[1]);
        Range yData = depthTop(padded(extent[2], extent[3]), extent[2], depthDown);
        BufferedImage scratch = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = scratch.createGraphics();
        try {
            double lastW = -1;
            double lastH = -1;
            for (int pass = 0; pass < 4; pass++) {
                ChartRenderingInfo info = new ChartRenderingInfo();
                chart.draw(g2, area, info);
                Rectangle2D d = info.getPlotInfo().getDataArea();
                double w = d.getWidth();
                double h = d.getHeight();
                if (w <= 0 || h <= 0) {
                    return;
                }
                if (Math.abs(w - lastW) < 0.01 && Math.abs(h - lastH) < 0.01) {
                    return;
                }
                lastW = w;
                lastH = h;
                // data units per page unit along x; y shows exaggeration times fewer units per page unit
                double perUnit = Math.max(xData.getLength() / w, yData.getLength() * exaggeration / h);
                double xHalf = 0.5 * perUnit * w;
                double yHalf = 0.5 * perUnit * h / exaggeration;
                plot.getDomainAxis().setRange(xData.getCentralValue() - xHalf, xData.getCentralValue() + xHalf);
                if (depthDown) {
                    // keep the top of the section where it is (the ground surface) and extend downward
                    plot.getRangeAxis().setRange(yData.getLowerBound(), yData.getLowerBound() + 2 * yHalf);
                } else {
                    plot.getRangeAxis().setRange(yData.getCentralValue() - yHalf, yData.getCentralValue() + yHalf);
                }
            }
        } finally {
            g2.dispose();
        }
    }

    // ------------------------------------------------------------------------------------- styling

    private static org.jfree.data.xy.XYSeries jfree(XySeries s, UnaryOperator<String> text) {
        // no sorting: a depth profile runs in depth order, not in concentration order
        org.jfree.data.xy.XYSeries j = new org.jfree.data.xy.XYSeries(text.apply(s.name()), false, true);
        for (int i = 0; i < s.size(); i++) {
            j.add(s.xAt(i), s.yAt(i));
        }
        return j;
    }

    private static XYLineAndShapeRenderer seriesRenderer(List<XySeries> series, boolean shapes) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, shapes);
        for (int i = 0; i < series.size(); i++) {
            r.setSeriesPaint(i, Palette.series(i));
            float[] dash = DASHES[i % DASHES.length];
            r.setSeriesStroke(i, dash == null ? new BasicStroke(2.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
                    : new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f));
            r.setSeriesShape(i, new Ellipse2D.Double(-3, -3, 6, 6));
            if (series.get(i).size() == 1) {
                r.setSeriesShapesVisible(i, true);
            }
        }
        r.setDrawSeriesLineAsPath(true);
        return r;
    }

    private static IntervalBarRenderer intervalRenderer(Color colour) {
        IntervalBarRenderer r = new IntervalBarRenderer();
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setSeriesPaint(0, withAlpha(colour, 0.85));
        r.setDrawBarOutline(false);
        r.setIncludeBaseInRange(false);
        r.setMaximumBarWidth(0.12);
        return r;
    }

    private static NumberAxis numberAxis(Axis a, UnaryOperator<String> text, boolean includeZero) {
        NumberAxis axis = new NumberAxis(text.apply(a.title()));
        axis.setAutoRangeIncludesZero(includeZero);
        styleAxis(axis);
        return axis;
    }

    private static LogAxis logAxis(Axis a, UnaryOperator<String> text) {
        LogAxis axis = new LogAxis(text.apply(a.title()));
        axis.setBase(10);
        axis.setSmallestValue(1e-300);
        axis.setTickUnit(new NumberTickUnit(1.0));
        axis.setMinorTickMarksVisible(true);
        axis.setMinorTickCount(9);
        styleAxis(axis);
        return axis;
    }

    private static void styleAxis(ValueAxis axis) {
        axis.setLabelFont(LABEL_FONT);
        axis.setLabelPaint(Palette.INK);
        axis.setTickLabelFont(TICK_FONT);
        axis.setTickLabelPaint(Palette.MUTED);
        axis.setAxisLinePaint(Palette.MUTED);
        axis.setTickMarkPaint(Palette.MUTED);
        axis.setTickMarkOutsideLength(3f);
    }

    private static ValueMarker marker(Marker m, UnaryOperator<String> text, boolean vertical) {
        ValueMarker v = new ValueMarker(m.value(), Palette.MUTED, MARKER_STROKE);
        v.setLabel(text.apply(m.label()));
        styleMarkerLabel(v, vertical);
        return v;
    }

    private static void styleMarkerLabel(ValueMarker v, boolean vertical) {
        v.setLabelFont(NOTE_FONT);
        v.setLabelPaint(Palette.INK);
        v.setLabelBackgroundColor(new Color(255, 255, 255, 210));
        if (vertical) {
            v.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            v.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            v.setLabelOffset(new RectangleInsets(4, 3, 4, 3));
        } else {
            v.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            v.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            v.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
        }
    }

    private static JFreeChart finish(XYPlot plot, boolean legend) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(Palette.RULE);
        plot.setDomainGridlinePaint(Palette.RULE);
        plot.setRangeGridlinePaint(Palette.RULE);
        plot.setDomainGridlineStroke(GRID_STROKE);
        plot.setRangeGridlineStroke(GRID_STROKE);
        plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
        plot.setDomainPannable(false);
        return chartOf(plot, legend);
    }

    private static void styleCategoryPlot(CategoryPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(Palette.RULE);
        plot.setRangeGridlinePaint(Palette.RULE);
        plot.setRangeGridlineStroke(GRID_STROKE);
        plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
    }

    private static JFreeChart chartOf(org.jfree.chart.plot.Plot plot, boolean legend) {
        JFreeChart chart = new JFreeChart(null, TITLE_FONT, plot, legend);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setPadding(new RectangleInsets(6, 4, 4, 8));
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        LegendTitle l = chart.getLegend();
        if (l != null) {
            l.setItemFont(TICK_FONT);
            l.setItemPaint(Palette.INK);
            l.setFrame(BlockBorder.NONE);
            l.setBackgroundPaint(Color.WHITE);
            l.setPosition(RectangleEdge.BOTTOM);
            l.setMargin(new RectangleInsets(6, 0, 0, 0));
        }
        return chart;
    }

    private static Color withAlpha(Color c, double alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), (int) Math.round(alpha * 255));
    }

    private static DecimalFormat grouped() {
        return new DecimalFormat("#,##0.###", DecimalFormatSymbols.getInstance(Locale.ROOT));
    }

    private static double round(double v) {
        if (v == 0) {
            return 0;
        }
        double scale = Math.pow(10, 3 - Math.ceil(Math.log10(Math.abs(v))));
        return Math.round(v * scale) / scale;
    }

    /**
     * Colours by value on the {@link Palette#sequential} scale, linear or logarithmic; with a level,
     * on the split scale ({@link Palette#belowLevel} up to the level, {@link Palette#aboveLevel}
     * above it). On a logarithmic scale a value at or below 0 takes the lowest colour.
     */
    static final class ValueScale implements PaintScale {
        /** Decades a logarithmic scale spans at most; lower values take its lowest colour. */
        static final double MAX_DECADES = 6;
        private final double lower;
        private final double upper;
        private final boolean log;
        /** The level where the colours change, NaN for none. */
        private final double level;

        private ValueScale(double lower, double upper, boolean log, double level) {
            this.lower = lower;
            this.upper = upper;
            this.log = log;
            this.level = level;
        }

        /** The same colours on a linear scale of log10(value), for a legend strip; itself if linear. */
        ValueScale inLog10Space() {
            return log ? new ValueScale(Math.log10(lower), Math.log10(upper), false,
                    Double.isNaN(level) ? Double.NaN : Math.log10(level)) : this;
        }

        static ValueScale of(double[] values, boolean log) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double v : values) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
            if (lo == hi && log) {
                lo = 0.5 * hi;
                hi = 1.5 * hi;
            } else if (lo == hi) {
                double pad = Math.max(Math.abs(lo) * 0.05, 1.0);
                lo -= pad;
                hi += pad;
            }
            return new ValueScale(lo, hi, log, Double.NaN);
        }

        /**
         * The scale of a plan: over the values of the points and the cells (on a logarithmic scale the
         * positive ones, at most {@link #MAX_DECADES} below the highest) and the level, which lies
         * inside the range with at least a decade (log) or a tenth of the range (linear) each side when
         * every value is on one side of it. Null when there is no value to colour.
         */
        static ValueScale of(List<ValuePoint> points, ValueGrid grid, Marker level, boolean log) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            int n = 0;
            for (ValuePoint p : points) {
                if (!log || p.value() > 0) {
                    lo = Math.min(lo, p.value());
                    hi = Math.max(hi, p.value());
                    n++;
                }
            }
            if (grid != null) {
                for (int i = 0; i < grid.countX() * grid.countY(); i++) {
                    double v = grid.valueAt(i);
                    if (!Double.isNaN(v) && (!log || v > 0)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                        n++;
                    }
                }
            }
            if (n == 0) {
                return null;
            }
            if (log) {
                lo = Math.max(lo, hi * Math.pow(10, -MAX_DECADES));
            }
            if (level == null) {
                return of(new double[] { lo, hi }, log);
            }
            double m = level.value();
            if (log) {
                lo = Math.min(lo, m / 10);
                hi = Math.max(hi, m * 10);
            } else {
                double span = Math.max(hi - lo, Math.max(Math.abs(m) * 0.1, 1e-9));
                lo = Math.min(lo, m - 0.1 * span);
                hi = Math.max(hi, m + 0.1 * span);
            }
            return new ValueScale(lo, hi, log, m);
        }

        @Override
        public double getLowerBound() {
            return lower;
        }

        @Override
        public double getUpperBound() {
            return upper;
        }

        @Override
        public Paint getPaint(double value) {
            double v = log && !(value > 0) ? lower : value;
            if (Double.isNaN(level)) {
                return Palette.sequential(position(v, lower, upper));
            }
            return v > level ? Palette.aboveLevel(position(v, level, upper)) : Palette.belowLevel(position(v, lower, level));
        }

        private double position(double v, double from, double to) {
            double f = log ? (Math.log(v) - Math.log(from)) / (Math.log(to) - Math.log(from)) : (v - from) / (to - from);
            return Double.isFinite(f) ? f : 1;
        }
    }

    /**
     * Points of a plan coloured by value inside a white ring with an ink edge, so that a point reads
     * on cells of any colour, its own included.
     */
    static final class RingedPoints extends XYShapeRenderer {
        private static final long serialVersionUID = 1L;
        /** The ring, centred on the point, in page units. */
        static final Shape RING = new Ellipse2D.Double(-6.5, -6.5, 13, 13);
        private static final Stroke RING_STROKE = new BasicStroke(0.8f);

        @Override
        public void drawItem(Graphics2D g2, XYItemRendererState state, Rectangle2D dataArea, PlotRenderingInfo info,
                XYPlot plot, ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item,
                CrosshairState crosshairState, int pass) {
            if (pass == 1) {
                double x = domainAxis.valueToJava2D(dataset.getXValue(series, item), dataArea, plot.getDomainAxisEdge());
                double y = rangeAxis.valueToJava2D(dataset.getYValue(series, item), dataArea, plot.getRangeAxisEdge());
                Shape ring = AffineTransform.getTranslateInstance(x, y).createTransformedShape(RING);
                g2.setPaint(Color.WHITE);
                g2.fill(ring);
                g2.setPaint(Palette.INK);
                g2.setStroke(RING_STROKE);
                g2.draw(ring);
            }
            super.drawItem(g2, state, dataArea, info, plot, domainAxis, rangeAxis, dataset, series, item, crosshairState, pass);
        }
    }

    /**
     * The cells of a {@link ValueGrid} as one image placed on the plot in data coordinates (row 0 of
     * the image is the northern row), clipped to the grid's extent; drawn nearest-neighbour.
     */
    static final class CellImage extends AbstractXYAnnotation {
        private static final long serialVersionUID = 1L;
        private final transient ValueGrid grid;
        private final transient BufferedImage image;

        CellImage(ValueGrid grid, ValueScale scale) {
            this.grid = grid;
            int nx = grid.countX();
            int ny = grid.countY();
            int k = Math.max(1, Math.min(16, (int) Math.ceil((double) CELL_IMAGE_PIXELS / Math.max(nx, ny))));
            image = new BufferedImage(nx * k, ny * k, BufferedImage.TYPE_INT_ARGB);
            int[] row = new int[nx * k];
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    double v = grid.valueAt(i, j);
                    int argb = Double.isNaN(v) ? 0 : ((Color) scale.getPaint(v)).getRGB();
                    java.util.Arrays.fill(row, i * k, (i + 1) * k, argb);
                }
                for (int r = 0; r < k; r++) {
                    image.setRGB(0, (ny - 1 - j) * k + r, nx * k, 1, row, 0, nx * k);
                }
            }
        }

        @Override
        public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis, ValueAxis rangeAxis,
                int rendererIndex, PlotRenderingInfo info) {
            RectangleEdge xEdge = Plot.resolveDomainAxisLocation(plot.getDomainAxisLocation(), plot.getOrientation());
            RectangleEdge yEdge = Plot.resolveRangeAxisLocation(plot.getRangeAxisLocation(), plot.getOrientation());
            double west = domainAxis.valueToJava2D(grid.originX(), dataArea, xEdge);
            double east = domainAxis.valueToJava2D(grid.originX() + grid.countX() * grid.cellWidth(), dataArea, xEdge);
            double south = rangeAxis.valueToJava2D(grid.originY(), dataArea, yEdge);
            double north = rangeAxis.valueToJava2D(grid.originY() + grid.countY() * grid.cellHeight(), dataArea, yEdge);
            double clipEast = domainAxis.valueToJava2D(grid.endX(), dataArea, xEdge);
            double clipNorth = rangeAxis.valueToJava2D(grid.endY(), dataArea, yEdge);
            Shape savedClip = g2.getClip();
            Object savedHint = g2.getRenderingHint(RenderingHints.KEY_INTERPOLATION);
            try {
                Rectangle2D cells = new Rectangle2D.Double(Math.min(west, clipEast), Math.min(south, clipNorth),
                        Math.abs(clipEast - west), Math.abs(south - clipNorth));
                g2.clip(cells.createIntersection(dataArea));
                g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
                AffineTransform at = new AffineTransform();
                at.translate(west, north);
                at.scale((east - west) / image.getWidth(), (south - north) / image.getHeight());
                g2.drawImage(image, at, null);
            } finally {
                g2.setClip(savedClip);
                if (savedHint != null) {
                    g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, savedHint);
                }
            }
        }
    }
}
