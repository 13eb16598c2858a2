package eluvia.report.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.GraphicsEnvironment;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.List;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.category.StackedBarRenderer;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every chart kind draws off screen, to the size asked, with the axes it promises. */
final class ChartsRenderTest {

    static Stream<ChartSpec> everyKind() {
        return ChartFixtures.all().stream();
    }

    @Test
    void runsWithoutADisplay() {
        // the build runs tests with -Djava.awt.headless=true (root pom, tycho-surefire argLine)
        assertTrue(GraphicsEnvironment.isHeadless());
    }

    @ParameterizedTest
    @MethodSource("everyKind")
    void drawsAnImageOfTheRequestedSize(ChartSpec chart) throws IOException {
        byte[] png = Charts.png(chart, 640, 400, 2.0);
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
        assertEquals(640, image.getWidth());
        assertEquals(400, image.getHeight());
        int inked = 0;
        for (int y = 0; y < image.getHeight(); y += 2) {
            for (int x = 0; x < image.getWidth(); x += 2) {
                if ((image.getRGB(x, y) & 0xffffff) != 0xffffff) {
                    inked++;
                }
            }
        }
        // axes, labels and data cover far more than 2 % of a chart; a blank or failed drawing covers none
        assertTrue(inked > 0.02 * 320 * 200, "pixels drawn: " + inked);
    }

    @Test
    void imageSizeAndScaleAreChecked() {
        ChartSpec c = ChartFixtures.tornado();
        assertThrows(ChartDataException.class, () -> Charts.image(c, 10, 400, 1));
        assertThrows(ChartDataException.class, () -> Charts.image(c, 400, 9000, 1));
        assertThrows(ChartDataException.class, () -> Charts.image(c, 400, 300, 0.1));
        assertThrows(ChartDataException.class, () -> Charts.image(c, 400, 300, Double.NaN));
        assertThrows(ChartDataException.class, () -> Charts.build(null));
    }

    @Test
    void residualFractionUsesALogarithmicAxis() {
        XYPlot plot = Charts.build(ChartFixtures.residualFraction()).getXYPlot();
        assertInstanceOf(LogAxis.class, plot.getRangeAxis());
        assertEquals("Residual fraction C/C0 (-)", plot.getRangeAxis().getLabel());
        assertEquals(1, plot.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size());
        assertEquals(1, plot.getRangeMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size());
    }

    @Test
    void depthIncreasesDownward() {
        JFreeChart chart = Charts.build(ChartFixtures.profile());
        XYPlot plot = chart.getXYPlot();
        assertTrue(plot.getRangeAxis().isInverted());
        Rectangle2D area = new Rectangle2D.Double(0, 0, 500, 400);
        Rectangle2D data = drawnDataArea(chart, area);
        double shallow = plot.getRangeAxis().valueToJava2D(0.5, data, RectangleEdge.LEFT);
        double deep = plot.getRangeAxis().valueToJava2D(4.0, data, RectangleEdge.LEFT);
        assertTrue(deep > shallow, "screen y grows downward, so deeper must be larger: " + shallow + " " + deep);
    }

    @Test
    void tornadoListsInputsWidestFirstAndBarChartsStackOrGroup() {
        CategoryPlot plot = (CategoryPlot) Charts.build(ChartFixtures.tornado()).getPlot();
        List<?> categories = plot.getCategories();
        assertTrue(categories.get(0).toString().startsWith("Large"), categories.toString());
        assertTrue(categories.get(2).toString().startsWith("Small"), categories.toString());
        assertInstanceOf(CategoryAxis.class, plot.getDomainAxis());
        assertInstanceOf(StackedBarRenderer.class, ((CategoryPlot) Charts.build(ChartFixtures.bars(true)).getPlot()).getRenderer());
        assertTrue(!(((CategoryPlot) Charts.build(ChartFixtures.bars(false)).getPlot())
                .getRenderer() instanceof StackedBarRenderer));
    }

    @Test
    void planViewIsDrawnToScale() {
        PlanView plan = ChartFixtures.plan();
        for (Rectangle2D area : List.of(new Rectangle2D.Double(0, 0, 700, 400), new Rectangle2D.Double(0, 0, 400, 600))) {
            JFreeChart chart = Charts.build(plan);
            Charts.fitToScale(chart, area, 1.0, Charts.extent(plan.points(), plan.outlines()), false);
            Rectangle2D data = drawnDataArea(chart, area);
            XYPlot p = chart.getXYPlot();
            double xPerPixel = p.getDomainAxis().getRange().getLength() / data.getWidth();
            double yPerPixel = p.getRangeAxis().getRange().getLength() / data.getHeight();
            // equal scaling: a metre of easting and of northing take the same length
            assertEquals(1.0, xPerPixel / yPerPixel, 1e-3);
            assertContains(p.getDomainAxis(), 0, 100);
            assertContains(p.getRangeAxis(), 0, 20);
        }
    }

    @Test
    void sectionIsDrawnAtItsVerticalExaggerationFromTheSurfaceDown() {
        SectionView section = ChartFixtures.section(4);
        Rectangle2D area = new Rectangle2D.Double(0, 0, 700, 420);
        JFreeChart chart = Charts.build(section);
        Charts.fitToScale(chart, area, 4, Charts.extent(section.points(), section.outlines()), true);
        Rectangle2D data = drawnDataArea(chart, area);
        XYPlot p = chart.getXYPlot();
        double xPerPixel = p.getDomainAxis().getRange().getLength() / data.getWidth();
        double yPerPixel = p.getRangeAxis().getRange().getLength() / data.getHeight();
        // a vertical metre is drawn 4 times as long as a horizontal one
        assertEquals(4.0, xPerPixel / yPerPixel, 4e-3);
        assertEquals(0.0, p.getRangeAxis().getLowerBound(), "the section starts at the ground surface");
        assertTrue(p.getRangeAxis().isInverted());
        assertContains(p.getRangeAxis(), 0.5, 4.0);
        assertContains(p.getDomainAxis(), 5, 45);
    }

    private static void assertContains(ValueAxis axis, double lo, double hi) {
        assertTrue(axis.getLowerBound() <= lo && axis.getUpperBound() >= hi,
                axis.getLabel() + " shows " + axis.getRange() + ", data " + lo + " to " + hi);
    }

    private static Rectangle2D drawnDataArea(JFreeChart chart, Rectangle2D area) {
        BufferedImage scratch = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = scratch.createGraphics();
        try {
            ChartRenderingInfo info = new ChartRenderingInfo();
            chart.draw(g2, area, info);
            return info.getPlotInfo().getDataArea();
        } finally {
            g2.dispose();
        }
    }

    @Test
    void cellsAboveTheLevelAreWarmAndCellsBelowItCool() {
        PlanView plan = ChartFixtures.planWithCells();
        Rectangle2D area = new Rectangle2D.Double(0, 0, 800, 500);
        JFreeChart chart = Charts.build(plan);
        Charts.fitToScale(chart, area, 1.0, Charts.extent(plan), false);
        BufferedImage image = new BufferedImage(800, 500, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = image.createGraphics();
        ChartRenderingInfo info = new ChartRenderingInfo();
        chart.draw(g2, area, info);
        g2.dispose();
        Rectangle2D data = info.getPlotInfo().getDataArea();
        XYPlot p = chart.getXYPlot();
        // a cell in the west (value 0.01 x 10^(4 x 2/39), below the level 1) and one in the east (above it),
        // both in the row at northing 6.25 m, away from every outline and point
        java.awt.Color west = pixel(image, p, data, 2.5 * 2 + 1.25, 6.25);
        java.awt.Color east = pixel(image, p, data, 2.5 * 36 + 1.25, 6.25);
        assertTrue(west.getBlue() >= west.getRed(), "below the level: a cool grey, got " + west);
        assertTrue(east.getRed() > east.getBlue() + 40, "above the level: a warm colour, got " + east);
        // the cell without a value is not drawn: the plot's white shows through
        java.awt.Color none = pixel(image, p, data, 2.5 * 1 + 1.25, 48.75);
        assertEquals(java.awt.Color.WHITE, none);
        // the legend names the points, the cells, the colour step and each outline
        assertEquals(3 + plan.outlines().size(), p.getFixedLegendItems().getItemCount());
        assertEquals("cell", plan.data().rows().get(plan.data().rows().size() - 1).get(0));
    }

    private static java.awt.Color pixel(BufferedImage image, XYPlot p, Rectangle2D data, double x, double y) {
        int px = (int) Math.round(p.getDomainAxis().valueToJava2D(x, data, RectangleEdge.BOTTOM));
        int py = (int) Math.round(p.getRangeAxis().valueToJava2D(y, data, RectangleEdge.LEFT));
        return new java.awt.Color(image.getRGB(px, py));
    }
}
