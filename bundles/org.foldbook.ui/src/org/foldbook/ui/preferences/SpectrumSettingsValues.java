package org.foldbook.ui.preferences;

import java.util.Locale;

import org.foldbook.dsp.NumberText;
import org.foldbook.sweep.PeakThreshold;

/**
 * The workbench's spectrum and peak preferences as one immutable value: the peak rule (noise-aware or
 * prominence only, the margin over the running floor, the running median's width) used by the Recording
 * view, the Rate sweep part and its what-if rate, and the Recording view's longest Welch segment. The
 * window (periodic Hann) and the overlap (half) are fixed everywhere; the sweep's segment length is the
 * channel's sweep plan's.
 *
 * @param noiseAware          true: peaks stand {@code marginDb} over the running floor; false: prominence only
 * @param marginDb            dB over the running median, &gt;= 0
 * @param floorBins           running-median width in bins, odd, &gt;= 3
 * @param recordingMaxSegment the Recording view's longest Welch segment, a power of two 256..65536
 */
public record SpectrumSettingsValues(boolean noiseAware, double marginDb, int floorBins, int recordingMaxSegment) {

    public static final int MIN_SEGMENT = 256;
    public static final int MAX_SEGMENT = 65536;
    /** The sweep's default rule (12 dB over a 63-bin running median) and 16384-sample segments. */
    public static final SpectrumSettingsValues DEFAULT = new SpectrumSettingsValues(true,
            PeakThreshold.DEFAULT.marginDb(), PeakThreshold.DEFAULT.floorWindowBins(), 16384);

    public SpectrumSettingsValues {
        if (!(marginDb >= 0) || marginDb > 200) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "The peak margin must be between 0 and 200 dB, was %s dB.", fmt(marginDb)));
        }
        if (floorBins < 3 || floorBins > 4095 || (floorBins & 1) == 0) {
            throw new IllegalArgumentException("The running median's width must be an odd number of bins from 3"
                    + " to 4095 (a middle bin and as many on each side), was " + floorBins + ".");
        }
        if (recordingMaxSegment < MIN_SEGMENT || recordingMaxSegment > MAX_SEGMENT
                || Integer.bitCount(recordingMaxSegment) != 1) {
            throw new IllegalArgumentException("The Recording view's longest segment must be a power of two from "
                    + MIN_SEGMENT + " to " + MAX_SEGMENT + " samples (256, 512, 1024 …), was " + recordingMaxSegment
                    + ".");
        }
    }

    /**
     * The values typed by a person, through the project's one number parser; the exception's message names
     * the field and the problem in words.
     */
    public static SpectrumSettingsValues parse(boolean noiseAware, String margin, String floorBins, String segment) {
        double m = NumberText.finite("peak margin in dB", margin);
        int w = NumberText.atLeast("running median's width in bins", floorBins, 3);
        int s = NumberText.atLeast("Recording view's longest segment in samples", segment, MIN_SEGMENT);
        return new SpectrumSettingsValues(noiseAware, m, w, s);
    }

    /** The sweep's peak rule (the digitizer's step is not a preference: it belongs to the chain). */
    public PeakThreshold threshold() {
        return new PeakThreshold(noiseAware, marginDb, floorBins, 0);
    }

    /** The peak rule in words, as the sweep states it in its results. */
    public String describe() {
        return threshold().describe();
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
