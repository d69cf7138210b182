package org.foldbook.dsp.resample;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * Mode 3, what a correct digital down-sampler gives: a multi-stage polyphase rational re-sampler with a
 * stated response. For the new rate fs (or the source rate, if that is lower):
 * <ul>
 * <li>pass band 0 .. {@code passFraction}·fs (default 0.45): ripple ≤ 0.001 dB, measured by the tests;</li>
 * <li>stop band from {@code stopFraction}·fs (default 0.5, the new Nyquist frequency): ≥
 *     {@code attenuationDb} (default 100 dB) — so nothing folds into the new band by more than that;</li>
 * <li>zero delay: output m sits at t_m = m·down/up input samples, as in the other modes.</li>
 * </ul>
 * Stages: halving stages by Kaiser low-passes ({@link KaiserLowPass}) while the rate stays ≥ 2·fs, then
 * one small rational stage (ratio in (1/2, 1]). Each halving stage only has to keep its own aliases out
 * of [0, stopFraction·fs], so its transition band is wide and it needs few taps; the final stage does
 * the sharp edge at the lowest rate. Cost at the default edges ({@link #multiplyAddsPerInputSample()}):
 * about 27 multiply-adds per input sample for strong decimation (1/50, six stages), against ≈ 130·50
 * for one sharp stage at the source rate; 60–90 between 1/5 and 1/3; ≈ 133 for ratios in [1/2, 1),
 * which have only the sharp stage (≈ 130/r taps per output: a 5 % transition at ≥ 100 dB is that long).
 * {@code Spec(0.45, 0.55, 100)} (the usual digitizer edges) halves that, at the price of letting
 * 0.5–0.55·fs fold into 0.45–0.5·fs.
 *
 * <p>Immutable and thread-safe.
 */
public final class IdealDecimator implements Resampler {

    /**
     * The response: edges as fractions of the output rate (or of the source rate when up-sampling).
     *
     * @param passFraction pass-band edge, (0, stopFraction)
     * @param stopFraction stop-band edge, (passFraction, 0.5]
     * @param attenuationDb stop-band attenuation, [20, 200]
     */
    public record Spec(double passFraction, double stopFraction, double attenuationDb) {
        /** 0.45 / 0.5 / 100 dB. */
        public static final Spec DEFAULT = new Spec(0.45, 0.5, 100.0);

        public Spec {
            Check.inRange("passFraction", passFraction, Double.MIN_NORMAL, 0.5);
            Check.inRange("stopFraction", stopFraction, Double.MIN_NORMAL, 0.5);
            if (!(stopFraction > passFraction)) {
                throw new IllegalArgumentException("stopFraction must exceed passFraction " + passFraction + ", was "
                        + stopFraction);
            }
            Check.inRange("attenuationDb", attenuationDb, 20, 200);
        }
    }

    /** Extra attenuation asked of each stage so that Kaiser's length estimate still meets the spec. */
    static final double DESIGN_MARGIN_DB = 3.0;

    /** One stage: its polyphase kernel and prototype, rates relative to the source rate. */
    record Stage(RateRatio ratio, PolyphaseKernel kernel, KaiserLowPass prototype, double inputRate) {
        double outputRate() {
            return inputRate * ratio.toDouble();
        }
    }

    private final RateRatio ratio;
    private final Spec spec;
    private final List<Stage> stages;   // empty for ratio 1/1 (a copy)

    private IdealDecimator(RateRatio ratio, Spec spec) {
        this.ratio = Objects.requireNonNull(ratio, "ratio");
        this.spec = Objects.requireNonNull(spec, "spec");
        this.stages = plan(ratio, spec);
    }

    /** The default response (0.45 / 0.5 / 100 dB) for {@code ratio}. */
    public static IdealDecimator of(RateRatio ratio) {
        return new IdealDecimator(ratio, Spec.DEFAULT);
    }

    public static IdealDecimator of(RateRatio ratio, Spec spec) {
        return new IdealDecimator(ratio, spec);
    }

    private static List<Stage> plan(RateRatio ratio, Spec spec) {
        List<Stage> out = new ArrayList<>();
        if (ratio.up() == ratio.down()) {
            return out;
        }
        double r = ratio.toDouble();
        double band = Math.min(1.0, r);                    // the rate whose band is kept, source rate = 1
        double pass = spec.passFraction() * band;
        double stop = spec.stopFraction() * band;
        double a = spec.attenuationDb() + DESIGN_MARGIN_DB;
        long up = ratio.up();
        long down = ratio.down();
        double rate = 1.0;
        // halving stages while the remaining ratio is <= 1/2
        int halvings = 0;
        while (up * (2L << halvings) <= down) {
            halvings++;
        }
        for (int s = 0; s < halvings; s++) {
            double g = rate / 2;
            KaiserLowPass h = KaiserLowPass.design(rate, pass, g - stop, a);
            out.add(new Stage(RateRatio.of(1, 2), PolyphaseKernel.fromPrototype(1, 2, h.coefficientsShared(), h.centre()), h,
                    rate));
            rate = g;
        }
        RateRatio last = RateRatio.of(up << halvings, down);
        if (!(last.up() == 1 && last.down() == 1)) {
            int u = BareSampler.phaseCount(last);
            int d = BareSampler.intDown(last);
            // prototype at u·rate; its stop edge is the kept band's own edge (this also removes the images
            // that zero-stuffing by u creates, which start at rate − pass)
            KaiserLowPass h = KaiserLowPass.design(u * rate, pass, stop, a);
            double[] g = h.coefficients();
            for (int i = 0; i < g.length; i++) {
                g[i] *= u;
            }
            out.add(new Stage(last, PolyphaseKernel.fromPrototype(u, d, g, h.centre()), h, rate));
        }
        return out;
    }

    @Override
    public RateRatio ratio() {
        return ratio;
    }

    public Spec spec() {
        return spec;
    }

    /** Number of stages (0 for 1/1). */
    public int stageCount() {
        return stages.size();
    }

    /** Multiply-adds per input sample, summed over the stages (the cost figure of the class comment). */
    public double multiplyAddsPerInputSample() {
        double total = 0;
        double outPerIn = 1;
        for (Stage s : stages) {
            outPerIn *= s.ratio().toDouble();
            total += outPerIn * s.kernel().taps();
        }
        return total;
    }

    /**
     * |H(f)| of the whole chain for source content at {@code frequency} given as a fraction of the source
     * rate (aliases aside: the gain the content gets before it is sampled at the new rate).
     */
    public double magnitude(double frequency) {
        Check.finite("frequency", frequency);
        double m = 1;
        for (Stage s : stages) {
            // each prototype runs at (stage up)·(stage input rate); its DC gain is 1 (up re-applied in the table)
            m *= Math.abs(KaiserLowPass.amplitude(s.prototype().coefficientsShared(),
                    frequency / (s.inputRate() * s.ratio().up())));
        }
        return m;
    }

    List<Stage> stages() {
        return stages;
    }

    @Override
    public double[] apply(double[] samples) {
        Check.finiteSamples("samples", samples);
        long total = ratio.outputLength(samples.length);
        if (total > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("samples: " + samples.length + " inputs give " + total
                    + " outputs, too many for one array; use start(sink)");
        }
        double[] cur = samples;
        if (stages.isEmpty()) {
            return samples.clone();
        }
        for (Stage s : stages) {
            long n = s.ratio().outputLength(cur.length);
            double[] next = new double[(int) n];
            s.kernel().evaluate(cur, cur.length, 0, next, 0, next.length);
            cur = next;
        }
        return cur.length == total ? cur : Arrays.copyOf(cur, (int) total);
    }

    @Override
    public ResampleRun start(SampleSink sink) {
        Objects.requireNonNull(sink, "sink");
        return new ChainRun(sink);
    }

    /** The stages' runs chained; the last one's outputs are cut at ceil(N·up/down). */
    private final class ChainRun implements ResampleRun {
        private final ResampleRun[] runs;
        private final SampleSink sink;
        private long limit = Long.MAX_VALUE;
        private long delivered;
        private long inputs;
        private boolean finished;

        ChainRun(SampleSink sink) {
            this.sink = sink;
            runs = new ResampleRun[Math.max(1, stages.size())];
            SampleSink next = this::deliver;
            if (stages.isEmpty()) {
                runs[0] = new PickRun(1, next);
            } else {
                for (int i = stages.size() - 1; i >= 0; i--) {
                    ResampleRun run = new PolyphaseRun(stages.get(i).kernel(), next);
                    runs[i] = run;
                    next = run::push;
                }
            }
        }

        private void deliver(double[] b, int off, int len) {
            int n = (int) Math.min(len, limit - delivered);
            if (n > 0) {
                delivered += n;
                sink.accept(b, off, n);
            }
        }

        @Override
        public void push(double[] samples, int offset, int length) {
            runs[0].push(samples, offset, length);
            inputs += length;
        }

        @Override
        public void finish() {
            if (finished) {
                return;
            }
            finished = true;
            limit = ratio.outputLength(inputs);
            for (ResampleRun r : runs) {
                r.finish();
            }
        }

        @Override
        public long inputCount() {
            return inputs;
        }

        @Override
        public long outputCount() {
            return delivered;
        }
    }
}
