package revisit.evaluation;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/** The markup of the report page (no scripts, no external resources). */
final class HtmlPage {

    private static final String STYLE = "body{font-family:sans-serif;margin:24px;color:#222;max-width:1240px}"
            + "table{border-collapse:collapse;margin:8px 0 16px}td,th{border:1px solid #bbb;padding:4px 10px;"
            + "text-align:right}th{background:#eee}td.l,th.l{text-align:left}tr.head td{font-weight:bold;"
            + "background:#eef5ee}.figs{display:flex;flex-wrap:wrap;gap:16px}figure{margin:0}"
            + "figcaption{font-size:13px;color:#555;max-width:600px}.bad{color:#b00}";

    private static final Map<MissReason, String> MEANING = Map.of(
            MissReason.NOT_QUERIED, "the pipeline returned no outcome for the frame",
            MissReason.NO_CANDIDATE, "the index proposed no candidate",
            MissReason.TEMPORAL_CHECK, "a candidate failed the temporal consistency check",
            MissReason.VERIFICATION, "a candidate failed geometric verification",
            MissReason.BELOW_THRESHOLD, "verified, but scored below the acceptance threshold",
            MissReason.WRONG_MATCH, "reported, but to a frame that is not a labelled revisit");

    private HtmlPage() {
    }

    static String render(ReportInput in, List<HtmlReport.Figure> figures, List<HtmlReport.PairRow> rows) {
        StringBuilder h = new StringBuilder(8192);
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>").append(esc(in.title()))
                .append("</title><style>").append(STYLE).append("</style></head><body>\n<h1>")
                .append(esc(in.title())).append("</h1>\n");
        summary(h, in);
        metrics(h, in.result());
        misses(h, in.result());
        h.append("<h2>Plots</h2>\n<div class=\"figs\">\n");
        for (HtmlReport.Figure f : figures) {
            h.append("<figure><img src=\"").append(esc(f.file())).append("\" alt=\"").append(esc(f.caption()))
                    .append("\"><figcaption>").append(esc(f.caption())).append("</figcaption></figure>\n");
        }
        h.append("</div>\n");
        pairs(h, in.result(), rows);
        in.tuning().ifPresent(t -> tuning(h, t));
        h.append("<h2>Definitions</h2>\n<p>A query is positive when its labelled set of earlier frames is not empty."
                + " A query is reported when it passed verification and its score is at least the acceptance"
                + " threshold; a report is true when its matched frame is labelled (within the frame tolerance)."
                + " Precision = true / reported (1 when nothing is reported); recall = true / positive queries;"
                + " average precision as in Manning, Raghavan &amp; Sch&uuml;tze, Introduction to Information"
                + " Retrieval, ch. 8. See docs/EVALUATION.md of the project.</p>\n</body></html>\n");
        return h.toString();
    }

    private static void summary(StringBuilder h, ReportInput in) {
        RevisitLabels l = in.labels();
        EvaluationResult r = in.result();
        h.append("<p>").append(r.queries()).append(" queries over ").append(l.timeline().size())
                .append(" frames in ").append(l.timeline().sequences().size()).append(" sequence(s); ")
                .append(r.positives()).append(" positive queries, ").append(l.pairCount())
                .append(" labelled pairs (").append(l.droppedPairs()).append(" dropped inside the exclusion window of ")
                .append(l.window().frames()).append(" frames / ").append(num(l.window().seconds()))
                .append(" s); frame tolerance ").append(r.config().frameTolerance()).append(".</p>\n");
    }

    private static void metrics(StringBuilder h, EvaluationResult r) {
        h.append("<h2>Metrics</h2>\n<table><tr><th class=\"l\">operating point</th><th>threshold</th>"
                + "<th>reported</th><th>true</th><th>false</th><th>missed</th><th>precision</th><th>recall</th>"
                + "<th>F1</th></tr>\n");
        row(h, "recall at 100% precision (headline)", r.atFullPrecision(), true);
        row(h, "recall at 95% precision", r.at95Precision(), false);
        row(h, "at the acceptance threshold", r.atThreshold(), false);
        h.append("</table>\n<p>Average precision ").append(num(r.averagePrecision()))
                .append("; eleven-point interpolated average precision ")
                .append(num(r.curve().elevenPointAveragePrecision())).append(".</p>\n");
    }

    private static void row(StringBuilder h, String name, OperatingPoint p, boolean head) {
        h.append(head ? "<tr class=\"head\">" : "<tr>").append("<td class=\"l\">").append(esc(name))
                .append("</td><td>").append(threshold(p.threshold())).append("</td><td>").append(p.reported())
                .append("</td><td>").append(p.truePositives()).append("</td><td>").append(p.falsePositives())
                .append("</td><td>").append(p.falseNegatives()).append("</td><td>").append(num(p.precision()))
                .append("</td><td>").append(num(p.recall())).append("</td><td>").append(num(p.f1()))
                .append("</td></tr>\n");
    }

    private static void misses(StringBuilder h, EvaluationResult r) {
        h.append("<h2>Where positive queries were lost (at the acceptance threshold)</h2>\n<table><tr>"
                + "<th class=\"l\">reason</th><th>queries</th><th>share of positives</th>"
                + "<th class=\"l\">meaning</th></tr>\n");
        for (MissReason reason : MissReason.values()) {
            int n = r.missReasons().get(reason);
            h.append("<tr><td class=\"l\">").append(reason.name().toLowerCase(Locale.ROOT).replace('_', ' '))
                    .append("</td><td>").append(n).append("</td><td>")
                    .append(r.positives() == 0 ? "-" : num((double) n / r.positives())).append("</td><td class=\"l\">")
                    .append(esc(MEANING.get(reason))).append("</td></tr>\n");
        }
        h.append("</table>\n");
    }

    private static void pairs(StringBuilder h, EvaluationResult r, List<HtmlReport.PairRow> rows) {
        if (rows.isEmpty()) {
            return;
        }
        h.append("<h2>Image pairs</h2>\n<table><tr><th class=\"l\">query</th><th class=\"l\">match</th>"
                + "<th class=\"l\">verdict</th></tr>\n");
        for (HtmlReport.PairRow row : rows) {
            h.append("<tr><td class=\"l\">");
            image(h, row.pair().query(), row.queryFile(), row.queryProblem());
            h.append("</td><td class=\"l\">");
            image(h, row.pair().match(), row.matchFile(), row.matchProblem());
            h.append("</td><td class=\"l\">").append(esc(verdict(r, row.pair()))).append("</td></tr>\n");
        }
        h.append("</table>\n");
    }

    private static void image(StringBuilder h, FrameKey frame, Optional<String> file, Optional<String> problem) {
        h.append(esc(frame.toString())).append("<br>");
        if (file.isPresent()) {
            h.append("<img src=\"").append(esc(file.get())).append("\" alt=\"frame ").append(esc(frame.toString()))
                    .append("\">");
        } else {
            h.append("<span class=\"bad\">").append(esc(problem.orElse("no image"))).append("</span>");
        }
    }

    private static String verdict(EvaluationResult r, ImagePair p) {
        for (JudgedDetection d : r.detections()) {
            if (d.query().equals(p.query()) && d.match().equals(p.match())) {
                boolean reported = d.score() >= r.config().acceptanceThreshold();
                return "score " + num(d.score()) + (reported ? ", reported, " : ", not reported, ")
                        + (d.correct() ? "a labelled revisit" : "not a labelled revisit");
            }
        }
        return "not a verified detection";
    }

    private static void tuning(StringBuilder h, TuningResult t) {
        h.append("<h2>Tuning</h2>\n<p>Chosen: ").append(esc(t.chosen().setting().toString()))
                .append(", acceptance threshold ").append(threshold(t.chosen().acceptanceThreshold()))
                .append(" (best of ").append(t.trials().size()).append(" settings).</p>\n<table><tr>"
                        + "<th class=\"l\">setting</th><th>recall at target</th><th>precision</th><th>F1</th>"
                        + "<th>AP</th></tr>\n");
        Comparator<Trial> bestFirst = (a, b) -> a.beats(b) ? -1 : b.beats(a) ? 1 : Integer.compare(a.index(), b.index());
        t.trials().stream().sorted(bestFirst).limit(15).forEach(x -> h.append("<tr><td class=\"l\">")
                .append(esc(x.setting().toString())).append("</td><td>").append(num(x.chosen().recall()))
                .append("</td><td>").append(num(x.chosen().precision())).append("</td><td>")
                .append(num(x.chosen().f1())).append("</td><td>").append(num(x.averagePrecision()))
                .append("</td></tr>\n"));
        h.append("</table>\n");
    }

    private static String threshold(double t) {
        if (t == Double.POSITIVE_INFINITY) {
            return "none (nothing reported)";
        }
        return t == Double.NEGATIVE_INFINITY ? "every verified" : num(t);
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
