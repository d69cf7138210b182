package org.foldbook.ui.recording;

import java.nio.file.Path;
import java.util.List;

import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.spectrum.PowerSpectrum;
import org.foldbook.ui.preferences.SpectrumSettingsValues;

/**
 * What one pass over a channel's recording gave: the min/max envelope and the Welch power spectrum of the
 * samples as stored (full-scale fractions for PCM; {@code SPECTRUM} scaling, so a tone reads its mean
 * square), its peaks (levels in dB re 1 stored unit², scalloping corrected), the scale to physical units, and
 * the spectrum and peak settings it was made with.
 */
public record RecordingOverview(String channelName, Path file, double rateHz, long frames, String sha256,
        boolean checksumChanged, MinMaxEnvelope envelope, PowerSpectrum spectrum, List<SpectralPeak> peaks,
        PhysicalScale scale, SpectrumSettingsValues settings) {

    public RecordingOverview {
        peaks = List.copyOf(peaks);
    }

    public double durationSeconds() {
        return frames / rateHz;
    }
}
