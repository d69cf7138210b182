package org.foldbook.sweep;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.DoublePredicate;
import java.util.function.Function;

import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.spectrum.Welch;

/**
 * The machinery of the ground-truth tests ({@link GroundTruthTest}): random, seeded, clearly synthetic sums
 * of tones; a reference series for every rate that owes nothing to the re-samplers (the formula, or a
 * filter's definition with outside taps); the same spectrum, peak and verdict stage on it as the sweep's;
 * and the comparison: the same peaks (same bins), levels within 0.1 dB, the same verdict for every source
 * peak.
 */
final class GroundTruth {
    static final double FS0 = 100_000;
    static final int N = 1 << 15;
    /**
     * A quantisation step of 1e-3 sets the detection floor (about −106 dB/Hz at fs0 plus the margin), far above
     * the simulators' own error (below −100 dB re each tone) and far below the tones (amplitudes 3e-3..1).
     */
    static final SpectrumSettings SETTINGS = SpectrumSettings.DEFAULT
            .withThreshold(PeakThreshold.DEFAULT.withQuantisationStep(1e-3));

    private GroundTruth() {
    }

    record Tone(double f, double a, double phi) {
    }

    /** One random case: the mode, its rates, the tones, and the reference series at each rate. */
    interface Case {
        Resampling mode();

        RateLadder ladder();

        List<Tone> tones();

        /** The {@code m} samples at {@code step}'s instants that owe nothing to our re-samplers ({@code x}: the source). */
        double[] reference(RateStep step, long m, double[] x);

        /** Words for a failure message (the chain, if any). */
        default String extra() {
            return "";
        }
    }

    /** Bin width of the sweep's spectrum at rate {@code fs} for the N-sample source. */
    static double binAt(double fs) {
        return fs / SETTINGS.segmentFor((long) (N * fs / FS0));
    }

    /**
     * A hard tone set against the rates {@code rates}, tones up to {@code top}·fs0 and only where
     * {@code allowed}: close pairs (0.5–5 bins apart at a rate, via {@link #besideAlias}), tones near fs/2 and
     * near k·fs of a rate, tones in the top 0.035·fs0 of the band, the rest anywhere; amplitudes 3e-3..1.
     */
    static List<Tone> tones(Random r, double[] rates, double top, DoublePredicate allowed) {
        List<Tone> t = new ArrayList<>();
        int count = 2 + r.nextInt(5);
        for (int i = 0; i < count; i++) {
            double f = Double.NaN;
            for (int attempt = 0; attempt < 1000 && (Double.isNaN(f) || !allowed.test(f)); attempt++) {
                f = draw(r, rates, top, t);
            }
            if (!allowed.test(f)) {
                throw new IllegalStateException("no allowed tone in 1000 draws for rates " + java.util.Arrays.toString(rates));
            }
            t.add(new Tone(f, Math.pow(10, -2.5 * r.nextDouble()), 2 * Math.PI * r.nextDouble()));
        }
        return t;
    }

    private static double draw(Random r, double[] rates, double top, List<Tone> t) {
        double fs = rates[r.nextInt(rates.length)];
        double bin = binAt(fs);
        double f = switch (r.nextInt(5)) {
            case 0 -> FS0 * (top - 0.035 + 0.035 * r.nextDouble());                             // top of the band
            case 1 -> fs / 2 + (r.nextDouble() - 0.5) * 6 * bin;                              // near fs/2
            case 2 -> (1 + r.nextInt(Math.max(1, (int) ((top - 0.005) * FS0 / fs)))) * fs + (r.nextDouble() - 0.5) * 8 * bin; // k·fs
            case 3 -> t.isEmpty() ? FS0 * 0.3 * r.nextDouble() : besideAlias(r, t.get(t.size() - 1).f(), fs, bin, top);
            default -> FS0 * (0.005 + (top - 0.005) * r.nextDouble());
        };
        return Math.min(top * FS0, Math.max(0.002 * FS0, Math.abs(f)));
    }

    /** A tone whose alias at {@code fs} lands 0.5–5 bins beside (or on) the alias of {@code f}: a close pair there. */
    static double besideAlias(Random r, double f, double fs, double bin, double top) {
        double a = VerdictClassifier.apparentFrequency(f, fs) + (r.nextBoolean() ? 1 : -1) * (0.5 + 4.5 * r.nextDouble()) * bin;
        int kMax = Math.max(0, (int) ((top * FS0 - Math.abs(a)) / fs));
        int k = kMax == 0 ? 0 : 1 + r.nextInt(kMax);
        return r.nextBoolean() || k == 0 ? k * fs + a : k * fs - a;
    }

    /** The source: Σ a·cos(2π f n/fs0 + φ), n = 0 .. N−1. */
    static double[] source(List<Tone> tones) {
        double[] x = new double[N];
        for (Tone t : tones) {
            double w = 2 * Math.PI * t.f() / FS0;
            for (int n = 0; n < N; n++) {
                x[n] += t.a() * Math.cos(w * n + t.phi());
            }
        }
        return x;
    }

    /**
     * The formula at the step's instants t_m = m·down/(up·fs0): Σ a·g·cos(2π f t_m + φ + θ) with each tone's
     * gain g and phase θ from {@code response} (null: the tone is absent).
     */
    static double[] formula(List<Tone> tones, RateStep step, long m, Function<Tone, org.foldbook.dsp.filter.Complex> response) {
        double[] y = new double[(int) m];
        for (Tone t : tones) {
            org.foldbook.dsp.filter.Complex h = response.apply(t);
            if (h == null) {
                continue;
            }
            double a = t.a() * h.abs();
            double phi = t.phi() + h.arg();
            double w = 2 * Math.PI * t.f() * step.down() / ((double) step.up() * FS0);
            for (int i = 0; i < m; i++) {
                y[i] += a * Math.cos(w * i + phi);
            }
        }
        return y;
    }

    /** The sweep's spectrum, peak and verdict stage on {@code y}, the series at {@code step}. */
    static RateResult stage(double[] y, RateStep step, VerdictClassifier c, Resampling mode) {
        double fs = step.effectiveRate();
        int seg = SETTINGS.segmentFor(y.length);
        Welch welch = Welch.builder(seg).build();
        double[] psd = new double[welch.bins()];
        welch.psdInto(y, 0, y.length, fs, new Welch.Workspace(seg), psd);
        double df = fs / seg;
        List<SpectralPeak> peaks = SETTINGS.finderAt(fs).findInPower(psd, psd.length, df);
        return c.classify(step, y.length, df, peaks, mode, SweepEngine.floorOf(psd, psd.length, SETTINGS),
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

    /** Adds to {@code bad} every way {@code got} differs from {@code want}: peaks, bins, levels (0.1 dB), verdicts. */
    static void compare(String name, RateResult want, RateResult got, List<String> bad) {
        List<ObservedPeak> wantPeaks = inner(want);
        List<ObservedPeak> gotPeaks = inner(got);
        if (wantPeaks.size() != gotPeaks.size()) {
            bad.add(name + ": " + wantPeaks.size() + " peaks by the reference, " + gotPeaks.size()
                    + " by the sweep: " + wantPeaks + " vs " + gotPeaks);
            return;
        }
        for (int k = 0; k < wantPeaks.size(); k++) {
            ObservedPeak a = wantPeaks.get(k);
            ObservedPeak b = gotPeaks.get(k);
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

    /** What {@link #run} saw: the verdicts of the reference, counted, and the disagreements. */
    record Outcome(Map<Verdict, Integer> seen, List<String> bad, int rates) {
        int count(Verdict v) {
            return seen.getOrDefault(v, 0);
        }

        String firstBad() {
            return bad.size() + " disagreements in " + rates + " rates, first: "
                    + String.join("\n", bad.subList(0, Math.min(5, bad.size())));
        }
    }

    /** {@code cases} random cases from {@code make}, each swept and compared rate by rate with its reference. */
    static Outcome run(SweepEngine engine, int cases, long seed, Function<Random, Case> make) {
        Random r = new Random(seed);
        List<String> bad = new ArrayList<>();
        Map<Verdict, Integer> seen = new EnumMap<>(Verdict.class);
        int rates = 0;
        for (int c = 0; c < cases; c++) {
            Case k = make.apply(r);
            double[] x = source(k.tones());
            SourceSpectrum ref = SourceSpectrum.of(x, FS0, SETTINGS);
            SweepResult sweep = engine.run(x, ref, k.ladder(), k.mode(), SweepProgress.NONE);
            for (int i = 0; i < k.ladder().size(); i++) {
                RateStep step = k.ladder().get(i);
                long m = step.outputLength(N);
                RateResult want = stage(k.reference(step, m, x), step, ref.classifier(), k.mode());
                compare("case " + c + " " + k.mode().mode().word() + " at " + step.effectiveRate() + " S/s (" + step.up()
                        + "/" + step.down() + "), tones " + k.tones() + k.extra(), want, sweep.rates().get(i), bad);
                for (SourceFate f : want.fates()) {
                    seen.merge(f.verdict(), 1, Integer::sum);
                }
                rates++;
            }
        }
        return new Outcome(seen, bad, rates);
    }

    /** Three random rates in 0.04..0.94·fs0, snapped with denominators up to {@code maxDenominator}. */
    static RateLadder randomLadder(Random r, int maxDenominator) {
        double[] rates = new double[3];
        for (int i = 0; i < rates.length; i++) {
            rates[i] = FS0 * (0.04 + 0.9 * r.nextDouble());
        }
        return RateLadder.ofRates(FS0, rates, maxDenominator);
    }

    static double[] rates(RateLadder ladder) {
        return ladder.steps().stream().mapToDouble(RateStep::effectiveRate).toArray();
    }
}
