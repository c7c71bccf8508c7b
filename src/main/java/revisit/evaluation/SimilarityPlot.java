package revisit.evaluation;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Paint;
import java.awt.geom.Ellipse2D;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Heat map of the pooled similarity matrix (query frame down, matched frame across, global indices) with the
 * labelled revisits and the reported detections drawn on top.
 */
public final class SimilarityPlot {

    private SimilarityPlot() {
    }

    /** Builds the chart; detections are those reported at the result's acceptance threshold. */
    public static JFreeChart chart(SimilarityMatrix m, RevisitLabels labels, EvaluationResult result) {
        double[] range = m.range();
        Ramp ramp = new Ramp(range[0], range[1] > range[0] ? range[1] : range[0] + 1);
        XYPlot plot = new XYPlot(cells(m), frameAxis("matched frame (scan order)", m, false),
                frameAxis("query frame (scan order)", m, true), blockRenderer(m, ramp));
        plot.setBackgroundPaint(new Color(235, 235, 235));
        plot.setDataset(1, labelCells(m, labels));
        plot.setRenderer(1, ReportPlots.hollowSquares(ReportPlots.LABEL, 7));
        plot.setDataset(2, ReportPlots.detectionSeries(result.detections(),
                result.config().acceptanceThreshold(), (d, s) -> s.add(
                        labels.timeline().globalIndex(d.match()), labels.timeline().globalIndex(d.query()))));
        XYLineAndShapeRenderer det = ReportPlots.pointRenderer(ReportPlots.TRUE, 5);
        det.setSeriesPaint(1, ReportPlots.FALSE);
        det.setSeriesShape(1, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        plot.setRenderer(2, det);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        for (int s = 1; s < labels.timeline().sequences().size(); s++) {
            double at = labels.timeline().firstGlobalOf(s);
            plot.addDomainMarker(new ValueMarker(at, Color.WHITE, new BasicStroke(1f)));
            plot.addRangeMarker(new ValueMarker(at, Color.WHITE, new BasicStroke(1f)));
        }
        JFreeChart chart = new JFreeChart("Similarity with labels (squares) and detections (dots)",
                JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        PaintScaleLegend legend = new PaintScaleLegend(ramp, new NumberAxis("score"));
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setMargin(4, 4, 40, 4);
        chart.addSubtitle(legend);
        chart.setBackgroundPaint(Color.WHITE);
        return chart;
    }

    private static NumberAxis frameAxis(String label, SimilarityMatrix m, boolean downwards) {
        NumberAxis axis = new NumberAxis(label);
        axis.setRange(0, m.frames());
        axis.setInverted(downwards);
        return axis;
    }

    private static XYBlockRenderer blockRenderer(SimilarityMatrix m, PaintScale scale) {
        XYBlockRenderer blocks = new XYBlockRenderer();
        blocks.setBlockWidth((double) m.frames() / m.bins());
        blocks.setBlockHeight((double) m.frames() / m.bins());
        blocks.setBlockAnchor(RectangleAnchor.BOTTOM_LEFT);
        blocks.setPaintScale(scale);
        blocks.setSeriesVisibleInLegend(0, false);
        return blocks;
    }

    private static DefaultXYZDataset cells(SimilarityMatrix m) {
        int n = 0;
        for (int q = 0; q < m.bins(); q++) {
            for (int f = 0; f < m.bins(); f++) {
                n += m.isSet(q, f) ? 1 : 0;
            }
        }
        double[][] xyz = new double[3][n];
        int k = 0;
        for (int q = 0; q < m.bins(); q++) {
            for (int f = 0; f < m.bins(); f++) {
                if (m.isSet(q, f)) {
                    xyz[0][k] = m.binStart(f);
                    xyz[1][k] = m.binStart(q);
                    xyz[2][k++] = m.value(q, f);
                }
            }
        }
        DefaultXYZDataset d = new DefaultXYZDataset();
        d.addSeries("similarity", xyz);
        return d;
    }

    /** One marker per cell holding at least one labelled pair, at the cell centre. */
    private static XYSeriesCollection labelCells(SimilarityMatrix m, RevisitLabels labels) {
        boolean[] hit = new boolean[m.bins() * m.bins()];
        XYSeries s = new XYSeries("labelled revisit", false, true);
        double half = 0.5 * m.frames() / m.bins();
        for (int q = 0; q < labels.timeline().size(); q++) {
            for (int match : labels.matchesOfGlobal(q)) {
                int k = m.binOf(q) * m.bins() + m.binOf(match);
                if (!hit[k]) {
                    hit[k] = true;
                    s.add(m.binStart(m.binOf(match)) + half, m.binStart(m.binOf(q)) + half);
                }
            }
        }
        return new XYSeriesCollection(s);
    }

    /** Dark blue to yellow colour ramp over the score range. */
    private record Ramp(double lowerBound, double upperBound) implements PaintScale {
        @Override
        public double getLowerBound() {
            return lowerBound;
        }

        @Override
        public double getUpperBound() {
            return upperBound;
        }

        @Override
        public Paint getPaint(double value) {
            double t = Math.max(0, Math.min(1, (value - lowerBound) / (upperBound - lowerBound)));
            return new Color((int) (11 + t * (255 - 11)), (int) (11 + t * (230 - 11)), (int) (43 + t * (128 - 43)));
        }
    }
}
