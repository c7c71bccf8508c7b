package revisit.bench;

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
import boofcv.struct.image.GrayU8;
import revisit.io.ImageFiles;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/**
 * Strict image reading speed ({@link ImageFiles#readGray}) on real 640x480 frames of ../shared/data: a PNG of
 * middlebury/dinoRing (Seitz et al., CVPR 2006) and a JPEG of photos/chair (CC BY 4.0, P. Abeles, BoofCV-Data).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ImageReadBench {

    @Param({"middlebury/dinoRing/dino0001.png", "photos/chair/image000.jpg"})
    public String image;

    private Path file;

    @Setup
    public void locate() {
        file = FrameInputData.file(image);
    }

    @Benchmark
    public GrayU8 readGray() {
        return ImageFiles.readGray(file);
    }

    /** ImageIO's decoding alone (no grey conversion), the path PNG frames took before {@code PngReader}. */
    @Benchmark
    public java.awt.image.BufferedImage decodeWithImageIo() throws java.io.IOException {
        return javax.imageio.ImageIO.read(file.toFile());
    }
}
