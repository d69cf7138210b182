package org.foldbook.io.hdf5;

import org.foldbook.io.RecordingDescriptor;

/**
 * Which dataset of an HDF5 file is the recording, and what the file may not say.
 *
 * @param datasetPath  absolute path such as "/daq/voltages"; null = the only numeric 1-D/2-D dataset
 * @param channelAxis  for 2-D datasets, the dimension that indexes channels (0 or 1); -1 = the
 *                     dataset's {@code channel_axis} attribute, else 1 (one row per frame)
 * @param sampleRate   samples per second; NaN = from the attributes {@code sample_rate} or
 *                     {@code sample_interval} (seconds)
 */
public record Hdf5Selection(String datasetPath, int channelAxis, double sampleRate) implements RecordingDescriptor {
    public static final Hdf5Selection DETECT = new Hdf5Selection(null, -1, Double.NaN);

    public Hdf5Selection {
        if (channelAxis < -1 || channelAxis > 1) {
            throw new IllegalArgumentException("channelAxis: " + channelAxis + " is not -1, 0 or 1");
        }
        if (!Double.isNaN(sampleRate) && !(sampleRate > 0 && Double.isFinite(sampleRate))) {
            throw new IllegalArgumentException("sampleRate: " + sampleRate + " is not a positive finite rate");
        }
        if (datasetPath != null && !datasetPath.startsWith("/")) {
            throw new IllegalArgumentException("datasetPath: '" + datasetPath + "' is not an absolute path");
        }
    }

    public static Hdf5Selection dataset(String path) {
        return new Hdf5Selection(path, -1, Double.NaN);
    }
}
