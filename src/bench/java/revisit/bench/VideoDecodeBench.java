package revisit.bench;

import boofcv.io.image.ConvertBufferedImage;
import boofcv.struct.image.GrayU8;
import org.jcodec.api.FrameGrab;
import org.jcodec.common.io.FileChannelWrapper;
import org.jcodec.common.io.NIOUtils;
import org.jcodec.common.model.Picture;
import org.jcodec.scale.AWTUtil;
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
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import revisit.io.Frame;
import revisit.io.FrameSource;
import revisit.io.FrameSourceOptions;
import revisit.io.FrameSources;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * Video decoding speed: open a video of ../shared/data/video (CC BY-SA 4.0, P. Abeles, BoofCV-Data) and decode its
 * first {@link #FRAMES} frames to grey. Frames per second = FRAMES / (ms per operation / 1000).
 * <ul>
 *   <li>{@code lumaPlane}: Revisit's path (jcodec decode, luma plane copied straight to a GrayU8).</li>
 *   <li>{@code rgbThenGrey}: jcodec's FrameGrab + AWTUtil to an RGB BufferedImage, then BoofCV's conversion to
 *       grey, the usual alternative.</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class VideoDecodeBench {

    /** Frames decoded per operation. */
    static final int FRAMES = 60;

    @Param({"parking_lot_scan.mp4"})
    public String video;

    private Path file;

    @Setup
    public void locate() {
        file = SharedData.file("video/" + video);
    }

    @Benchmark
    public int lumaPlane(Blackhole blackhole) {
        int count = 0;
        try (FrameSource source = FrameSources.open(file, FrameSourceOptions.defaults().withMaxFrames(FRAMES))) {
            for (Optional<Frame> f = source.next(); f.isPresent(); f = source.next()) {
                blackhole.consume(f.get().image());
                count++;
            }
        }
        return count;
    }

    @Benchmark
    public int rgbThenGrey(Blackhole blackhole) throws Exception {
        int count = 0;
        try (FileChannelWrapper channel = NIOUtils.readableChannel(file.toFile())) {
            FrameGrab grab = FrameGrab.createFrameGrab(channel);
            Picture picture;
            while (count < FRAMES && (picture = grab.getNativeFrame()) != null) {
                GrayU8 gray = ConvertBufferedImage.convertFrom(AWTUtil.toBufferedImage(picture), (GrayU8) null);
                blackhole.consume(gray);
                count++;
            }
        }
        return count;
    }
}
