package org.foldbook.channel;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

import org.foldbook.dsp.resample.Resampler;
import org.foldbook.dsp.spectrum.Unit;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.sweep.FoldPreview;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.RateStep;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SourceFate;
import org.foldbook.sweep.SourcePeak;
import org.foldbook.sweep.SourceSpectrum;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;

/**
 * The what-if rate, without SWT: the spectrum a chosen rate would show and where every source peak lands
 * there. {@link #preview} answers from the spectral-fold preview (a few thousand bins, no samples touched),
 * {@link #exact} re-samples the recording for that one rate (seconds; run it in a job) and replaces it.
 * Thread-safe: immutable apart from the once-made prepared series.
 */
public final class WhatIfRate {
    private final double[] samples;
    private final SourceSpectrum source;
    private final FoldPreview preview;
    private final Resampling resampling;
    private volatile double[] prepared;

    /** What a rate shows: its PSD in dB on its own bins and the fate of every source peak. */
    public record Spectrum(double rateHz, boolean exact, double[] frequencyHz, double[] levelDb, List<Landing> landings) {
    }

    /** Where source peak {@code sourcePeak} (at {@code sourceHz}) lands at the rate, and the verdict there. */
    public record Landing(int sourcePeak, double sourceHz, double landsAtHz, String verdict, double gainDb) {
    }

    public WhatIfRate(double[] samples, SourceSpectrum source, Resampling resampling) {
        this.samples = Objects.requireNonNull(samples, "samples");
        this.source = Objects.requireNonNull(source, "source");
        this.resampling = Objects.requireNonNull(resampling, "resampling");
        this.preview = new FoldPreview(source);
    }

    public double sourceRate() {
        return source.sourceRate();
    }

    /** The rung the sweep would use for {@code rateHz} (the exact ratio nearest it). */
    public RateStep stepFor(double rateHz) {
        if (!(rateHz > 0) || rateHz > source.sourceRate()) {
            throw new IllegalArgumentException("what-if rate must be above 0 and at most the recording's "
                    + source.sourceRate() + " S/s, was " + rateHz);
        }
        return RateLadder.ofRates(source.sourceRate(), new double[] {rateHz}, 1000).get(0);
    }

    /** At once, from the source PSD: the spectral-fold preview of {@code rateHz}. */
    public Spectrum preview(double rateHz) {
        RateStep step = stepFor(rateHz);
        double[] psd = preview.foldedPsd(step, resampling);
        RateResult r = preview.preview(step, resampling);
        return spectrum(step, false, psd, r);
    }

    /**
     * The exact answer: the recording re-sampled to {@code rateHz} through the mode, its Welch PSD and its
     * verdicts from the same engine the sweep uses.
     *
     * @throws CancellationException when {@code cancelled} turns true
     */
    public Spectrum exact(double rateHz, SweepEngine engine, BooleanSupplier cancelled) {
        RateStep step = stepFor(rateHz);
        SweepProgress progress = new SweepProgress() {
            @Override
            public boolean isCancelled() {
                return cancelled.getAsBoolean();
            }
        };
        RateLadder one = RateLadder.ofRates(source.sourceRate(), new double[] {step.effectiveRate()}, 1000);
        RateResult r = engine.run(samples, source, one, resampling, progress).rates().get(0);
        double[] x = prepared;
        if (x == null) {
            x = resampling.prepare(samples, source.sourceRate());
            prepared = x;
        }
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("what-if cancelled");
        }
        Resampler resampler = resampling.forRate(step);
        double[] y = resampler.apply(x);
        int seg = source.settings().segmentFor(y.length);
        double[] psd = Welch.builder(seg).build().psd(y, step.effectiveRate(), new Unit("unit")).values();
        return spectrum(step, true, psd, r);
    }

    private Spectrum spectrum(RateStep step, boolean exact, double[] psd, RateResult r) {
        double df = step.effectiveRate() / (2.0 * (psd.length - 1));
        double[] f = new double[psd.length];
        double[] db = new double[psd.length];
        for (int i = 0; i < psd.length; i++) {
            f[i] = i * df;
            db[i] = 10 * Math.log10(Math.max(psd[i], 1e-30));
        }
        List<Landing> landings = new ArrayList<>();
        for (SourceFate fate : r.fates()) {
            SourcePeak p = source.peaks().get(fate.sourcePeak());
            landings.add(new Landing(p.id(), p.frequency(), fate.apparentFrequency(), fate.verdict().key(), fate.gainDb()));
        }
        return new Spectrum(step.effectiveRate(), exact, f, db, landings);
    }
}
