package org.foldbook.io.wav;

import org.foldbook.io.SampleType;

/**
 * What the header chunks of a WAV / RF64 file declare.
 *
 * @param rf64          true for RF64/BW64 (sizes from the ds64 chunk)
 * @param formatTag     wFormatTag of the fmt chunk (1 PCM, 3 IEEE float, 0xFFFE extensible)
 * @param sampleFormat  the effective code: formatTag, or the sub-format of an extensible fmt chunk
 * @param validBits     bits per sample that carry signal (the container may be wider)
 * @param channelMask   speaker-position mask of an extensible fmt chunk, else 0
 * @param dataOffset    file offset of the first sample byte
 * @param dataSize      bytes of sample data
 */
public record WavLayout(boolean rf64, int formatTag, int sampleFormat, int channels, long sampleRate,
        int blockAlign, int validBits, long channelMask, SampleType sampleType, long dataOffset, long dataSize) {

    public long frameCount() {
        return dataSize / blockAlign;
    }
}
