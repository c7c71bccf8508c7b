package revisit.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import revisit.vocabulary.Provenance;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;
import revisit.vocabulary.VocabularySummary;

/** {@code revisit vocab-info FILE}: describes a vocabulary file. */
@Command(name = "vocab-info", mixinStandardHelpOptions = true,
        description = "Describes a vocabulary file: parameters, words, depth, occupancy, weights and how it was "
                + "trained.")
final class VocabInfoCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Vocabulary file (.rvoc).")
    private Path file;

    @Option(names = "--verbose", description = "Show stack traces of errors.")
    private boolean verbose;

    @Override
    public Integer call() throws Exception {
        Vocabulary vocabulary = VocabularyFile.read(file);
        print(spec.commandLine().getOut(), file, Files.size(file), VocabularySummary.of(vocabulary));
        return 0;
    }

    static void print(PrintWriter out, Path file, long bytes, VocabularySummary s) {
        String size = bytes >= 1_000_000 ? String.format(Locale.ROOT, "%.1f MB", bytes / 1e6)
                : String.format(Locale.ROOT, "%.1f kB", bytes / 1e3);
        out.printf(Locale.ROOT, "vocabulary   %s (%s)%n", file, size);
        out.printf(Locale.ROOT, "descriptor   %s%n", s.descriptorKind());
        out.printf(Locale.ROOT, "tree         branching k = %d, depth L = %d, %d nodes, leaves at depth %d..%d%n",
                s.branching(), s.depth(), s.nodeCount(), s.minLeafDepth(), s.maxLeafDepth());
        out.printf(Locale.ROOT, "words        %d of %d possible (%.1f%%)%n", s.wordCount(), s.fullTreeWords(),
                100.0 * s.wordCount() / s.fullTreeWords());
        VocabularySummary.Spread o = s.occupancy();
        out.printf(Locale.ROOT, "occupancy    training descriptors per word: min %.0f, median %.1f, mean %.1f, "
                + "max %.0f%n", o.min(), o.median(), o.mean(), o.max());
        VocabularySummary.Spread w = s.weights();
        out.printf(Locale.ROOT, "weights      idf ln(N/N_i): min %.3f, median %.3f, mean %.3f, max %.3f; %d words "
                + "in every training image (weight 0)%n", w.min(), w.median(), w.mean(), w.max(), s.zeroWeightWords());
        Provenance p = s.provenance();
        out.printf(Locale.ROOT, "trained      %s on %d images, %d descriptors; seed %d, at most %d iterations per "
                + "node%n", p.createdUtc(), p.imageCount(), p.descriptorCount(), p.seed(), p.maxIterations());
        out.printf(Locale.ROOT, "command      %s%n", p.command().isEmpty() ? "(not recorded)" : p.command());
        if (p.sources().isEmpty()) {
            out.printf(Locale.ROOT, "sources      (not recorded)%n");
        }
        for (int i = 0; i < p.sources().size(); i++) {
            out.printf(Locale.ROOT, "%s%s%n", i == 0 ? "sources      " : "             ", p.sources().get(i));
        }
        out.flush();
    }
}
