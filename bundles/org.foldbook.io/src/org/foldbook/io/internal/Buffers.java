package org.foldbook.io.internal;

/** Argument checks for the caller-supplied sample buffers. */
public final class Buffers {
    private Buffers() {
    }

    public static void checkChannels(double[][] channels, int offset, int maxFrames, int channelCount) {
        if (channels == null) {
            throw new IllegalArgumentException("channels: null");
        }
        if (channels.length != channelCount) {
            throw new IllegalArgumentException("channels: " + channels.length + " arrays given, recording has "
                    + channelCount + " channels");
        }
        checkRange(offset, maxFrames);
        for (int c = 0; c < channelCount; c++) {
            if (channels[c] == null || channels[c].length - (long) offset < maxFrames) {
                throw new IllegalArgumentException("channels[" + c + "]: "
                        + (channels[c] == null ? "null" : "length " + channels[c].length)
                        + " has no room for " + maxFrames + " frames at offset " + offset);
            }
        }
    }

    public static void checkInterleaved(double[] interleaved, int offset, int maxFrames, int channelCount) {
        if (interleaved == null) {
            throw new IllegalArgumentException("interleaved: null");
        }
        checkRange(offset, maxFrames);
        if (interleaved.length - (long) offset < (long) maxFrames * channelCount) {
            throw new IllegalArgumentException("interleaved: length " + interleaved.length + " has no room for "
                    + maxFrames + " frames of " + channelCount + " channels at offset " + offset);
        }
    }

    private static void checkRange(int offset, int maxFrames) {
        if (offset < 0) {
            throw new IllegalArgumentException("offset: " + offset + " is negative");
        }
        if (maxFrames < 0) {
            throw new IllegalArgumentException("maxFrames: " + maxFrames + " is negative");
        }
    }
}
