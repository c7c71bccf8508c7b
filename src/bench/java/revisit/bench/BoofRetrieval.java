package revisit.bench;

import boofcv.abst.scene.FeatureSceneRecognition;
import boofcv.abst.scene.SceneRecognition;
import boofcv.abst.scene.nister2006.ConfigRecognitionNister2006;
import boofcv.abst.scene.nister2006.FeatureSceneRecognitionNister2006;
import boofcv.struct.feature.TupleDesc_B;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import org.ddogleg.struct.DogArray;
import org.openjdk.jol.info.GraphLayout;
import revisit.features.FrameFeatures;
import revisit.vocabulary.TrainingSet;

/**
 * BoofCV 1.1.7's vocabulary-tree scene recognition ({@link FeatureSceneRecognitionNister2006}, after Nistér and
 * Stewénius, CVPR 2006): its own hierarchical k-means tree and node weights learnt by
 * {@link FeatureSceneRecognitionNister2006#learnModel} from the same training descriptors as our vocabulary, then
 * {@code addImage} and {@code query}. Everything but the tree shape stays at BoofCV's defaults (L1 norm, words at
 * least 2 levels below the root, inverted files longer than {@code max(0.002 N, 5000)} images skipped at query time,
 * 30 k-means iterations). The exclusion window is BoofCV's query filter. Image ids are the insertion index as a
 * string; the (sequence, frame, time) of each index is kept beside the recogniser and not counted in its memory.
 */
final class BoofRetrieval implements RetrievalSystem {

    private final FeatureSceneRecognitionNister2006<TupleDesc_B> recognizer;
    private final double exclusionSeconds;
    private final BoofFeatures scratch = new BoofFeatures();
    private final DogArray<SceneRecognition.Match> matches = new DogArray<>(SceneRecognition.Match::new);
    private int[] sequences = new int[1024];
    private int[] frames = new int[1024];
    private double[] times = new double[1024];
    private int size;

    private BoofRetrieval(FeatureSceneRecognitionNister2006<TupleDesc_B> recognizer, double exclusionSeconds) {
        this.recognizer = recognizer;
        this.exclusionSeconds = exclusionSeconds;
    }

    /**
     * Learns BoofCV's tree and weights.
     *
     * @param set              training descriptors, grouped by image (the images give the node weights)
     * @param branching        children per node
     * @param depth            tree levels below the root
     * @param exclusionSeconds exclusion window, see {@link RetrievalSystem#allowed}
     */
    static BoofRetrieval train(TrainingSet set, int branching, int depth, double exclusionSeconds) {
        ConfigRecognitionNister2006 config = new ConfigRecognitionNister2006();
        config.tree.branchFactor = branching;
        config.tree.maximumLevel = depth;
        FeatureSceneRecognitionNister2006<TupleDesc_B> recognizer = new FeatureSceneRecognitionNister2006<>(config,
                () -> new TupleDesc_B(FrameFeatures.DESCRIPTOR_BITS));
        recognizer.learnModel(images(set));
        return new BoofRetrieval(recognizer, exclusionSeconds);
    }

    private static Iterator<FeatureSceneRecognition.Features<TupleDesc_B>> images(TrainingSet set) {
        BoofFeatures view = new BoofFeatures();
        return new Iterator<>() {
            private int image;

            @Override
            public boolean hasNext() {
                return image < set.imageCount();
            }

            @Override
            public FeatureSceneRecognition.Features<TupleDesc_B> next() {
                if (!hasNext()) {
                    throw new NoSuchElementException("all " + set.imageCount() + " training images were read");
                }
                int first = set.imageStarts()[image];
                int end = image + 1 < set.imageCount() ? set.imageStarts()[image + 1] : set.count();
                image++;
                return view.load(set.descriptors(), first, end - first);
            }
        };
    }

    /** Empties the database, keeping the trained tree and node weights. */
    void clear() {
        recognizer.clearDatabase();
        size = 0;
    }

    @Override
    public String name() {
        return "BoofCV";
    }

    @Override
    public void add(DescriptorFrame frame) {
        if (size == sequences.length) {
            sequences = Arrays.copyOf(sequences, 2 * size);
            frames = Arrays.copyOf(frames, 2 * size);
            times = Arrays.copyOf(times, 2 * size);
        }
        sequences[size] = frame.sequence();
        frames[size] = frame.frame();
        times[size] = frame.timeSeconds();
        recognizer.addImage(Integer.toString(size), scratch.load(frame.descriptors(), 0, frame.count()));
        size++;
    }

    @Override
    public List<Hit> query(DescriptorFrame frame, int limit) {
        recognizer.query(scratch.load(frame.descriptors(), 0, frame.count()), id -> {
            int slot = Integer.parseInt(id);
            return RetrievalSystem.allowed(frame.sequence(), frame.timeSeconds(), sequences[slot], times[slot],
                    exclusionSeconds);
        }, limit, matches);
        List<Hit> hits = new ArrayList<>(matches.size);
        for (int i = 0; i < matches.size; i++) {
            int slot = Integer.parseInt(matches.get(i).id);
            hits.add(new Hit(sequences[slot], frames[slot]));
        }
        return hits;
    }

    /** JOL's walk of the recogniser's object graph (inverted files, image ids, scratch) minus its trained tree. */
    @Override
    public long retainedBytes() {
        return GraphLayout.parseInstance(recognizer).totalSize()
                - GraphLayout.parseInstance(recognizer.getTree()).totalSize();
    }
}
