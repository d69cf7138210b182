package org.foldbook.io;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * What a reader found in a recording before any sample is read.
 *
 * @param sampleRate  samples per second per channel; from the header, the descriptor, or the nominal
 *                    interval of the time column
 * @param frameCount  number of frames (one sample of every channel)
 * @param sampleType  storage type of the samples in the file
 * @param scaling     how stored values become the doubles returned, e.g. "x / 32768 (fraction of full scale)"
 * @param timing      present when the file carries time stamps (delimited text)
 * @param missingValues number of missing cells returned as NaN (delimited text), else 0
 */
public record RecordingInfo(Path file, RecordingFormat format, List<ChannelInfo> channels, double sampleRate,
        long frameCount, SampleType sampleType, String scaling, Optional<TimingReport> timing,
        long missingValues) {

    public RecordingInfo {
        channels = List.copyOf(channels);
    }

    public int channelCount() {
        return channels.size();
    }

    /** Duration in seconds: frameCount / sampleRate. */
    public double durationSeconds() {
        return frameCount / sampleRate;
    }
}
