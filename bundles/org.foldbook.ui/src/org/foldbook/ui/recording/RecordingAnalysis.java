package org.foldbook.ui.recording;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.foldbook.channel.ChannelDataException;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ChannelScan;
import org.foldbook.channel.ReadProgress;
import org.foldbook.dsp.peaks.PeakFinder;
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.spectrum.PsdScaling;
import org.foldbook.dsp.spectrum.Unit;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.dsp.spectrum.WelchAccumulator;
import org.foldbook.io.RecordingInfo;
import org.foldbook.model.Channel;
import org.foldbook.ui.preferences.SpectrumSettingsValues;

/**
 * One streamed pass over a channel's recording (through {@link ChannelScan}, so memory stays bounded
 * for files larger than memory): the min/max envelope in {@value #COLUMNS} columns and a Welch power
 * spectrum (periodic Hann, half overlap, mean removed per segment), then its peaks. Free of SWT; the
 * workbench runs it in {@link ReadRecordingJob}.
 */
public final class RecordingAnalysis {
    /** Envelope columns: about one per pixel of a wide chart. */
    public static final int COLUMNS = 2000;
    /** Peaks listed at most, strongest first. */
    static final int MAX_PEAKS = 16;
    private static final int MIN_SEGMENT = SpectrumSettingsValues.MIN_SEGMENT;

    private RecordingAnalysis() {
    }

    /** Segment length: a power of two giving at least 4 segments, between 256 and {@code longest} samples. */
    static int segmentLength(long frames, int longest) {
        int n = longest;
        while (n > MIN_SEGMENT && n * 4L > frames) {
            n /= 2;
        }
        return n;
    }

    /** One pass with the spectrum and peak {@code settings} (the workbench's preferences). */
    public static RecordingOverview run(Channel channel, ChannelReader.ReadRequest request,
            SpectrumSettingsValues settings, ReadProgress progress) throws ChannelDataException {
        PhysicalScale scale = PhysicalScale.of(channel);
        Reducers reducers = new Reducers(settings);
        ChannelScan.Scan scan = ChannelScan.scan(channel, request, reducers, progress);
        if (reducers.welch.segments() == 0) {
            throw new ChannelDataException(scan.file(), "holds " + scan.frames()
                    + " samples, fewer than one spectrum segment of " + segmentLength(scan.frames(), settings.recordingMaxSegment()));
        }
        var spectrum = reducers.welch.finish(Unit.FULL_SCALE);
        List<SpectralPeak> peaks = new ArrayList<>(reducers.finder.find(spectrum));
        peaks.sort(Comparator.comparingDouble(SpectralPeak::levelDb).reversed());
        if (peaks.size() > MAX_PEAKS) {
            peaks = new ArrayList<>(peaks.subList(0, MAX_PEAKS));
        }
        peaks.sort(Comparator.comparingDouble(SpectralPeak::frequencyHz));
        return new RecordingOverview(channel.getName(), scan.file(), scan.rateHz(), scan.frames(), scan.sha256(),
                scan.checksumChanged(), reducers.envelope, spectrum, peaks, scale, settings);
    }

    /** The envelope and Welch accumulator, created when the file's length and rate are known. */
    private static final class Reducers implements ChannelScan.Sink {
        final SpectrumSettingsValues settings;
        MinMaxEnvelope envelope;
        WelchAccumulator welch;
        PeakFinder finder;

        Reducers(SpectrumSettingsValues settings) {
            this.settings = settings;
        }

        @Override
        public void start(RecordingInfo info) {
            envelope = new MinMaxEnvelope(info.frameCount(), COLUMNS);
            Welch w = Welch.builder(segmentLength(info.frameCount(), settings.recordingMaxSegment()))
                    .scaling(PsdScaling.SPECTRUM).build();
            welch = new WelchAccumulator(w, info.sampleRate());
            // 10 dB prominent (as the sweep) and, noise-aware, the preferences' margin over their running
            // median (default 12 dB over 63 bins, see PeakThreshold); the Hann kernel corrects the level between bins
            PeakFinder.Builder b = PeakFinder.builder().prominenceDb(10).minSeparationBins(3).windowKernel(w.window());
            if (settings.noiseAware()) {
                b.noiseFloor(settings.floorBins(), settings.marginDb());
            }
            finder = b.build();
        }

        @Override
        public void accept(double[] samples, int count) {
            envelope.add(samples, count);
            welch.add(samples, 0, count);
        }
    }
}
