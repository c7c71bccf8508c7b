package revisit.bench;

import boofcv.struct.image.GrayU8;
import java.util.concurrent.TimeUnit;
import org.opencv.core.Core;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.core.MatOfKeyPoint;
import org.opencv.features2d.ORB;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.ImageFiles;

/**
 * ORB-style extraction of 1000 features from one 640x480 frame: ours on one thread, ours on two threads (two frames
 * at once, one extractor per thread; time is per frame per thread), and OpenCV's ORB (org.openpnp:opencv 4.9.0,
 * 1000 features, its defaults otherwise, {@code Core.setNumThreads(1)}) on the same pixels, one and two at once.
 * Frames (../shared/data): photos/chair/image000.jpg (640x480, CC BY 4.0, P. Abeles, BoofCV-Data) and the centre
 * 640x480 of photos/pixabay/car01.jpg and stairs01.jpg (CC0, pixabay), from sparse to dense texture.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FeatureExtractionBench {

    /** The frame, shared by all threads (read only). */
    @State(Scope.Benchmark)
    public static class Frame {
        @Param({"photos/chair/image000.jpg", "photos/pixabay/car01.jpg", "photos/pixabay/stairs01.jpg"})
        public String image;

        GrayU8 gray;
        Mat mat;

        @Setup
        public void load() {
            GrayU8 full = ImageFiles.readGray(FrameInputData.file(image));
            int x0 = (full.width - 640) / 2;
            int y0 = (full.height - 480) / 2;
            gray = full.subimage(x0, y0, x0 + 640, y0 + 480).clone();
            nu.pattern.OpenCV.loadLocally();
            Core.setNumThreads(1);
            mat = new Mat(480, 640, CvType.CV_8UC1);
            mat.put(0, 0, gray.data);
        }
    }

    /** One extractor per thread, as the API requires. */
    @State(Scope.Thread)
    public static class Ours {
        FeatureExtractor extractor;

        @Setup
        public void create() {
            extractor = new FeatureExtractor(FeatureConfig.defaults());
        }
    }

    /** One OpenCV ORB per thread. */
    @State(Scope.Thread)
    public static class Reference {
        ORB orb;
        MatOfKeyPoint keypoints;
        Mat descriptors;
        Mat noMask;

        @Setup
        public void create() {
            nu.pattern.OpenCV.loadLocally();
            orb = ORB.create(1000);
            keypoints = new MatOfKeyPoint();
            descriptors = new Mat();
            noMask = new Mat();
        }
    }

    /** Also counts thread CPU time ({@link CpuTimeCounters}: cpuNanos / items = CPU nanoseconds per frame). */
    @Benchmark
    public FrameFeatures ours(Frame frame, Ours ours, CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        FrameFeatures features = ours.extractor.extract(frame.gray);
        cpu.add(start, 1);
        return features;
    }

    @Benchmark
    @Threads(2)
    public FrameFeatures oursTwoFramesAtOnce(Frame frame, Ours ours) {
        return ours.extractor.extract(frame.gray);
    }

    /** Also counts thread CPU time, as {@link #ours}; OpenCV runs on the calling thread. */
    @Benchmark
    public Mat openCvOrb(Frame frame, Reference ref, CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        ref.orb.detectAndCompute(frame.mat, ref.noMask, ref.keypoints, ref.descriptors);
        cpu.add(start, 1);
        return ref.descriptors;
    }

    @Benchmark
    @Threads(2)
    public Mat openCvOrbTwoFramesAtOnce(Frame frame, Reference ref) {
        ref.orb.detectAndCompute(frame.mat, ref.noMask, ref.keypoints, ref.descriptors);
        return ref.descriptors;
    }
}
