package org.foldbook.sweep;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.filter.Complex;
import org.foldbook.dsp.filter.SensorAndConditioner;
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.resample.ExactChainFilter;
import org.foldbook.dsp.resample.ModelledChannel;
import org.foldbook.dsp.spectrum.Welch;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Ground truth that owes nothing to the re-samplers: random, seeded sums of tones (clearly synthetic),
 * and at every rate the samples at the new instants straight from the formula
 * y[m] = Σ A·|H(f)|·cos(2π f·t_m + φ + arg H(f)), t_m = m·down/(up·fs0), with H = 1 for the bare mode and
 * the chain's analytic H(j2πf) (zeros/poles, the exposure's sinc) for the modelled mode. The formula's
 * samples go through the same spectrum, peak and verdict stage as the sweep's; the sweep must agree: the
 * same peaks (same bins), levels within 0.1 dB, the same verdict for every source peak.
 *
 * <p>The tone sets are built to be hard: close pairs (1–5 bins apart at a rate), tones near fs/2 and near
 * k·fs of a rate, tones in 0.45–0.485·fs0. A quantisation step of 1e-3 sets the detection floor (about
 * −106 dB/Hz at fs0 plus the margin), far above the simulators' own error (below −100 dB re each tone) and
 * far below the tones (amplitudes 3e-3..1). The ideal and polyphase-default modes have designed, not
 * analytic, responses and are checked against the peer and their designs elsewhere.
 */
class GroundTruthTest {
    static final double FS0 = 100_000;
    static final int N = 1 << 15;
    static final SpectrumSettings SETTINGS = SpectrumSettings.DEFAULT
            .withThreshold(PeakThreshold.DEFAULT.withQuantisationStep(1e-3));
    static SweepEngine engine;

    @BeforeAll
    static void start() {
        engine = new SweepEngine(2);
    }

    @AfterAll
    static void stop() {
        engine.close();
    }

    record Tone(double f, double a, double phi) {
    }

    /** A hard tone set against the rates {@code rates}: see the class comment. */
    static List<Tone> tones(Random r, double[] rates) {
        List<Tone> t = new ArrayList<>();
        int count = 2 + r.nextInt(5);
        for (int i = 0; i < count; i++) {
            double fs = rates[r.nextInt(rates.length)];
            double bin = fs / SETTINGS.segmentFor((long) (N * fs / FS0));
            double f = switch (r.nextInt(5)) {
                case 0 -> FS0 * (0.45 + 0.035 * r.nextDouble());                                // top of the band
                case 1 -> fs / 2 + (r.nextDouble() - 0.5) * 6 * bin;                            // near fs/2
                case 2 -> (1 + r.nextInt(Math.max(1, (int) (0.48 * FS0 / fs)))) * fs + (r.nextDouble() - 0.5) * 8 * bin; // k·fs
                case 3 -> t.isEmpty() ? FS0 * 0.3 * r.nextDouble() : besideAlias(r, t.get(t.size() - 1).f(), fs, bin);
                default -> FS0 * (0.005 + 0.48 * r.nextDouble());
            };
            f = Math.min(0.485 * FS0, Math.max(0.002 * FS0, Math.abs(f)));
            t.add(new Tone(f, Math.pow(10, -2.5 * r.nextDouble()), 2 * Math.PI * r.nextDouble()));
        }
        return t;
    }

    /** A tone whose alias at {@code fs} lands 0.5–5 bins beside (or on) the alias of {@code f}: a close pair there. */
    static double besideAlias(Random r, double f, double fs, double bin) {
        double a = VerdictClassifier.apparentFrequency(f, fs) + (r.nextBoolean() ? 1 : -1) * (0.5 + 4.5 * r.nextDouble()) * bin;
        int kMax = Math.max(0, (int) ((0.485 * FS0 - Math.abs(a)) / fs));
        int k = kMax == 0 ? 0 : 1 + r.nextInt(kMax);
        return r.nextBoolean() || k == 0 ? k * fs + a : k * fs - a;
    }

    static ModelledChannel chain(Random r) {
        return switch (r.nextInt(6)) {
            case 0 -> ModelledChannel.none().withAnalog(AnalogLowPass.butterworth(2, FS0 / 2));
            case 1 -> ModelledChannel.none().withAnalog(AnalogLowPass.butterworth(4, FS0 / 5));
            case 2 -> ModelledChannel.none().withAnalog(AnalogLowPass.butterworth(8, FS0 / 10));
            case 3 -> ModelledChannel.none().withAnalog(AnalogLowPass.elliptic(6, 0.1, 80, FS0 / 5));
            case 4 -> ModelledChannel.none().withAnalog(SensorAndConditioner.sensorResonance(0.3 * FS0, 10))
                    .withAnalog(AnalogLowPass.butterworth(4, FS0 / 4));
            default -> ModelledChannel.none().withAnalog(AnalogLowPass.butterworth(4, FS0 / 50)).withExposure(8 / FS0);
        };
    }

    /** The formula's samples at the step's instants, its spectrum, peaks and verdicts. */
    static RateResult truth(List<Tone> tones, ModelledChannel ch, RateStep step, VerdictClassifier c, Resampling mode) {
        long m = step.outputLength(N);
        double[] y = new double[(int) m];
        for (Tone t : tones) {
            Complex h = ch == null ? Complex.ONE : ExactChainFilter.chainResponse(ch, t.f());
            double a = t.a() * h.abs();
            double phi = t.phi() + h.arg();
            double w = 2 * Math.PI * t.f() * step.down() / ((double) step.up() * FS0);
            for (int i = 0; i < m; i++) {
                y[i] += a * Math.cos(w * i + phi);
            }
        }
        double fs = step.effectiveRate();
        int seg = SETTINGS.segmentFor(m);
        Welch welch = Welch.builder(seg).build();
        double[] psd = new double[welch.bins()];
        welch.psdInto(y, 0, y.length, fs, new Welch.Workspace(seg), psd);
        double df = fs / seg;
        List<SpectralPeak> peaks = SETTINGS.finderAt(fs).findInPower(psd, psd.length, df);
        return c.classify(step, m, df, peaks, mode, SweepEngine.floorOf(psd, psd.length, SETTINGS),
                SETTINGS.threshold().quantisationFloorDb(fs));
    }

    /**
     * Peaks and source peaks within two bins of 0 or fs/2 are left out: the end bins are never peaks, and the
     * bin next to them depends on the constant detrend and on how the record starts and ends, where the
     * formula (an endless tone) and any simulation of a finite recording (zero beyond it) differ by design.
     */
    static boolean atEdge(double f, RateResult r) {
        double e = VerdictClassifier.EDGE_BINS * r.binWidth();
        return f < e || f > r.step().effectiveRate() / 2 - e;
    }

    static List<ObservedPeak> inner(RateResult r) {
        return r.observed().stream().filter(p -> !atEdge(p.frequency(), r)).toList();
    }

    static void compare(String name, RateResult wantAll, RateResult gotAll, List<String> bad) {
        List<ObservedPeak> wantPeaks = inner(wantAll);
        List<ObservedPeak> gotPeaks = inner(gotAll);
        RateResult want = new RateResult(wantAll.step(), wantAll.outputSamples(), wantAll.binWidth(), wantPeaks,
                wantAll.fates());
        RateResult got = new RateResult(gotAll.step(), gotAll.outputSamples(), gotAll.binWidth(), gotPeaks,
                gotAll.fates());
        if (want.observed().size() != got.observed().size()) {
            bad.add(name + ": " + want.observed().size() + " peaks by the formula, " + got.observed().size()
                    + " by the sweep: " + want.observed() + " vs " + got.observed());
            return;
        }
        for (int k = 0; k < want.observed().size(); k++) {
            ObservedPeak a = want.observed().get(k);
            ObservedPeak b = got.observed().get(k);
            if (a.frequency() != b.frequency() || Math.abs(a.levelDb() - b.levelDb()) > 0.1) {
                bad.add(name + ": peak " + k + " " + a.frequency() + " Hz " + a.levelDb() + " dB vs " + b.frequency()
                        + " Hz " + b.levelDb() + " dB");
            }
        }
        for (int s = 0; s < want.fates().size(); s++) {
            if (atEdge(want.fate(s).apparentFrequency(), want)) {
                continue;
            }
            if (want.fate(s).verdict() != got.fate(s).verdict()) {
                bad.add(name + ": source peak " + s + " " + want.fate(s).verdict() + " (" + want.fate(s).reason()
                        + ") vs " + got.fate(s).verdict() + " (" + got.fate(s).reason() + ")");
            }
        }
    }

    static void run(boolean modelled, int cases, long seed) {
        Random r = new Random(seed);
        List<String> bad = new ArrayList<>();
        Map<Verdict, Integer> seen = new EnumMap<>(Verdict.class);
        for (int c = 0; c < cases; c++) {
            double[] rates = new double[3];
            for (int i = 0; i < rates.length; i++) {
                rates[i] = FS0 * (0.04 + 0.9 * r.nextDouble());
            }
            RateLadder ladder = RateLadder.ofRates(FS0, rates, 1000);
            double[] exact = ladder.steps().stream().mapToDouble(RateStep::effectiveRate).toArray();
            List<Tone> tones = tones(r, exact);
            ModelledChannel ch = modelled ? chain(r) : null;
            double[] x = new double[N];
            for (Tone t : tones) {
                double w = 2 * Math.PI * t.f() / FS0;
                for (int n = 0; n < N; n++) {
                    x[n] += t.a() * Math.cos(w * n + t.phi());
                }
            }
            Resampling mode = modelled ? Resampling.modelledChannel(ch) : Resampling.bare();
            SourceSpectrum ref = SourceSpectrum.of(x, FS0, SETTINGS);
            SweepResult sweep = engine.run(x, ref, ladder, mode, SweepProgress.NONE);
            for (int i = 0; i < ladder.size(); i++) {
                RateResult want = truth(tones, ch, ladder.get(i), ref.classifier(), mode);
                compare("case " + c + " " + mode.name() + " at " + ladder.get(i).effectiveRate() + " S/s, tones "
                        + tones + (ch == null ? "" : ", " + ch), want, sweep.rates().get(i), bad);
                for (SourceFate f : want.fates()) {
                    seen.merge(f.verdict(), 1, Integer::sum);
                }
            }
        }
        assertTrue(bad.isEmpty(), bad.size() + " disagreements, first: " + String.join("\n", bad.subList(0,
                Math.min(5, bad.size()))));
        // the cases must exercise more than the easy verdicts
        assertTrue(seen.getOrDefault(Verdict.FOLDS, 0) > 50 && seen.getOrDefault(Verdict.SURVIVES, 0) > 50, seen.toString());
        assertTrue(seen.getOrDefault(Verdict.HIDDEN, 0) + seen.getOrDefault(Verdict.COINCIDES, 0) > 10, seen.toString());
        assertTrue(seen.getOrDefault(Verdict.AT_DC, 0) + seen.getOrDefault(Verdict.AT_NYQUIST, 0) > 10, seen.toString());
    }

    @Test
    @DisplayName("bare mode: 120 random hard tone sets, 3 rates each: the same peaks, levels to 0.1 dB, verdicts as the formula's")
    void bareAgreesWithTheFormula() {
        run(false, 120, 20261203L);
    }

    @Test
    @DisplayName("modelled mode: 120 random tone sets through 6 chains (fs0/fc 2..50, elliptic, resonance, exposure): as the formula's")
    void modelledAgreesWithTheFormula() {
        run(true, 120, 1203L);
    }
}
