package org.foldbook.dsp.resample;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.fft.RealFft;
import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.filter.Complex;

/**
 * The modelled chain's rate-independent part applied with its true response: every analog filter of a
 * {@link ModelledChannel} (any family, order, resonance or band-pass, magnitude and phase from its
 * zeros/poles) times a camera exposure's box-car, sin(πfT)/(πfT) centred on the frame instant. The
 * recording is taken as the band-limited signal its samples stand for; its spectrum is multiplied by
 * H(j2πf) and the result comes out at twice the source rate, so that the bare kernel that samples it
 * afterwards works far inside its flat band (content at 0.49·fs0 sits at 0.245 of 2·fs0).
 *
 * <p><b>How.</b> Frequency sampling on a fine grid: D(f) = 2·H(j2πf)·T(f) for f &lt; 0.51·fs0 and 0 above
 * (T: {@link SourceBandTaper}, 1 up to 0.49·fs0; the 2 makes up for the zero-stuffing), inverse
 * {@link RealFft} at rate 2·fs0, and the impulse response kept between the points beyond which the sum of
 * |h| is below 1e-9 on either side (the grid is doubled until it is four times that support). The kept
 * kernel runs by overlap-save ({@link FftConvolver}). The response then differs from H by at most
 * {@link #errorBound()} (the discarded sum): within 0.1 dB wherever H is above
 * {@link #accurateAboveDb()} (about −140 dB), over 0..0.49·fs0, for any fs0/fc.
 *
 * <p><b>Limits</b> (stated per design in {@link #warnings()}): content at 0.49–0.51·fs0 is faded by T and
 * mirrored about fs0/2; content the chain would pass above fs0/2 was never recorded. Immutable and
 * thread-safe; a {@link #start run} holds the streaming state.
 */
public final class ExactChainFilter {

    /** Up to this fraction of fs0 the response is the chain's within {@link #errorBound()}. */
    public static final double EXACT_UP_TO_FRACTION = SourceBandTaper.START;
    /** The level (dB re pass band) above which the response must hold within 0.1 dB. */
    public static final double TARGET_FLOOR_DB = -120;
    /** Output samples per source sample. */
    public static final int FACTOR = 2;

    static final double TAIL = 1e-9;
    static final double TENTH_DB = Math.pow(10, 0.1 / 20) - 1;
    private static final int MIN_GRID = 1 << 16;
    private static final int MAX_GRID = 1 << 20;
    private static final int MAX_KERNEL = 1 << 18;

    private final double sourceRate;
    private final List<AnalogFilter> analog;
    private final double exposureSeconds;
    private final FftConvolver.Spectrum spectrum;
    private final double errorBound;
    private final List<SimulationWarning> warnings;

    private ExactChainFilter(ModelledChannel channel, double sourceRate) {
        this.sourceRate = Check.positive("sourceRate", sourceRate);
        Objects.requireNonNull(channel, "channel");
        this.analog = channel.analogFilters();
        this.exposureSeconds = channel.exposureSeconds();
        Design d = design();
        this.spectrum = new FftConvolver.Spectrum(d.kernel, d.delay);
        this.errorBound = d.discarded / FACTOR;
        this.warnings = List.copyOf(limits());
    }

    /** The exact filter for {@code channel}'s analog filters and exposure at source rate {@code sourceRate}. */
    public static ExactChainFilter of(ModelledChannel channel, double sourceRate) {
        return new ExactChainFilter(channel, sourceRate);
    }

    public double sourceRate() {
        return sourceRate;
    }

    /** 2·fs0, the rate of {@link #apply}'s output. */
    public double outputRate() {
        return FACTOR * sourceRate;
    }

    /** H(j2πf) of the model: the analog filters in series times the exposure's sinc (real, centred). */
    public Complex chainResponse(double frequencyHz) {
        return modelResponse(analog, exposureSeconds, frequencyHz);
    }

    /** H(j2πf) of {@code channel}'s analog filters and exposure (its digitizer filter left out). */
    public static Complex chainResponse(ModelledChannel channel, double frequencyHz) {
        return modelResponse(channel.analogFilters(), channel.exposureSeconds(), frequencyHz);
    }

    private static Complex modelResponse(List<AnalogFilter> analog, double exposureSeconds, double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        Complex h = Complex.ONE;
        for (AnalogFilter a : analog) {
            h = h.times(a.response(frequencyHz));
        }
        return exposureSeconds > 0 ? h.times(sinc(frequencyHz * exposureSeconds)) : h;
    }

    /** The source-band edge T(f) every exact filter applies (1 up to 0.49·fs0, 0 from 0.51·fs0). */
    public static double sourceBandEdge(double frequencyHz, double sourceRate) {
        return SourceBandTaper.at(frequencyHz, sourceRate);
    }

    /** |H(j2πf)| of the model. */
    public double chainMagnitude(double frequencyHz) {
        return chainResponse(frequencyHz).abs();
    }

    /** What this filter applies to source content at f: the chain times the source-band edge T(f). */
    public Complex simulatedResponse(double frequencyHz) {
        return chainResponse(frequencyHz).times(SourceBandTaper.at(frequencyHz, sourceRate));
    }

    /** sin(πx)/(πx), exact 0 at the nulls. */
    static double sinc(double x) {
        if (x == 0) {
            return 1;
        }
        if (x == Math.rint(x)) {
            return 0;
        }
        return Math.sin(Math.PI * x) / (Math.PI * x);
    }

    /** Largest deviation of the realised response from {@link #simulatedResponse} (re a pass band of 1). */
    public double errorBound() {
        return errorBound;
    }

    /** Where the chain's level (dB) is above this, the realised response is within 0.1 dB of it. */
    public double accurateAboveDb() {
        return 20 * Math.log10(errorBound / TENTH_DB);
    }

    /** Kernel taps at 2·fs0. */
    public int kernelLength() {
        return spectrum.length;
    }

    /** What this design cannot honour, band by band (empty when nothing). */
    public List<SimulationWarning> warnings() {
        return warnings;
    }

    /** The filtered recording at 2·fs0: output 2m at source sample m, 2m + 1 halfway to the next. */
    public double[] apply(double[] samples) {
        Check.finiteSamples("samples", samples);
        if ((long) FACTOR * samples.length > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("samples: " + samples.length + " are too many to filter into one array");
        }
        double[] out = new double[FACTOR * samples.length];
        int[] pos = {0};
        ResampleRun run = start((b, o, l) -> {
            System.arraycopy(b, o, out, pos[0], l);
            pos[0] += l;
        });
        run.push(samples, 0, samples.length);
        run.finish();
        return out;
    }

    /** A block-by-block pass whose 2·fs0 outputs go to {@code sink}. */
    public ResampleRun start(SampleSink sink) {
        return new FftConvolver(spectrum, FACTOR, Objects.requireNonNull(sink, "sink"));
    }

    private record Design(double[] kernel, int delay, double discarded) {
    }

    /** Decay length (output samples) of the slowest pole to 1e-10, plus the exposure and the taper's ringing. */
    private int supportEstimate() {
        double slowest = Double.POSITIVE_INFINITY;
        for (AnalogFilter a : analog) {
            for (Complex p : a.poles()) {
                slowest = Math.min(slowest, -p.re());
            }
        }
        double est = 4000 + FACTOR * exposureSeconds * sourceRate;
        if (Double.isFinite(slowest)) {
            est += 23 * FACTOR * sourceRate / slowest;
        }
        return (int) Math.min(MAX_GRID, est);
    }

    private Design design() {
        int m = Math.max(MIN_GRID, Integer.highestOneBit(Math.max(1, 8 * supportEstimate() - 1)) << 1);
        m = Math.min(m, MAX_GRID);
        for (;;) {
            double[] h = impulseResponse(m);
            // from the middle outwards: the causal tail beyond q and the precursor before −p are each ≤ TAIL
            int half = m / 2;
            double tailQ = 0;
            int q = half - 1;
            while (q > 0 && tailQ + Math.abs(h[q]) <= TAIL) {
                tailQ += Math.abs(h[q--]);
            }
            double tailP = 0;
            int idx = half;
            while (idx < m - 1 && tailP + Math.abs(h[idx]) <= TAIL) {
                tailP += Math.abs(h[idx++]);
            }
            int p = m - idx;
            int length = p + q + 1;
            if (length > m / 4 && m < MAX_GRID) {
                m *= 2;
                continue;
            }
            double discarded = tailQ + tailP;
            if (length > MAX_KERNEL) {          // keep the largest taps around time zero
                int keepQ = Math.min(q, MAX_KERNEL - 1 - Math.min(p, MAX_KERNEL / 16));
                int keepP = MAX_KERNEL - 1 - keepQ;
                for (int i = keepQ + 1; i <= q; i++) {
                    discarded += Math.abs(h[i]);
                }
                for (int i = keepP + 1; i <= p; i++) {
                    discarded += Math.abs(h[m - i]);
                }
                q = keepQ;
                p = Math.min(p, keepP);
                length = p + q + 1;
            }
            double[] kernel = new double[length];
            for (int j = 0; j < p; j++) {
                kernel[j] = h[m - p + j];
            }
            System.arraycopy(h, 0, kernel, p, q + 1);
            return new Design(kernel, p, discarded);
        }
    }

    /** The circular impulse response at 2·fs0 on an {@code m}-point grid of D(f). */
    private double[] impulseResponse(int m) {
        RealFft fft = RealFft.of(m);
        double[] re = new double[fft.bins()];
        double[] im = new double[fft.bins()];
        double rate = outputRate();
        double end = SourceBandTaper.END * sourceRate;
        for (int k = 0; k < fft.bins(); k++) {
            double f = k * rate / m;
            if (f >= end) {
                break;
            }
            Complex d = simulatedResponse(f).times(FACTOR);
            re[k] = d.re();
            im[k] = d.im();
        }
        double[] h = new double[m];
        fft.inverseInPlace(re, im, h);
        return h;
    }

    private List<SimulationWarning> limits() {
        List<SimulationWarning> w = new ArrayList<>();
        double fs0 = sourceRate;
        double edge = EXACT_UP_TO_FRACTION * fs0;
        double atEdge = db(chainMagnitude(edge));
        if (atEdge > TARGET_FLOOR_DB) {
            w.add(new SimulationWarning(edge, fs0 / 2, 6.03, String.format(java.util.Locale.ROOT,
                    "source content at %.6g–%.6g Hz (0.49–0.50 of the source rate) is simulated only approximately: "
                            + "faded by up to 6 dB towards %.6g Hz, with a mirror image about that frequency; the chain "
                            + "passes it at %.1f dB", edge, fs0 / 2, fs0 / 2, atEdge)));
        }
        double atNyquist = db(chainMagnitude(fs0 / 2));
        if (atNyquist > TARGET_FLOOR_DB) {
            double last = fs0 / 2;
            int points = 4000;
            double top = 1000 * fs0;
            for (int i = 1; i <= points; i++) {
                double f = fs0 / 2 * Math.pow(top / (fs0 / 2), (double) i / points);
                if (db(chainMagnitude(f)) > TARGET_FLOOR_DB) {
                    last = f;
                }
            }
            double to = last >= top * 0.999 ? Double.POSITIVE_INFINITY : last;
            w.add(new SimulationWarning(fs0 / 2, to, Double.POSITIVE_INFINITY, String.format(java.util.Locale.ROOT,
                    "the chain passes %.1f dB at %.6g Hz (half the source rate) and stays above %.0f dB up to %s: "
                            + "the real chain lets such content through, but a recording at %.6g S/s cannot hold it, "
                            + "so its aliases are missing from this simulation", atNyquist, fs0 / 2, TARGET_FLOOR_DB,
                    Double.isInfinite(to) ? "beyond " + String.format(java.util.Locale.ROOT, "%.6g Hz", top)
                            : String.format(java.util.Locale.ROOT, "%.6g Hz", to), fs0)));
        }
        double acc = accurateAboveDb();
        if (acc > TARGET_FLOOR_DB) {
            double from = edge;
            for (int i = 0; i <= 2000; i++) {
                double f = edge * i / 2000;
                if (db(chainMagnitude(f)) < acc) {
                    from = f;
                    break;
                }
            }
            w.add(new SimulationWarning(from, edge, Double.POSITIVE_INFINITY, String.format(java.util.Locale.ROOT,
                    "the simulated chain response is held to 0.1 dB only where it lies above %.1f dB (kernel of %d "
                            + "taps, deviation up to %.3g re the pass band); below that level it is uncertain",
                    acc, kernelLength(), errorBound)));
        }
        return w;
    }

    private static double db(double magnitude) {
        return 20 * Math.log10(magnitude);
    }
}
