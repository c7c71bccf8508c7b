package revisit.io;

import org.jcodec.codecs.h264.H264Utils;

import java.nio.ByteBuffer;
import java.util.OptionalInt;

/**
 * Reads the profile of an H.264 stream from its sequence parameter set: the byte after the header of the first
 * NAL unit of type 7 is profile_idc (ITU-T H.264, 7.3.2.1.1). Profile numbers and names follow Annex A.
 */
final class H264Profile {

    private static final int SPS_NAL_TYPE = 7;

    private H264Profile() {
    }

    /**
     * @param codecPrivate the track's parameter sets in Annex B form (start codes), as jcodec's demuxer gives
     * @return profile_idc of the first sequence parameter set, empty when there is none
     */
    static OptionalInt of(ByteBuffer codecPrivate) {
        if (codecPrivate == null) {
            return OptionalInt.empty();
        }
        ByteBuffer all = codecPrivate.duplicate();
        ByteBuffer nal;
        while ((nal = H264Utils.nextNALUnit(all)) != null) {
            if (nal.remaining() >= 2 && (nal.get(nal.position()) & 0x1F) == SPS_NAL_TYPE) {
                return OptionalInt.of(nal.get(nal.position() + 1) & 0xFF);
            }
        }
        return OptionalInt.empty();
    }

    /** Number and Annex A name of a profile, e.g. "244 (High 4:4:4 Predictive)". */
    static String name(int profileIdc) {
        String name = switch (profileIdc) {
            case 44 -> "CAVLC 4:4:4 Intra";
            case 66 -> "Baseline";
            case 77 -> "Main";
            case 88 -> "Extended";
            case 100 -> "High";
            case 110 -> "High 10";
            case 122 -> "High 4:2:2";
            case 244 -> "High 4:4:4 Predictive";
            default -> "not an Annex A profile";
        };
        return profileIdc + " (" + name + ")";
    }
}
