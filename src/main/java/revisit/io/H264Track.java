package revisit.io;

import org.jcodec.api.specific.AVCMP4Adaptor;
import org.jcodec.codecs.h264.H264Utils;
import org.jcodec.codecs.h264.mp4.AvcCBox;
import org.jcodec.common.Codec;
import org.jcodec.common.DemuxerTrack;
import org.jcodec.common.DemuxerTrackMeta;
import org.jcodec.common.io.FileChannelWrapper;
import org.jcodec.common.io.NIOUtils;
import org.jcodec.common.model.Picture;
import org.jcodec.containers.mp4.MP4Packet;
import org.jcodec.containers.mp4.boxes.VideoSampleEntry;
import org.jcodec.containers.mp4.demuxer.MP4Demuxer;
import org.jcodec.containers.mp4.demuxer.MP4DemuxerTrack;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalInt;

/**
 * The H.264 video track of an MP4/MOV file, demuxed and decoded by jcodec one packet at a time in decode order.
 * Packets are converted from MP4 length-prefixed form to Annex B here rather than inside jcodec's demuxer, so a
 * packet with corrupt data becomes one failed frame (with its time) instead of stalling the track.
 */
final class H264Track implements AutoCloseable {

    /** H.264 profile_idc values jcodec 0.2.5 decodes: 66 Baseline, 77 Main, 100 High (ITU-T H.264 Annex A). */
    private static final int[] SUPPORTED_PROFILES = {66, 77, 100};
    /** How to make an unsupported video usable; part of error messages. */
    static final String CONVERT = "re-encode it as H.264 High 4:2:0, e.g. 'ffmpeg -i IN -pix_fmt yuv420p "
            + "-c:v libx264 OUT.mp4', or extract the frames to a folder";

    private final Path file;
    private final FileChannelWrapper channel;
    private final MP4DemuxerTrack track;
    private final DemuxerTrackMeta meta;
    private final AvcCBox avcC;
    private final ByteBuffer parameterSets;
    private final AVCMP4Adaptor decoder;
    private final byte[][] decodeBuffer;
    private int packetsRead;

    private H264Track(Path file, FileChannelWrapper channel, MP4DemuxerTrack track) {
        this.file = file;
        this.channel = channel;
        this.track = track;
        this.meta = track.getMeta();
        this.avcC = H264Utils.parseAVCC((VideoSampleEntry) track.getSampleEntries()[0]);
        this.parameterSets = meta.getCodecPrivate();
        this.decoder = new AVCMP4Adaptor(meta);
        this.decodeBuffer = decoder.allocatePicture();
    }

    /**
     * Opens the video track of {@code file} and checks that its codec and profile are decodable.
     *
     * @throws BadInputException when the file is not an MP4/MOV with a decodable H.264 track
     */
    static H264Track open(Path file) {
        FileChannelWrapper channel = null;
        try {
            channel = NIOUtils.readableChannel(file.toFile());
            DemuxerTrack any = MP4Demuxer.createRawMP4Demuxer(channel).getVideoTrack();
            if (!(any instanceof MP4DemuxerTrack track)) {
                throw new BadInputException(file + ": no video track in the file; give a video with pictures");
            }
            checkCodec(file, track.getMeta());
            return new H264Track(file, channel, track);
        } catch (BadInputException e) {
            closeAfterFailure(channel, e);
            throw e;
        } catch (IOException | RuntimeException e) {
            BadInputException bad = new BadInputException(file + ": not a readable MP4/MOV video ("
                    + ImageFiles.oneLine(e) + "); the file is truncated, damaged or not a video: re-copy it, or "
                    + CONVERT, e);
            closeAfterFailure(channel, bad);
            throw bad;
        }
    }

    private static void checkCodec(Path file, DemuxerTrackMeta meta) {
        if (meta.getCodec() != Codec.H264) {
            throw new BadInputException(file + ": video codec " + meta.getCodec() + " is not supported (only "
                    + "H.264); " + CONVERT);
        }
        OptionalInt profile = H264Profile.of(meta.getCodecPrivate());
        if (profile.isEmpty()) {
            throw new BadInputException(file + ": no H.264 sequence parameter set in the video track; " + CONVERT);
        }
        for (int supported : SUPPORTED_PROFILES) {
            if (profile.getAsInt() == supported) {
                return;
            }
        }
        throw new BadInputException(file + ": H.264 profile " + H264Profile.name(profile.getAsInt()) + " is not "
                + "supported by the built-in decoder (only Baseline, Main and High 8-bit 4:2:0); " + CONVERT);
    }

    /** Number of frames (samples) the container lists. */
    int totalFrames() {
        return meta.getTotalFrames();
    }

    /** Duration the container gives, seconds. */
    double durationSeconds() {
        return meta.getTotalDuration();
    }

    /**
     * Reads and decodes the next packet into {@code order}: a decoded frame, or a failure at the packet's time.
     *
     * @return false at the end of the track (then {@code order} is told so)
     * @throws IOException       when the file cannot be read
     * @throws BadInputException when the track ends before all listed frames were read (truncated file)
     */
    boolean decodeNext(DisplayOrder order) throws IOException {
        MP4Packet packet = track.nextFrame();
        if (packet == null) {
            order.endOfStream();
            if (packetsRead < totalFrames()) {
                throw new BadInputException(file + ": video data ends after " + packetsRead + " of "
                        + totalFrames() + " frames; the file is truncated: re-copy it");
            }
            return false;
        }
        packetsRead++;
        double time = packet.getPtsD();
        try {
            Picture picture = decoder.decodeFrame(MP4Packet.createMP4PacketWithData(packet, annexB(packet)),
                    decodeBuffer);
            if (picture == null) {
                order.addFailure(time, "the decoder returned no picture");
            } else {
                order.add(time, picture);
            }
        } catch (RuntimeException e) {
            order.addFailure(time, ImageFiles.oneLine(e));
        }
        return true;
    }

    /** Converts an MP4 packet to Annex B, putting the parameter sets before IDR pictures as the decoder wants. */
    private ByteBuffer annexB(MP4Packet packet) {
        ByteBuffer coded = H264Utils.decodeMOVPacket(packet.getData(), avcC);
        if (parameterSets != null && H264Utils.isByteBufferIDRSlice(coded)) {
            return NIOUtils.combineBuffers(List.of(parameterSets.duplicate(), coded));
        }
        return coded;
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }

    private static void closeAfterFailure(FileChannelWrapper channel, BadInputException failure) {
        if (channel == null) {
            return;
        }
        try {
            channel.close();
        } catch (IOException e) {
            failure.addSuppressed(e);
        }
    }
}
