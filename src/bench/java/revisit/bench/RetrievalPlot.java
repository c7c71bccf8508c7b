package revisit.bench;

import java.awt.BasicStroke;
import java.awt.Color;
import java.nio.file.Path;
import java.text.DecimalFormat;
import java.util.List;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import revisit.io.AtomicFiles;

/** Query latency (thread CPU time, p50 and p99) against database size for both systems, log-log, as a PNG. */
final class RetrievalPlot {

    private RetrievalPlot() {
    }

    static void write(Path file, List<RetrievalScale.Point> points) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (String system : points.stream().map(RetrievalScale.Point::system).distinct().toList()) {
            XYSeries p50 = new XYSeries(system + " p50");
            XYSeries p99 = new XYSeries(system + " p99");
            for (RetrievalScale.Point p : points) {
                if (p.system().equals(system)) {
                    p50.add(p.frames(), p.queryCpuP50Us() / 1e3);
                    p99.add(p.frames(), p.queryCpuP99Us() / 1e3);
                }
            }
            data.addSeries(p50);
            data.addSeries(p99);
        }
        LogAxis frames = decades("frames in the database");
        LogAxis latency = decades("query latency, ms of thread CPU (descriptors in, top 50 out)");
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
        Color[] colours = {new Color(0x1f77b4), new Color(0xd62728)};
        for (int s = 0; s < data.getSeriesCount(); s++) {
            renderer.setSeriesPaint(s, colours[(s / 2) % colours.length]);
            renderer.setSeriesStroke(s, s % 2 == 0 ? new BasicStroke(2f)
                    : new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[]{6f, 4f},
                    0f));
        }
        XYPlot plot = new XYPlot(data, frames, latency, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        JFreeChart chart = new JFreeChart("Retrieval: ours vs BoofCV vocabulary tree", JFreeChart.DEFAULT_TITLE_FONT,
                plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        AtomicFiles.write(file, out -> ChartUtils.writeChartAsPNG(out, chart, 800, 520));
    }

    /** A base-10 log axis with a labelled tick per decade, written as plain numbers. */
    private static LogAxis decades(String label) {
        LogAxis axis = new LogAxis(label);
        axis.setBase(10);
        axis.setTickUnit(new NumberTickUnit(1.0));
        axis.setMinorTickCount(9);
        axis.setMinorTickMarksVisible(true);
        axis.setNumberFormatOverride(new DecimalFormat("#,##0.###"));
        return axis;
    }
}
