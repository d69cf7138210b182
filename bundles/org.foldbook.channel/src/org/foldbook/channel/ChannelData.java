package org.foldbook.channel;

import java.nio.file.Path;

/**
 * One channel of a recording, read whole into memory for the sweep.
 *
 * @param file            the recording file read
 * @param samples         the channel's samples, in the file's own scaling (full-scale fractions for PCM)
 * @param rateHz          samples per second, from the file (or the notebook where the file has none)
 * @param sha256          SHA-256 of the file as read now, 64 lower-case hex digits
 * @param checksumChanged true when it differs from the one the notebook logged (read with acceptChanged)
 * @param unit            the channel's unit as the file states it, empty when it states none
 */
public record ChannelData(Path file, double[] samples, double rateHz, String sha256, boolean checksumChanged,
        String unit) {
}
