package org.foldbook.sweep;

import static org.foldbook.sweep.GroundTruth.FS0;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.function.DoublePredicate;

import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.filter.Complex;
import org.foldbook.dsp.filter.SensorAndConditioner;
import org.foldbook.dsp.resample.ExactChainFilter;
import org.foldbook.dsp.resample.ModelledChannel;
import org.foldbook.sweep.GroundTruth.Case;
import org.foldbook.sweep.GroundTruth.Outcome;
import org.foldbook.sweep.GroundTruth.Tone;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Ground truth that owes nothing to the re-samplers, for every mode: random, seeded sums of tones (clearly
 * synthetic) and at every rate a reference series computed without them, through the same spectrum, peak
 * and verdict stage as the sweep's ({@link GroundTruth}); the sweep must agree: the same peaks (same bins),
 * levels within 0.1 dB, the same verdict for every source peak. The references:
 * <ul>
 * <li>bare, bare-kernel: the formula y[m] = Σ a·cos(2π f·t_m + φ), t_m = m·down/(up·fs0);</li>
 * <li>modelled: the same times the chain's analytic H(j2πf) (zeros/poles, the exposure's sinc), gain and phase;</li>
 * <li>ideal: the formula with the tones below the stated pass edge 0.45·fs at unit gain and those above fs/2
 *     absent (the stated ≥ 100 dB stop band); no tone lies in 0.449–0.501·fs of any rate of its case, where the
 *     stated response gives no figure;</li>
 * <li>polyphase-default: the filter's definition ({@link PolyphaseDefinition}: zero insertion, convolution,
 *     every down-th sample) on the formula's source samples, with the taps from scipy.signal.firwin.</li>
 * </ul>
 * The tone sets are built to be hard: close pairs (0.5–5 bins apart at a rate), tones near fs/2 and near k·fs
 * of a rate, tones at the top of the band (0.45–0.485·fs0; for bare-kernel, whose kernel is accurate to −100 dB
 * only up to 0.39·fs0, the band ends there: 0.355–0.39·fs0).
 */
class GroundTruthTest {
    static SweepEngine engine;

    @BeforeAll
    static void start() {
        engine = new SweepEngine(2);
    }

    @AfterAll
    static void stop() {
        engine.close();
    }

    static final DoublePredicate ANY = f -> true;

    static Case formulaCase(Resampling mode, RateLadder ladder, List<Tone> tones, ModelledChannel ch) {
        return new Case() {
            @Override
            public Resampling mode() {
                return mode;
            }

            @Override
            public RateLadder ladder() {
                return ladder;
            }

            @Override
            public List<Tone> tones() {
                return tones;
            }

            @Override
            public double[] reference(RateStep step, long m, double[] x) {
                return GroundTruth.formula(tones, step, m,
                        t -> ch == null ? Complex.ONE : ExactChainFilter.chainResponse(ch, t.f()));
            }

            @Override
            public String extra() {
                return ch == null ? "" : ", " + ch;
            }
        };
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

    static void assertAgrees(Outcome o) {
        assertTrue(o.bad().isEmpty(), o.firstBad());
    }

    @Test
    @DisplayName("bare mode: 120 random hard tone sets, 3 rates each: the same peaks, levels to 0.1 dB, verdicts as the formula's")
    void bareAgreesWithTheFormula() {
        Outcome o = GroundTruth.run(engine, 120, 20261203L, r -> {
            RateLadder ladder = GroundTruth.randomLadder(r, 1000);
            return formulaCase(Resampling.bare(), ladder, GroundTruth.tones(r, GroundTruth.rates(ladder), 0.485, ANY), null);
        });
        assertAgrees(o);
        // the cases must exercise more than the easy verdicts
        assertTrue(o.count(Verdict.FOLDS) > 50 && o.count(Verdict.SURVIVES) > 50, o.seen().toString());
        assertTrue(o.count(Verdict.HIDDEN) + o.count(Verdict.COINCIDES) > 10, o.seen().toString());
        assertTrue(o.count(Verdict.AT_DC) + o.count(Verdict.AT_NYQUIST) > 10, o.seen().toString());
    }

    @Test
    @DisplayName("modelled mode: 120 random tone sets through 6 chains (fs0/fc 2..50, elliptic, resonance, exposure): as the formula's")
    void modelledAgreesWithTheFormula() {
        Outcome o = GroundTruth.run(engine, 120, 1203L, r -> {
            RateLadder ladder = GroundTruth.randomLadder(r, 1000);
            List<Tone> tones = GroundTruth.tones(r, GroundTruth.rates(ladder), 0.485, ANY);
            ModelledChannel ch = chain(r);
            return formulaCase(Resampling.modelledChannel(ch), ladder, tones, ch);
        });
        assertAgrees(o);
        assertTrue(o.count(Verdict.FOLDS) > 50 && o.count(Verdict.SURVIVES) > 50, o.seen().toString());
        assertTrue(o.count(Verdict.REMOVED) > 10, o.seen().toString());
        assertTrue(o.count(Verdict.HIDDEN) + o.count(Verdict.COINCIDES) > 5, o.seen().toString());
    }

    @Test
    @DisplayName("bare-kernel mode: 60 random tone sets within its accurate band (to 0.39·fs0), 3 rates each: as the formula's")
    void bareKernelAgreesWithTheFormulaInItsBand() {
        Outcome o = GroundTruth.run(engine, 60, 391L, r -> {
            RateLadder ladder = GroundTruth.randomLadder(r, 1000);
            return formulaCase(Resampling.bareKernel(), ladder, GroundTruth.tones(r, GroundTruth.rates(ladder), 0.39, ANY),
                    null);
        });
        assertAgrees(o);
        assertTrue(o.count(Verdict.FOLDS) > 30 && o.count(Verdict.SURVIVES) > 30, o.seen().toString());
        assertTrue(o.count(Verdict.HIDDEN) + o.count(Verdict.COINCIDES) > 5, o.seen().toString());
    }

    /** The ideal decimator's case: tones clear of every rate's transition band, plus a pass-edge tone and a close pair. */
    static Case idealCase(Random r) {
        RateLadder ladder = GroundTruth.randomLadder(r, 200);
        double[] rates = GroundTruth.rates(ladder);
        DoublePredicate clear = f -> Arrays.stream(rates).noneMatch(fs -> f >= 0.449 * fs && f <= 0.501 * fs);
        List<Tone> tones = new ArrayList<>(GroundTruth.tones(r, rates, 0.485, clear));
        double fs = rates[r.nextInt(rates.length)];
        double edge = fs * (0.43 + 0.019 * r.nextDouble());                         // just inside the pass edge
        double fs2 = rates[r.nextInt(rates.length)];
        double f1 = fs2 * (0.02 + 0.4 * r.nextDouble());                            // a close pair in a pass band
        double f2 = f1 + (r.nextBoolean() ? 1 : -1) * (0.5 + 4.5 * r.nextDouble()) * GroundTruth.binAt(fs2);
        for (double f : new double[] {edge, f1, f2}) {
            double a = Math.pow(10, -2.5 * r.nextDouble());
            double phi = 2 * Math.PI * r.nextDouble();
            if (clear.test(f) && f > 0.002 * FS0) {
                tones.add(new Tone(f, a, phi));
            }
        }
        Resampling mode = Resampling.idealDecimator();
        return new Case() {
            @Override
            public Resampling mode() {
                return mode;
            }

            @Override
            public RateLadder ladder() {
                return ladder;
            }

            @Override
            public List<Tone> tones() {
                return tones;
            }

            @Override
            public double[] reference(RateStep step, long m, double[] x) {
                double pass = 0.45 * Math.min(step.effectiveRate(), FS0);
                return GroundTruth.formula(tones, step, m, t -> t.f() < pass ? Complex.ONE : null);
            }
        };
    }

    @Test
    @DisplayName("ideal mode: 80 random tone sets, 3 rates each: as the formula with the pass band at unit gain and the stop band empty")
    void idealAgreesWithItsStatedResponse() {
        Outcome o = GroundTruth.run(engine, 80, 45L, GroundTruthTest::idealCase);
        assertAgrees(o);
        assertTrue(o.count(Verdict.SURVIVES) > 50 && o.count(Verdict.REMOVED) > 50, o.seen().toString());
        assertTrue(o.count(Verdict.HIDDEN) + o.count(Verdict.COINCIDES) + o.count(Verdict.SPLITS) > 5, o.seen().toString());
    }

    /** The polyphase-default case: three of the committed ratios, any hard tone set. */
    static Case polyphaseCase(Random r) {
        List<int[]> all = new ArrayList<>(PolyphaseDefinition.ratios());
        double[] req = new double[3];
        for (int i = 0; i < req.length; i++) {
            int[] ud = all.remove(r.nextInt(all.size()));
            req[i] = FS0 * ud[0] / ud[1];
        }
        RateLadder ladder = RateLadder.ofRates(FS0, req, 25);
        List<Tone> tones = GroundTruth.tones(r, GroundTruth.rates(ladder), 0.485, ANY);
        Resampling mode = Resampling.polyphaseDefault();
        return new Case() {
            @Override
            public Resampling mode() {
                return mode;
            }

            @Override
            public RateLadder ladder() {
                return ladder;
            }

            @Override
            public List<Tone> tones() {
                return tones;
            }

            @Override
            public double[] reference(RateStep step, long m, double[] x) {
                return PolyphaseDefinition.apply(x, step.up(), step.down(), m);
            }
        };
    }

    @Test
    @DisplayName("polyphase-default mode: 80 random tone sets, 3 rates each: as the filter's definition with scipy's firwin taps")
    void polyphaseDefaultAgreesWithItsDefinition() {
        Outcome o = GroundTruth.run(engine, 80, 2010L, GroundTruthTest::polyphaseCase);
        assertAgrees(o);
        assertTrue(o.count(Verdict.SURVIVES) > 50, o.seen().toString());
        assertTrue(o.count(Verdict.FOLDS) + o.count(Verdict.REMOVED) > 30, o.seen().toString());
    }
}
