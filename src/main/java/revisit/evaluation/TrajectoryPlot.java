package revisit.evaluation;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import revisit.io.StampedPose;

/**
 * Top view of the ground-truth trajectory with labelled revisits and reported detections drawn as segments
 * between the two camera centres. "Top" is the plane of the two world axes along which the camera centres spread
 * most, since the up axis differs between data sets.
 */
public final class TrajectoryPlot {

    /** Most segments drawn per kind; beyond that every k-th is drawn (the plot stays readable and small). */
    static final int MAX_SEGMENTS = 2000;

    private TrajectoryPlot() {
    }

    /** Builds the chart from poses in scan order (one per frame of the labels' timeline). */
    public static JFreeChart chart(List<StampedPose> poses, RevisitLabels labels, EvaluationResult result) {
        int[] axes = widestAxes(poses);
        String[] names = {"x", "y", "z"};
        NumberAxis x = new NumberAxis(names[axes[0]]);
        NumberAxis y = new NumberAxis(names[axes[1]]);
        x.setAutoRangeIncludesZero(false);
        y.setAutoRangeIncludesZero(false);
        XYSeriesCollection paths = paths(poses, labels.timeline(), axes);
        XYLineAndShapeRenderer pathRenderer = new XYLineAndShapeRenderer(true, false);
        for (int s = 0; s < paths.getSeriesCount(); s++) {
            pathRenderer.setSeriesPaint(s, s == 0 ? Color.DARK_GRAY : new Color(120, 120, 200));
        }
        XYPlot plot = new XYPlot(paths, x, y, pathRenderer);
        plot.setDataset(1, segments("labelled revisit", labelPairs(labels), poses, axes));
        plot.setRenderer(1, segmentRenderer(ReportPlots.LABEL, 3f));
        FrameTimeline t = labels.timeline();
        plot.setDataset(2, ReportPlots.detectionSeries(result.detections(), result.config().acceptanceThreshold(),
                (d, s) -> addSegment(s, poses.get(t.globalIndex(d.query())), poses.get(t.globalIndex(d.match())),
                        axes)));
        XYLineAndShapeRenderer detRenderer = segmentRenderer(ReportPlots.TRUE, 1.5f);
        detRenderer.setDefaultShape(new Ellipse2D.Double(-2, -2, 4, 4));
        detRenderer.setSeriesPaint(1, ReportPlots.FALSE);
        detRenderer.setSeriesStroke(1, new BasicStroke(1.5f));
        plot.setRenderer(2, detRenderer);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        JFreeChart chart = new JFreeChart("Trajectory (top view) with revisits", JFreeChart.DEFAULT_TITLE_FONT,
                plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        return chart;
    }

    /** One path series per sequence. */
    private static XYSeriesCollection paths(List<StampedPose> poses, FrameTimeline t, int[] axes) {
        XYSeriesCollection paths = new XYSeriesCollection();
        for (int s = 0; s < t.sequences().size(); s++) {
            XYSeries path = new XYSeries("path " + t.sequences().get(s).sequenceId(), false, true);
            for (int g = t.firstGlobalOf(s); g < t.endGlobalOf(s); g++) {
                path.add(coord(poses.get(g), axes[0]), coord(poses.get(g), axes[1]));
            }
            paths.addSeries(path);
        }
        return paths;
    }

    private static int[][] labelPairs(RevisitLabels labels) {
        int[][] pairs = new int[labels.pairCount()][];
        int n = 0;
        for (int q = 0; q < labels.timeline().size(); q++) {
            for (int m : labels.matchesOfGlobal(q)) {
                pairs[n++] = new int[]{q, m};
            }
        }
        return pairs;
    }

    private static XYSeriesCollection segments(String name, int[][] pairs, List<StampedPose> poses, int[] axes) {
        XYSeries s = new XYSeries(name, false, true);
        int stride = Math.max(1, (pairs.length + MAX_SEGMENTS - 1) / MAX_SEGMENTS);
        for (int i = 0; i < pairs.length; i += stride) {
            addSegment(s, poses.get(pairs[i][0]), poses.get(pairs[i][1]), axes);
        }
        return new XYSeriesCollection(s);
    }

    /** A segment followed by a gap (a null y breaks the line). */
    private static void addSegment(XYSeries s, StampedPose a, StampedPose b, int[] axes) {
        s.add(coord(a, axes[0]), coord(a, axes[1]));
        s.add(coord(b, axes[0]), coord(b, axes[1]));
        s.add(coord(b, axes[0]), null);
    }

    /** Lines between the two ends plus a dot at each end (a revisit of the very same spot has no length). */
    private static XYLineAndShapeRenderer segmentRenderer(Color color, float width) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
        r.setSeriesPaint(0, color);
        r.setSeriesStroke(0, new BasicStroke(width));
        r.setDefaultShape(new Ellipse2D.Double(-3, -3, 6, 6));
        r.setAutoPopulateSeriesShape(false);
        r.setDrawSeriesLineAsPath(false);
        return r;
    }

    /** Indices (0 = x, 1 = y, 2 = z) of the two axes with the largest spread of camera centres, in axis order. */
    static int[] widestAxes(List<StampedPose> poses) {
        double[] variance = new double[3];
        for (int a = 0; a < 3; a++) {
            double mean = 0;
            for (StampedPose p : poses) {
                mean += coord(p, a);
            }
            mean /= poses.size();
            for (StampedPose p : poses) {
                variance[a] += (coord(p, a) - mean) * (coord(p, a) - mean);
            }
        }
        int smallest = variance[0] <= variance[1] && variance[0] <= variance[2] ? 0 : variance[1] <= variance[2] ? 1 : 2;
        return smallest == 0 ? new int[]{1, 2} : smallest == 1 ? new int[]{0, 2} : new int[]{0, 1};
    }

    private static double coord(StampedPose p, int axis) {
        return axis == 0 ? p.x() : axis == 1 ? p.y() : p.z();
    }
}
