package org.foldbook.channel;

import java.nio.file.Path;

import org.foldbook.io.SampleType;

/**
 * What a streamed read of one channel found ({@link ChannelReader#stream}): the file's own figures, so a
 * caller can compare them with the notebook's instead of stopping at the first disagreement.
 *
 * @param file          the recording file read
 * @param rateHz        samples per second the file states
 * @param channelCount  channels the file holds
 * @param frames        frames delivered
 * @param sampleType    how the file stores a sample
 * @param sha256        SHA-256 of the file as read now, lower-case hex
 * @param loggedSha256  the checksum the notebook logged, empty when none
 * @param unit          the channel's unit as the file states it ("FS" for PCM: fractions of full scale)
 */
public record ChannelStream(Path file, double rateHz, int channelCount, long frames, SampleType sampleType,
        String sha256, String loggedSha256, String unit) {

    /** True when a checksum was logged and the file's differs. */
    public boolean checksumChanged() {
        return !loggedSha256.isBlank() && !loggedSha256.equalsIgnoreCase(sha256);
    }

    /** Receives the channel's samples block by block, in order; the array is reused after the call. */
    @FunctionalInterface
    public interface BlockSink {
        void accept(double[] samples, int count);
    }
}
