package org.foldbook.ui.recording;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.spectrum.PowerSpectrum;
import org.foldbook.model.Channel;

/**
 * What the recording view shows, free of SWT: the channel it follows, the last overview or the message
 * that stands in for it, and the display choices (level scale, frequency axis). Levels come from the
 * spectrum's mean squares P (full-scale fractions²): dBFS is {@code 10 log10(2P)} (0 dBFS = a full-scale
 * sine, AES17), dB re a reference is {@code 10 log10(P k² / ref²)} with k the physical scale (an rms
 * level), linear is the rms amplitude {@code sqrt(P) k}.
 */
public final class RecordingPresenter {
    /** How spectrum levels are shown. */
    public enum Levels {
        DB_RE_REFERENCE, DBFS, LINEAR
    }

    private Channel channel;
    private RecordingOverview overview;
    private String message = "Select a channel in the Notebook part to see its recording.";
    private Levels levels = Levels.DB_RE_REFERENCE;
    private boolean logFrequency;

    /** The channel a Notebook selection stands for (a channel itself), or null. */
    public static Channel channelOf(Object selection) {
        return selection instanceof Channel c ? c : null;
    }

    public Channel channel() {
        return channel;
    }

    /** Follows {@code next}; the old overview is dropped until the new one is read. */
    public void follow(Channel next) {
        channel = next;
        overview = null;
        message = next == null ? "Select a channel in the Notebook part to see its recording."
                : "Reading channel '" + next.getName() + "' …";
    }

    public void showOverview(RecordingOverview next) {
        overview = next;
        message = null;
        if (!next.scale().present() && levels == Levels.DB_RE_REFERENCE) {
            levels = Levels.DBFS;
        }
    }

    public void showProblem(String text) {
        overview = null;
        message = text;
    }

    public RecordingOverview overview() {
        return overview;
    }

    /** The message shown in place of the charts, or null when an overview is shown. */
    public String message() {
        return message;
    }

    public Levels levels() {
        return levels;
    }

    public void setLevels(Levels value) {
        levels = value;
    }

    public boolean logFrequency() {
        return logFrequency;
    }

    public void setLogFrequency(boolean value) {
        logFrequency = value;
    }

    /** The level choices for the shown channel (dB re a reference only with a physical scale). */
    public List<Levels> choices() {
        List<Levels> out = new ArrayList<>();
        if (overview == null || overview.scale().present()) {
            out.add(Levels.DB_RE_REFERENCE);
        }
        out.add(Levels.DBFS);
        out.add(Levels.LINEAR);
        return out;
    }

    public String label(Levels l) {
        PhysicalScale s = overview == null ? null : overview.scale();
        return switch (l) {
            case DB_RE_REFERENCE -> s == null ? "dB re reference" : "dB re " + s.dbReferenceText() + " (rms)";
            case DBFS -> "dBFS (0 dB = full-scale sine)";
            case LINEAR -> s != null && s.present() ? PhysicalScale.pretty(s.unit()) + " rms" : "full scale rms";
        };
    }

    /** A mean square P (full scale²) in the chosen levels. */
    public double level(double meanSquare) {
        PhysicalScale s = overview.scale();
        return switch (levels) {
            case DBFS -> 10 * Math.log10(Math.max(2 * meanSquare, 1e-300));
            case DB_RE_REFERENCE -> {
                double k = s.unitsPerFullScale() / s.dbReference();
                yield 10 * Math.log10(Math.max(meanSquare * k * k, 1e-300));
            }
            case LINEAR -> Math.sqrt(meanSquare) * (s.present() ? s.unitsPerFullScale() : 1);
        };
    }

    /** Spectrum line {x = Hz, y = level}; from bin 1 on a log axis (0 Hz has no place there). */
    public double[][] spectrumLine() {
        PowerSpectrum p = overview.spectrum();
        int from = logFrequency ? 1 : 0;
        double[] f = new double[p.bins() - from];
        double[] y = new double[f.length];
        for (int k = from; k < p.bins(); k++) {
            f[k - from] = p.frequency(k);
            y[k - from] = level(p.value(k));
        }
        return new double[][] {f, y};
    }

    /** The marked peaks {x = Hz, y = level}. */
    public double[][] peakPoints() {
        List<SpectralPeak> peaks = overview.peaks();
        double[] f = new double[peaks.size()];
        double[] y = new double[peaks.size()];
        for (int i = 0; i < f.length; i++) {
            f[i] = peaks.get(i).frequencyHz();
            y[i] = level(Math.pow(10, peaks.get(i).levelDb() / 10));
        }
        return new double[][] {f, y};
    }

    /** Peak table rows: frequency, level in the chosen scale, level in dBFS. */
    public List<String[]> peakRows() {
        List<String[]> rows = new ArrayList<>();
        Levels chosen = levels;
        for (SpectralPeak p : overview.peaks()) {
            double ms = Math.pow(10, p.levelDb() / 10);
            levels = Levels.DBFS;
            String dbfs = String.format(Locale.ROOT, "%.1f", level(ms));
            levels = chosen;
            rows.add(new String[] {String.format(Locale.ROOT, "%.2f", p.frequencyHz()), value(level(ms)), dbfs});
        }
        return rows;
    }

    /** The readout for the mouse at {@code hz}: the nearest bin's frequency and level. */
    public String cursorText(double hz) {
        if (overview == null || !Double.isFinite(hz)) {
            return "";
        }
        PowerSpectrum p = overview.spectrum();
        int k = (int) Math.max(0, Math.min(p.bins() - 1, Math.round(hz / p.binWidth())));
        return String.format(Locale.ROOT, "cursor %.2f Hz: %s %s", p.frequency(k), value(level(p.value(k))),
                unitOfLevels());
    }

    /** "dB re 1 µm/s²", "dBFS", "m/s² rms". */
    public String unitOfLevels() {
        PhysicalScale s = overview == null ? null : overview.scale();
        return switch (levels) {
            case DB_RE_REFERENCE -> "dB re " + (s == null ? "reference" : s.dbReferenceText());
            case DBFS -> "dBFS";
            case LINEAR -> s != null && s.present() ? PhysicalScale.pretty(s.unit()) + " rms" : "FS rms";
        };
    }

    /** Envelope line in physical units when there is a scale, else in full-scale fractions. */
    public double[][] envelopeLine() {
        PhysicalScale s = overview.scale();
        return overview.envelope().line(overview.rateHz(), s.present() ? s.unitsPerFullScale() : 1);
    }

    public String envelopeUnit() {
        PhysicalScale s = overview.scale();
        return s.present() ? PhysicalScale.pretty(s.unit()) : "full scale";
    }

    /** One line about the file: channel, file, rate, length, checksum state, full scale in units. */
    public String header() {
        RecordingOverview o = overview;
        String sha = o.checksumChanged() ? "SHA-256 CHANGED since logged" : "SHA-256 as logged";
        String fs = o.scale().present() ? String.format(Locale.ROOT, "full scale = %s %s",
                PhysicalScale.fmt(o.scale().unitsPerFullScale()), PhysicalScale.pretty(o.scale().unit()))
                : "levels in full scale (" + o.scale().how() + ")";
        return String.format(Locale.ROOT, "%s  ·  %s  ·  %.6g S/s  ·  %d samples (%.3g s)  ·  %s  ·  %s",
                o.channelName(), o.file().getFileName(), o.rateHz(), o.frames(), o.durationSeconds(), sha, fs);
    }

    /** The header's details: the file's path, SHA-256, the Welch settings and the scale's arithmetic. */
    public String details() {
        RecordingOverview o = overview;
        return String.format(Locale.ROOT, "%s%nSHA-256 %s%nWelch: %d segments of %d samples (%.4g Hz lines), periodic"
                + " Hann, half overlap%nPeaks: %s (Window ▸ Preferences…)%nScale: %s", o.file(), o.sha256(),
                o.spectrum().segments(), o.spectrum().transformLength(), o.spectrum().binWidth(),
                o.settings().describe(), o.scale().how());
    }

    /** Labels for {@link #peakPoints()}: "906.5 Hz" for the {@code count} strongest, null for the rest. */
    public String[] peakLabels(int count) {
        List<SpectralPeak> peaks = overview.peaks();
        List<SpectralPeak> strongest = new ArrayList<>(peaks);
        strongest.sort((a, b) -> Double.compare(b.levelDb(), a.levelDb()));
        strongest = strongest.subList(0, Math.min(count, strongest.size()));
        String[] labels = new String[peaks.size()];
        for (int i = 0; i < labels.length; i++) {
            if (strongest.contains(peaks.get(i))) {
                labels[i] = String.format(Locale.ROOT, "%.1f Hz", peaks.get(i).frequencyHz());
            }
        }
        return labels;
    }

    private String value(double v) {
        return levels == Levels.LINEAR ? String.format(Locale.ROOT, "%.4g", v) : String.format(Locale.ROOT, "%.1f", v);
    }
}
