package revisit.evaluation;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import revisit.io.AtomicFiles;

/**
 * Draws the report's plots with JFreeChart: the precision-recall curve, the similarity heat map
 * ({@link SimilarityPlot}) and the trajectory top view ({@link TrajectoryPlot}).
 */
public final class ReportPlots {

    /** Colour of the precision-recall curve. */
    static final Color CURVE = new Color(31, 95, 191);
    /** Colour of true detections. */
    static final Color TRUE = new Color(26, 152, 80);
    /** Colour of false detections. */
    static final Color FALSE = new Color(215, 48, 39);
    /** Colour of labelled revisits. */
    static final Color LABEL = new Color(244, 161, 29);

    private ReportPlots() {
    }

    /** Writes a chart as a PNG file, atomically. */
    public static void writePng(Path file, JFreeChart chart, int width, int height) {
        AtomicFiles.write(file, out -> ChartUtils.writeChartAsPNG(out, chart, width, height));
    }

    /**
     * Precision against recall as the acceptance threshold falls, with the operating points at 100% precision and
     * at the configured threshold marked.
     */
    public static JFreeChart precisionRecall(EvaluationResult result) {
        XYSeries curve = new XYSeries("precision-recall (threshold falling)", false, true);
        curve.add(0.0, 1.0);
        for (OperatingPoint p : result.curve().points()) {
            curve.add(p.recall(), p.precision());
        }
        XYSeries marks = new XYSeries("at 100% precision", false, true);
        marks.add(result.atFullPrecision().recall(), result.atFullPrecision().precision());
        XYSeries threshold = new XYSeries("at the acceptance threshold", false, true);
        threshold.add(result.atThreshold().recall(), result.atThreshold().precision());
        NumberAxis x = new NumberAxis("recall");
        x.setRange(0, 1.02);
        NumberAxis y = new NumberAxis("precision");
        y.setRange(0, 1.02);
        XYStepRenderer line = new XYStepRenderer();
        line.setSeriesPaint(0, CURVE);
        line.setSeriesStroke(0, new BasicStroke(2f));
        XYPlot plot = new XYPlot(new XYSeriesCollection(curve), x, y, line);
        plot.setDataset(1, new XYSeriesCollection(marks));
        plot.setRenderer(1, pointRenderer(TRUE, 10));
        plot.setDataset(2, new XYSeriesCollection(threshold));
        plot.setRenderer(2, pointRenderer(Color.BLACK, 7));
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        String title = String.format(Locale.ROOT, "Precision-recall (AP %.3f, recall at 100%% precision %.3f)",
                result.averagePrecision(), result.atFullPrecision().recall());
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        return chart;
    }

    /** A renderer drawing shapes only, no lines. */
    static XYLineAndShapeRenderer pointRenderer(Color color, double size) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        r.setSeriesPaint(0, color);
        r.setSeriesShape(0, new Ellipse2D.Double(-size / 2, -size / 2, size, size));
        return r;
    }

    /** A renderer drawing hollow squares. */
    static XYLineAndShapeRenderer hollowSquares(Color color, double size) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        r.setSeriesPaint(0, color);
        r.setSeriesShape(0, new Rectangle2D.Double(-size / 2, -size / 2, size, size));
        r.setSeriesShapesFilled(0, false);
        return r;
    }

    /** Verified detections split into true and false series of (x, y) from a mapping of frames to coordinates. */
    static XYSeriesCollection detectionSeries(List<JudgedDetection> detections, double threshold,
                                              BiConsumer<JudgedDetection, XYSeries> add) {
        XYSeries right = new XYSeries("true detection", false, true);
        XYSeries wrong = new XYSeries("false detection", false, true);
        for (JudgedDetection d : detections) {
            if (d.score() >= threshold) {
                add.accept(d, d.correct() ? right : wrong);
            }
        }
        XYSeriesCollection c = new XYSeriesCollection();
        c.addSeries(right);
        c.addSeries(wrong);
        return c;
    }
}
