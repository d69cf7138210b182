package org.foldbook.audit;

import static org.foldbook.audit.Subject.fig;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.foldbook.channel.ChannelDataException;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ChannelStream;
import org.foldbook.channel.ReadProgress;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.dsp.spectrum.WelchAccumulator;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.model.derived.Names;
import org.foldbook.model.derived.Quantities;
import org.foldbook.sweep.SpectrumSettings;

/**
 * Runs the audit over a notebook, an experiment or a channel: per channel the notebook findings
 * ({@link ChainAudit}), one streamed pass over the recording through {@link ChannelReader#stream}
 * (statistics and Welch PSD together, bounded memory), the peak verdicts ({@link PeakAudit}) and the folded
 * noise ({@link FoldedNoise}), with a higher-rate recording of the same sensor as reference where the
 * notebook has one. Not thread-safe; one audit at a time.
 */
public final class Auditor {
    private final AuditPolicy policy;
    private final SpectrumSettings spectrumSettings;
    private final Map<Channel, Optional<ChannelSpectrum>> spectra = new HashMap<>();

    public Auditor(AuditPolicy policy) {
        this.policy = policy;
        this.spectrumSettings = SpectrumSettings.DEFAULT;
    }

    /**
     * What to audit: all of the notebook, or one experiment (by name) and/or one channel (by name).
     *
     * @param experiment an experiment's name, null for all
     * @param channel    a channel's name, null for all
     */
    public record Scope(String experiment, String channel) {
        public static final Scope ALL = new Scope(null, null);

        boolean takes(Experiment e) {
            return experiment == null || experiment.equals(e.getName());
        }

        boolean takes(Channel c) {
            return channel == null || channel.equals(c.getName());
        }
    }

    /** Audits {@code notebook} (loaded from {@code file}, may be null) within {@code scope}. */
    public NotebookAudit audit(Notebook notebook, Path file, Scope scope, AuditProgress progress) {
        List<Channel> todo = new ArrayList<>();
        for (Experiment e : notebook.getExperiments()) {
            if (scope.takes(e)) {
                e.getChannels().stream().filter(scope::takes).forEach(todo::add);
            }
        }
        if (todo.isEmpty()) {
            throw new IllegalArgumentException("nothing to audit in notebook '" + notebook.getTitle() + "'"
                    + (scope.experiment() != null ? ": no experiment '" + scope.experiment() + "'" : "")
                    + (scope.channel() != null ? " with a channel '" + scope.channel() + "'" : ""));
        }
        Map<Experiment, List<ChannelAudit>> done = new java.util.LinkedHashMap<>();
        int n = 0;
        for (Channel c : todo) {
            progress.channel(Names.label(c), n++, todo.size());
            done.computeIfAbsent((Experiment) c.eContainer(), k -> new ArrayList<>()).add(audit(c, progress));
        }
        progress.channel("done", todo.size(), todo.size());
        List<NotebookAudit.ExperimentAudit> exps = new ArrayList<>();
        done.forEach((e, list) -> exps.add(new NotebookAudit.ExperimentAudit(e.getName(), list)));
        return new NotebookAudit(notebook.getTitle(), file, Instant.now(), policy, exps);
    }

    /** Audits one channel. */
    public ChannelAudit audit(Channel channel, AuditProgress progress) {
        List<Finding> findings = Subject.list();
        ChainAudit.audit(channel, policy, findings);
        Subject at = new Subject(channel, findings);
        SignalChain chain = channel.getChain();
        ChainModel model = chain == null ? null : ChainModel.of(chain);
        double rate = model == null ? Double.NaN : model.samplingRateHz();
        double upper = chain == null ? Double.NaN : ChainFigures.frontEndUpperHz(chain);
        FrequencyResponse protection = model == null ? f -> 1.0 : model.protection(rate);
        int bits = bits(chain);
        Optional<ChannelSpectrum> spectrum = readData(channel, at, bits, rate, progress);
        ReferenceRecording ref = reference(channel, progress).orElse(null);
        List<PeakAssessment> peaks = new ArrayList<>();
        Optional<FoldedNoise> modelNoise = Optional.empty();
        Optional<FoldedNoise> dataNoise = Optional.empty();
        double searchUpper = upper > 0 ? upper : ref != null ? ref.spectrum().rateHz() / 2 : 4 * rate;
        if (spectrum.isPresent() && rate > 0) {
            ChannelSpectrum sp = spectrum.get();
            DataAudit.nyquist(at, sp, policy, protection, searchUpper);
            double ceiling = chain == null ? 0 : ChainFigures.need(chain).map(ChainFigures.Need::outOfBandLevelDbfs)
                    .orElse(chain.getOutOfBandLevelDbfs() != null ? chain.getOutOfBandLevelDbfs() : 0.0);
            int segment = (int) Math.round(sp.rateHz() / sp.binHz());
            peaks = PeakAudit.assess(sp, segment, protection, searchUpper, ceiling, ref,
                    spectrumSettings.prominenceDb(), policy);
            for (PeakAssessment p : peaks) {
                if (p.verdict() != PeakVerdict.TRUSTWORTHY) {
                    at.add(AuditKind.SUSPECT_PEAK,
                            p.verdict() == PeakVerdict.PROBABLY_FOLDED ? Severity.ERROR : Severity.WARNING,
                            p.verdict().words() + " — " + p.reasoning(), fig("frequencyHz", p.frequencyHz(), "Hz"),
                            fig("levelDbfs", p.levelDb(), "dBFS"), fig("verdict", p.verdict().ordinal(), ""));
                }
            }
        }
        if (rate > 0 && searchUpper > 0) {
            FoldedNoise m = FoldedNoise.fromModel(protection, rate, searchUpper, upper > 0 ? "the front end's upper edge"
                    : ref != null ? "the higher-rate recording's Nyquist; the front end's upper edge is not recorded"
                            : "4·fs, our assumption: the front end's upper edge is not recorded");
            modelNoise = Optional.of(m);
            noiseFinding(at, m);
            if (ref != null) {
                FoldedNoise d = FoldedNoise.fromData(protection, rate, upper, ref);
                if (!Double.isNaN(d.riseDb())) {
                    dataNoise = Optional.of(d);
                    noiseFinding(at, d);
                }
            }
        }
        List<ChannelAudit.FoldBandView> bands = new ArrayList<>();
        Optional<ChainFigures.Need> need = chain == null ? Optional.empty() : ChainFigures.need(chain);
        if (need.isPresent()) {
            for (ChainAudit.FoldBand b : ChainAudit.foldBands(protection, rate, upper, need.get().requiredDb())) {
                bands.add(new ChannelAudit.FoldBandView(b.fromHz(), b.toHz(), b.landsFromHz(), b.landsToHz(),
                        b.leastAttenuationDb()));
            }
        }
        List<String> chainText = new ArrayList<>();
        if (chain != null) {
            for (Stage s : chain.getStages()) {
                chainText.add(Names.stageText(s));
            }
        }
        String exp = channel.eContainer() instanceof Experiment e ? e.getName() : "";
        String refLabel = channel.eResource() == null ? "" : channel.eResource().getURIFragment(channel);
        return new ChannelAudit(exp, channel.getName(), refLabel, chainText, rate, upper, protection, bands, findings,
                spectrum, peaks, modelNoise, dataNoise, Optional.ofNullable(ref).map(ReferenceRecording::label));
    }

    private static void noiseFinding(Subject at, FoldedNoise n) {
        Severity sev = n.riseDb() >= 3 ? Severity.WARNING : Severity.INFO;
        at.add(AuditKind.FOLDED_NOISE, sev, String.format(Locale.ROOT,
                "folded broadband noise raises the floor by %s (from the %s: %s)", Words.db(n.riseDb()),
                n.source(), n.basis()), fig("riseDb", n.riseDb(), "dB"));
    }

    private static int bits(SignalChain chain) {
        Stage s = chain == null ? null : ChainFigures.samplingStage(chain);
        return s != null && s.getDevice() instanceof Digitizer d ? d.getResolutionBits() : 0;
    }

    /** One pass: statistics and spectrum together; the file's own figures checked against the notebook. */
    private Optional<ChannelSpectrum> readData(Channel channel, Subject at, int bits, double rate,
            AuditProgress progress) {
        Recording rec = channel.getRecording();
        if (rec == null) {
            at.add(AuditKind.SETTING_MISSING, Severity.ERROR, "the channel names no recording");
            return Optional.empty();
        }
        double declared = rec.getDeclaredRateHz() > 0 ? rec.getDeclaredRateHz() : rate;
        double sampleRate = declared > 0 ? declared : 1.0;
        // full scale is known for PCM files (values are fractions of it); text and raw files leave it open
        SampleStatistics stats = new SampleStatistics(policy.clipFraction(), policy.dropoutSamples(),
                policy.flatSamples());
        // periodic Hann, 50 % overlap, constant detrend, density (scipy.signal.welch's defaults)
        WelchAccumulator welch = new WelchAccumulator(Welch.builder(spectrumSettings.maxSegment()).build(), sampleRate);
        ChannelStream s;
        try {
            s = ChannelReader.stream(channel, (x, n) -> {
                stats.accept(x, n);
                addFiniteOrZero(welch, x, n);
            }, new ReadProgress() {
                @Override
                public void framesRead(long done, long total) {
                    progress.frames(done, total);
                }

                @Override
                public boolean cancelled() {
                    return progress.cancelled();
                }
            });
        } catch (ChannelDataException e) {
            at.add(AuditKind.FILE_UNREADABLE, e.getMessage());
            return Optional.empty();
        }
        stats.finish();
        if (s.checksumChanged()) {
            at.add(AuditKind.CHECKSUM_CHANGED, s.file() + " changed since it was logged: SHA-256 now " + s.sha256()
                    + ", logged " + s.loggedSha256());
        }
        if (declared > 0 && Math.abs(s.rateHz() - declared) > 1e-6 * declared) {
            at.add(AuditKind.FILE_DISAGREES, "the file is at " + Quantities.rate(s.rateHz()) + ", the notebook declares "
                    + Quantities.rate(declared), fig("fileRateHz", s.rateHz(), "Hz"), fig("notebookRateHz", declared, "Hz"));
        }
        if (rec.getChannelCount() > 0 && rec.getChannelCount() != s.channelCount()) {
            at.add(AuditKind.FILE_DISAGREES, "the file holds " + s.channelCount() + " channel(s), the notebook says "
                    + rec.getChannelCount(), fig("fileChannels", s.channelCount(), ""),
                    fig("notebookChannels", rec.getChannelCount(), ""));
        }
        double fullScale = "FS".equals(s.unit()) ? 1.0 : Double.NaN;
        SampleStatistics counted = stats;
        if (Double.isNaN(fullScale)) {
            at.add(AuditKind.SETTING_MISSING, Severity.INFO, "the file's full scale is not known (" + s.sampleType()
                    + " samples in '" + s.unit() + "'): rails and range use are not checked");
        }
        DataAudit.samples(at, counted, fullScale, bits, sampleRate, policy);
        int segment = welch.welch().segmentLength();
        if (welch.segments() == 0) {
            at.add(AuditKind.SETTING_MISSING, Severity.INFO, "shorter than one spectrum segment of "
                    + segment + " samples: no spectrum");
            return Optional.empty();
        }
        double[] psd = new double[welch.welch().bins()];
        welch.finish(psd);
        // the accumulator ran at the notebook's rate; the file's own rate places the bins (density scales by the ratio)
        double fileRate = s.rateHz() > 0 ? s.rateHz() : sampleRate;
        for (int k = 0; k < psd.length; k++) {
            psd[k] *= sampleRate / fileRate;
        }
        return Optional.of(new ChannelSpectrum(fileRate, fileRate / segment, psd, fullScale));
    }

    /**
     * Feeds {@code x[0..n)} with non-finite samples as 0: they are reported by the statistics, and one bad
     * value must not void the spectrum. Written straight into the accumulator's buffer, no copy.
     */
    private static void addFiniteOrZero(WelchAccumulator welch, double[] x, int n) {
        for (int off = 0; off < n; ) {
            int take = Math.min(welch.room(), n - off);
            double[] buf = welch.buffer();
            int at = welch.position();
            for (int i = 0; i < take; i++) {
                double v = x[off + i];
                buf[at + i] = Double.isFinite(v) ? v : 0.0;
            }
            welch.advance(take);
            off += take;
        }
    }

    /**
     * The highest-rate other channel of the notebook on the same sensor, at least twice this channel's rate,
     * its spectrum read once and kept for the other channels.
     */
    private Optional<ReferenceRecording> reference(Channel channel, AuditProgress progress) {
        if (channel.getChain() == null || channel.eResource() == null) {
            return Optional.empty();
        }
        Stage mine = ChainFigures.sensorStage(channel.getChain());
        double rate = ChainFigures.samplingRateHz(channel.getChain());
        if (mine == null || !(rate > 0)) {
            return Optional.empty();
        }
        Notebook nb = (Notebook) org.eclipse.emf.ecore.util.EcoreUtil.getRootContainer(channel);
        Channel best = null;
        double bestRate = 2 * rate;
        for (Experiment e : nb.getExperiments()) {
            for (Channel c : e.getChannels()) {
                if (c == channel || c.getChain() == null) {
                    continue;
                }
                Stage s = ChainFigures.sensorStage(c.getChain());
                double r = ChainFigures.samplingRateHz(c.getChain());
                if (s != null && s.getDevice() == mine.getDevice() && r >= bestRate) {
                    best = c;
                    bestRate = r;
                }
            }
        }
        if (best == null) {
            return Optional.empty();
        }
        Channel ref = best;
        Optional<ChannelSpectrum> sp = spectra.computeIfAbsent(ref, c -> readData(c,
                new Subject(c, Subject.list()), bits(c.getChain()), ChainFigures.samplingRateHz(c.getChain()), progress));
        return sp.map(s -> new ReferenceRecording(Names.label(ref), s,
                ChainModel.of(ref.getChain()).protection(ChainFigures.samplingRateHz(ref.getChain()))));
    }
}
