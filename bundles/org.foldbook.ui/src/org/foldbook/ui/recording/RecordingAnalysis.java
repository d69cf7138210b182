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
    private static final int MAX_SEGMENT = 16384;
    private static final int MIN_SEGMENT = 256;

    private RecordingAnalysis() {
    }

    /** Segment length: a power of two giving at least 4 segments, between 256 and 16384 samples. */
    static int segmentLength(long frames) {
        int n = MAX_SEGMENT;
        while (n > MIN_SEGMENT && n * 4L > frames) {
            n /= 2;
        }
        return n;
    }

    public static RecordingOverview run(Channel channel, ChannelReader.ReadRequest request, ReadProgress progress)
            throws ChannelDataException {
        PhysicalScale scale = PhysicalScale.of(channel);
        Reducers reducers = new Reducers();
        ChannelScan.Scan scan = ChannelScan.scan(channel, request, reducers, progress);
        if (reducers.welch.segments() == 0) {
            throw new ChannelDataException(scan.file(), "holds " + scan.frames()
                    + " samples, fewer than one spectrum segment of " + segmentLength(scan.frames()));
        }
        var spectrum = reducers.welch.finish(Unit.FULL_SCALE);
        List<SpectralPeak> peaks = new ArrayList<>(reducers.finder.find(spectrum));
        peaks.sort(Comparator.comparingDouble(SpectralPeak::levelDb).reversed());
        if (peaks.size() > MAX_PEAKS) {
            peaks = new ArrayList<>(peaks.subList(0, MAX_PEAKS));
        }
        peaks.sort(Comparator.comparingDouble(SpectralPeak::frequencyHz));
        return new RecordingOverview(channel.getName(), scan.file(), scan.rateHz(), scan.frames(), scan.sha256(),
                scan.checksumChanged(), reducers.envelope, spectrum, peaks, scale);
    }

    /** The envelope and Welch accumulator, created when the file's length and rate are known. */
    private static final class Reducers implements ChannelScan.Sink {
        MinMaxEnvelope envelope;
        WelchAccumulator welch;
        PeakFinder finder;

        @Override
        public void start(RecordingInfo info) {
            envelope = new MinMaxEnvelope(info.frameCount(), COLUMNS);
            Welch w = Welch.builder(segmentLength(info.frameCount())).scaling(PsdScaling.SPECTRUM).build();
            welch = new WelchAccumulator(w, info.sampleRate());
            // 10 dB prominent and 12 dB over the running median of 63 bins (common practice for tones
            // in noise); the Hann kernel corrects the level between bins
            finder = PeakFinder.builder().prominenceDb(10).noiseFloor(63, 12).minSeparationBins(3)
                    .windowKernel(w.window()).build();
        }

        @Override
        public void accept(double[] samples, int count) {
            envelope.add(samples, count);
            welch.add(samples, 0, count);
        }
    }
}
