package org.foldbook.bench.resample;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.resample.BareSampler;
import org.foldbook.dsp.resample.IdealDecimator;
import org.foldbook.dsp.resample.KaiserPolyphaseResampler;
import org.foldbook.dsp.resample.ModelledChannel;
import org.foldbook.dsp.resample.ModelledChannelResampler;
import org.foldbook.dsp.resample.RateRatio;
import org.foldbook.dsp.resample.ResampleRun;
import org.foldbook.dsp.resample.SampleSink;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Re-sampling alone (no spectrum) over the stepped-rate ladder of the scipy peer's default run: N source
 * samples at 100 kS/s, 100 rates from 100 kS/s down to 2 kS/s, geometric, ratios snapped with
 * limit_denominator(1000). One operation = the whole ladder, one thread, operators designed inside
 * (as the peer times it); outputs go block by block into a reused buffer, as a sweep consumes them.
 * The baseline in the same run copies the recording once per rate (the least any per-rate pass costs).
 * Report each mode as a ratio to {@code copyLadder}; single-machine figures are noisy.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xms2g", "-Xmx2g", "--add-modules=jdk.incubator.vector"})
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 3)
public class ResampleLadderBenchmark {

    static final double FS0 = 100_000.0;
    static final int BLOCK = 1 << 15;

    @Param({"1000000"})
    public int samples;

    private double[] x;
    private double[] copy;
    private double[] block;
    private List<RateRatio> ladder;
    private ModelledChannel channel;

    @Setup
    public void setUp() {
        Random r = new Random(12345);            // synthetic input: the peer's five tones plus noise
        x = new double[samples];
        double[][] tones = {{1000, 1.0, 0.1}, {4700, 0.5, 0.7}, {13300, 0.3, 1.3}, {27100, 0.2, 2.1}, {38900, 0.1, 2.9}};
        for (int i = 0; i < samples; i++) {
            double v = 0.01 * r.nextGaussian();
            for (double[] t : tones) {
                v += t[1] * Math.sin(2 * Math.PI * t[0] * i / FS0 + t[2]);
            }
            x[i] = v;
        }
        copy = new double[samples];
        block = new double[BLOCK];
        ladder = ladder(FS0, 2000.0, 100, 1000);
        channel = ModelledChannel.none().withAnalog(AnalogLowPass.butterworth(4, 20_000))
                .withDigitizerFilter(new ModelledChannel.DigitizerFilter(0.45, 0.55, 100));
    }

    /** Requested rates geometric from fs0 to fsMin, snapped to fractions, duplicates dropped. */
    static List<RateRatio> ladder(double fs0, double fsMin, int n, long maxDen) {
        Set<RateRatio> set = new LinkedHashSet<>();
        for (int i = 0; i < n; i++) {
            double rate = fs0 * Math.pow(fsMin / fs0, i / (double) (n - 1));
            set.add(RateRatio.nearest(rate / fs0, maxDen));
        }
        return new ArrayList<>(set);
    }

    @Benchmark
    public double copyLadder() {
        double s = 0;
        for (int i = 0; i < ladder.size(); i++) {
            System.arraycopy(x, 0, copy, 0, x.length);
            s += copy[i];
        }
        return s;
    }

    @Benchmark
    public double bareLadder() {
        double s = 0;
        for (RateRatio q : ladder) {
            BareSampler b = BareSampler.of(q);
            long m = q.outputLength(x.length);
            for (long first = 0; first < m; first += BLOCK) {
                int c = (int) Math.min(BLOCK, m - first);
                b.evaluate(x, first, block, 0, c);
                s += block[c - 1];
            }
        }
        return s;
    }

    @Benchmark
    public double resamplePolyLadder() {
        double s = 0;
        for (RateRatio q : ladder) {
            KaiserPolyphaseResampler k = KaiserPolyphaseResampler.resamplePolyDefaults(q);
            long m = q.outputLength(x.length);
            for (long first = 0; first < m; first += BLOCK) {
                int c = (int) Math.min(BLOCK, m - first);
                k.evaluate(x, first, block, 0, c);
                s += block[c - 1];
            }
        }
        return s;
    }

    @Benchmark
    public void idealLadder(Blackhole bh) {
        SampleSink sink = (b, o, l) -> bh.consume(b[o]);
        for (RateRatio q : ladder) {
            streamThrough(IdealDecimator.of(q).start(sink));
        }
    }

    @Benchmark
    public void modelledLadder(Blackhole bh) {
        SampleSink sink = (b, o, l) -> bh.consume(b[o]);
        for (RateRatio q : ladder) {
            streamThrough(ModelledChannelResampler.of(q, FS0, channel).start(sink));
        }
    }

    private void streamThrough(ResampleRun run) {
        for (int off = 0; off < x.length; off += BLOCK) {
            run.push(x, off, Math.min(BLOCK, x.length - off));
        }
        run.finish();
    }
}
