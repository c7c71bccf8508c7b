package revisit.io;

import org.jcodec.common.model.ColorSpace;
import org.jcodec.common.model.Picture;
import org.jcodec.common.model.Rect;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Display ordering, luma copying and profile reading, on pictures and bytes built by hand. */
class DisplayOrderTest {

    /** A 4:2:0 picture whose luma samples all hold {@code value}, stored as jcodec does ({@code value - 128}). */
    private static Picture flat(int value) {
        Picture picture = Picture.create(4, 2, ColorSpace.YUV420);
        Arrays.fill(picture.getPlaneData(0), (byte) (value - 128));
        return picture;
    }

    @Test
    void framesAddedInDecodeOrderAreReleasedInTimeOrder() {
        // decode order of an IBBP stream, times as jcodec reports them for the shared test videos
        double[] decodeOrder = {0.000, 0.100, 0.067, 0.033, 0.200, 0.167, 0.133};
        DisplayOrder order = new DisplayOrder();
        for (double t : decodeOrder) {
            order.add(t, flat((int) Math.round(t * 1000)));
        }
        assertFalse(order.ready(), "fewer than DEPTH + 1 frames held and the stream has not ended");
        order.endOfStream();
        List<Double> times = new ArrayList<>();
        for (Optional<DisplayOrder.Decoded> d = order.poll(); d.isPresent(); d = order.poll()) {
            DisplayOrder.Image image = assertInstanceOf(DisplayOrder.Image.class, d.get());
            assertEquals((int) Math.round(image.timeSeconds() * 1000), image.image().get(0, 0));
            times.add(image.timeSeconds());
        }
        assertEquals(List.of(0.000, 0.033, 0.067, 0.100, 0.133, 0.167, 0.200), times);
    }

    @Test
    void releasesOnlyOnceMoreThanDepthFramesAreHeld() {
        DisplayOrder order = new DisplayOrder();
        for (int i = 0; i < DisplayOrder.DEPTH; i++) {
            order.add(DisplayOrder.DEPTH - i, flat(i));
        }
        assertFalse(order.ready());
        order.add(100.0, flat(0));
        assertTrue(order.ready());
        assertEquals(1.0, order.poll().orElseThrow().timeSeconds());
    }

    @Test
    void frameOlderThanOneAlreadyReleasedBecomesFailure() {
        DisplayOrder order = new DisplayOrder();
        order.add(1.0, flat(1));
        order.endOfStream();
        order.poll();
        order.add(0.5, flat(2));
        DisplayOrder.Failure failure = assertInstanceOf(DisplayOrder.Failure.class, order.poll().orElseThrow());
        assertTrue(failure.reason().contains("not after"), failure.reason());
    }

    @Test
    void lumaCopyUndoesTheSignedShiftAndAppliesTheCrop() {
        // 8x4 coded picture, visible 4x2 starting at column 2, row 2; sample at (x, y) holds 40 * y + x
        Picture picture = Picture.createCropped(8, 4, ColorSpace.YUV420, new Rect(2, 2, 4, 2));
        byte[] luma = picture.getPlaneData(0);
        for (int y = 0; y < 4; y++) {
            for (int x = 0; x < 8; x++) {
                luma[y * 8 + x] = (byte) (40 * y + x - 128);
            }
        }
        boofcv.struct.image.GrayU8 out = new boofcv.struct.image.GrayU8(1, 1);
        LumaPlane.copy(picture, out);
        assertEquals(4, out.width);
        assertEquals(2, out.height);
        assertArrayEquals(new int[]{82, 83, 84, 85, 122, 123, 124, 125}, ImageFilesTest.values(out));
    }

    @Test
    void profileIsTheByteAfterTheFirstSequenceParameterSetHeader() {
        // ITU-T H.264 Table 7-1: nal_unit_type 7 = sequence parameter set, 8 = picture parameter set;
        // 7.3.2.1.1: profile_idc is the first byte of the SPS payload
        byte[] ppsThenSps = {0, 0, 0, 1, 0x68, (byte) 0xEE, 0x3C, (byte) 0x80, 0, 0, 0, 1, 0x67, (byte) 244, 0, 30};
        assertEquals(OptionalInt.of(244), H264Profile.of(java.nio.ByteBuffer.wrap(ppsThenSps)));
        byte[] high = {0, 0, 0, 1, 0x67, 100, 0, 31, 0, 0, 0, 1, 0x68, (byte) 0xEB};
        assertEquals(OptionalInt.of(100), H264Profile.of(java.nio.ByteBuffer.wrap(high)));
        byte[] onlyPps = {0, 0, 0, 1, 0x68, (byte) 0xEB, (byte) 0xE3};
        assertEquals(OptionalInt.empty(), H264Profile.of(java.nio.ByteBuffer.wrap(onlyPps)));
        assertEquals("244 (High 4:4:4 Predictive)", H264Profile.name(244));
    }
}
