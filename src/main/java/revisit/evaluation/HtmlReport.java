package revisit.evaluation;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import revisit.io.AtomicFiles;

/**
 * Writes a self-contained report folder: {@code index.html}, the plots as PNG files and image-pair thumbnails.
 * The page refers only to files in the folder, so the folder can be moved, zipped or served as is. Every file is
 * written atomically and {@code index.html} last, so a page never points at a missing plot.
 */
public final class HtmlReport {

    /** Name of the page. */
    public static final String INDEX = "index.html";
    /** Plot sizes, pixels. */
    static final int PLOT_WIDTH = 600;
    static final int PLOT_HEIGHT = 480;
    static final int MATRIX_SIZE = 620;
    /** Thumbnail width, pixels. */
    static final int THUMB_WIDTH = 240;

    private HtmlReport() {
    }

    /**
     * Writes the report.
     *
     * @param folder created if missing; existing report files in it are replaced
     * @return the page, {@code folder/index.html}
     */
    public static Path write(Path folder, ReportInput input) {
        List<Figure> figures = new ArrayList<>();
        ReportPlots.writePng(folder.resolve("precision-recall.png"), ReportPlots.precisionRecall(input.result()),
                PLOT_WIDTH, PLOT_HEIGHT);
        figures.add(new Figure("precision-recall.png", "Precision against recall as the acceptance threshold falls."));
        if (input.similarity().isPresent()) {
            ReportPlots.writePng(folder.resolve("similarity.png"), SimilarityPlot.chart(input.similarity().get(),
                    input.labels(), input.result()), MATRIX_SIZE + 90, MATRIX_SIZE);
            figures.add(new Figure("similarity.png", "Similarity of each query (down) to earlier frames (across);"
                    + " squares mark labelled revisits, dots the detections reported at the threshold."));
        }
        if (input.poses().isPresent()) {
            ReportPlots.writePng(folder.resolve("trajectory.png"), TrajectoryPlot.chart(input.poses().get(),
                    input.labels(), input.result()), PLOT_WIDTH, PLOT_HEIGHT);
            figures.add(new Figure("trajectory.png", "Ground-truth path seen from above, labelled revisits and"
                    + " reported detections drawn between the two camera positions."));
        }
        List<PairRow> rows = thumbnails(folder, input);
        Path index = folder.resolve(INDEX);
        AtomicFiles.writeString(index, HtmlPage.render(input, figures, rows));
        return index;
    }

    private static List<PairRow> thumbnails(Path folder, ReportInput input) {
        List<PairRow> rows = new ArrayList<>();
        for (int i = 0; i < input.pairs().size(); i++) {
            ImagePair p = input.pairs().get(i);
            String q = String.format(Locale.ROOT, "pair-%03d-query.png", i);
            String m = String.format(Locale.ROOT, "pair-%03d-match.png", i);
            Optional<String> qProblem = Thumbnails.write(p.queryImage(), folder.resolve(q), THUMB_WIDTH);
            Optional<String> mProblem = Thumbnails.write(p.matchImage(), folder.resolve(m), THUMB_WIDTH);
            rows.add(new PairRow(p, qProblem.isEmpty() ? Optional.of(q) : Optional.empty(), qProblem,
                    mProblem.isEmpty() ? Optional.of(m) : Optional.empty(), mProblem));
        }
        return rows;
    }

    /** A plot file and its caption. */
    record Figure(String file, String caption) {
    }

    /** One thumbnail row: the file written for each side, or why it could not be. */
    record PairRow(ImagePair pair, Optional<String> queryFile, Optional<String> queryProblem,
                   Optional<String> matchFile, Optional<String> matchProblem) {
    }
}
