package org.foldbook.dsp.filter;

import org.foldbook.dsp.Check;

/**
 * A camera's exposure as a filter: each frame integrates the scene over the exposure time T, a
 * box-car in time, so |H(f)| = |sin(πfT)/(πfT)| (common practice). Nulls at f = k/T; the first
 * sidelobe is about 13 dB down, so exposure alone is a poor anti-alias filter.
 */
public final class ExposureBoxcar implements FrequencyResponse {

    /** At most this many lobes are reported as landmarks. */
    public static final int MAX_LANDMARK_LOBES = 100_000;

    private final double exposureSeconds;

    public ExposureBoxcar(double exposureSeconds) {
        this.exposureSeconds = Check.positive("exposureSeconds", exposureSeconds);
    }

    /** Exposure from a shutter angle (degrees of the frame period, 360 = the whole frame) at a frame rate. */
    public static ExposureBoxcar ofShutterAngle(double shutterAngleDeg, double frameRateHz) {
        Check.inRange("shutterAngleDeg", Check.positive("shutterAngleDeg", shutterAngleDeg), 0, 360);
        Check.positive("frameRateHz", frameRateHz);
        return new ExposureBoxcar(shutterAngleDeg / 360.0 / frameRateHz);
    }

    public double exposureSeconds() {
        return exposureSeconds;
    }

    @Override
    public double magnitude(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double x = Math.PI * frequencyHz * exposureSeconds;
        if (x == 0) {
            return 1;
        }
        if (Math.abs(frequencyHz * exposureSeconds - Math.rint(frequencyHz * exposureSeconds)) == 0) {
            return 0; // exact null (sin(π·k) is not exactly 0 in floating point)
        }
        return Math.abs(Math.sin(x) / x);
    }

    @Override
    public double[] landmarksHz(double upToHz) {
        long lobes = (long) Math.min(MAX_LANDMARK_LOBES, Math.floor(upToHz * exposureSeconds) + 1);
        double[] out = new double[(int) (2 * lobes)];
        for (int k = 0; k < lobes; k++) {
            out[2 * k] = (k + 1) / exposureSeconds; // null
            out[2 * k + 1] = (k + 0.5) / exposureSeconds; // near a lobe peak
        }
        return java.util.Arrays.stream(out).filter(f -> f <= upToHz).sorted().toArray();
    }

    @Override
    public String toString() {
        return "exposure box-car T = " + exposureSeconds + " s";
    }
}
