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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import revisit.io.Frame;
import revisit.io.FrameSource;
import revisit.io.FrameSources;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * Video decoding speed in frames per second (JMH throughput, one operation = one frame) on a video of
 * ../shared/data/video (CC BY-SA 4.0, P. Abeles, BoofCV-Data), cycling through the whole video so that opening
 * the file is spread over all its frames.
 * <ul>
 *   <li>{@code lumaPlane}: Revisit's path (jcodec decode, display-order buffer, luma plane copied to a GrayU8).</li>
 *   <li>{@code rgbThenGrey}: jcodec's FrameGrab + AWTUtil to an RGB BufferedImage, then BoofCV's conversion to
 *       grey, the usual alternative (frames in decode order, no reordering).</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 4, time = 5)
@Measurement(iterations = 5, time = 5)
@Fork(1)
public class VideoDecodeBench {

    @Param({"parking_lot_scan.mp4"})
    public String video;

    private Path file;
    private FrameSource source;
    private FileChannelWrapper channel;
    private FrameGrab grab;

    @Setup
    public void open() throws Exception {
        file = FrameInputData.file("video/" + video);
        source = FrameSources.open(file, 30.0);
        channel = NIOUtils.readableChannel(file.toFile());
        grab = FrameGrab.createFrameGrab(channel);
    }

    @TearDown
    public void close() throws Exception {
        source.close();
        channel.close();
    }

    @Benchmark
    public GrayU8 lumaPlane() {
        Optional<Frame> frame = source.next();
        if (frame.isEmpty()) {
            source.close();
            source = FrameSources.open(file, 30.0);
            frame = source.next();
        }
        return frame.orElseThrow().image();
    }

    @Benchmark
    public GrayU8 rgbThenGrey() throws Exception {
        Picture picture = grab.getNativeFrame();
        if (picture == null) {
            channel.close();
            channel = NIOUtils.readableChannel(file.toFile());
            grab = FrameGrab.createFrameGrab(channel);
            picture = grab.getNativeFrame();
        }
        return ConvertBufferedImage.convertFrom(AWTUtil.toBufferedImage(picture), (GrayU8) null);
    }
}
