package org.foldbook.model.validation;

import static org.foldbook.model.validation.FindingKind.CUTOFF_AT_OR_ABOVE_NYQUIST;
import static org.foldbook.model.validation.FindingKind.EXPOSURE_LONGER_THAN_FRAME;
import static org.foldbook.model.validation.FindingKind.NO_SAMPLING_STAGE;
import static org.foldbook.model.validation.FindingKind.PROTECTION_SHORT_OF_NEED;
import static org.foldbook.model.validation.FindingKind.UNPROTECTED_BAND_FOLDS;
import static org.foldbook.model.validation.FindingReport.hz;
import static org.foldbook.model.validation.FindingReport.report;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.digitizer.RateSearchResult;
import org.foldbook.model.Camera;
import org.foldbook.model.Digitizer;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainFigures.Band;

/** Rules about a signal chain as a whole: it samples, and what reaches the sampler cannot fold unseen. */
public final class ChainRules {

    private ChainRules() {
    }

    public static boolean hasSamplingStage(SignalChain chain, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        if (ChainFigures.samplingStage(chain) != null) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, NO_SAMPLING_STAGE, chain,
                "no stage samples the signal (no digitizer or camera)",
                "Add the digitizer or camera the signal was recorded with as the last stage");
    }

    /** A low-pass whose cutoff is at or above fs/2 leaves content between fs/2 and the cutoff to fold. */
    public static boolean filterCutoffBelowNyquist(SignalChain chain, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Stage filter = ChainFigures.filterStage(chain);
        double nyquist = ChainFigures.nyquistHz(chain);
        if (filter == null || Double.isNaN(nyquist)) {
            return true;
        }
        double cutoff = ChainFigures.effectiveCutoffHz(filter);
        if (cutoff < nyquist) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, CUTOFF_AT_OR_ABOVE_NYQUIST, chain,
                "the anti-alias cutoff " + hz(cutoff) + " is at or above the Nyquist frequency " + hz(nyquist)
                        + " (sampling at " + hz(2 * nyquist) + ")",
                "Lower the cutoff well below " + hz(nyquist) + " or raise the sampling rate above "
                        + hz(2 * cutoff));
    }

    /**
     * Warning when nothing low-passes the signal while the sensor passes content above Nyquist: names
     * the band that will fold and where it lands.
     */
    public static boolean sensorBandProtected(SignalChain chain, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        double rate = ChainFigures.samplingRateHz(chain);
        if (Double.isNaN(rate) || !(rate > 0) || ChainFigures.filterStage(chain) != null
                || ChainFigures.hasBuiltInDigitalFilter(chain)) {
            return true;
        }
        double upper = ChainFigures.frontEndUpperHz(chain);
        Optional<Band> folded = ChainFigures.foldedBandHz(upper, rate);
        if (folded.isEmpty()) {
            return true;
        }
        return report(diagnostics, Diagnostic.WARNING, UNPROTECTED_BAND_FOLDS, chain,
                "no anti-alias filter, and the front end passes up to " + hz(upper) + ": content from "
                        + hz(rate / 2) + " to " + hz(upper) + " will fold into " + hz(folded.get().lowHz()) + " to " + hz(folded.get().highHz())
                        + " at " + hz(rate),
                "Add a low-pass filter with its cutoff below " + hz(rate / 2) + ", or sample above "
                        + hz(2 * upper));
    }

    /**
     * Warning when a chain has anti-alias filtering (analog or a digitizer's built-in filter) but it
     * falls short of the need (dynamic range + out-of-band level): names the shortfall, the alias-free
     * band it does give and what would do, including the lowest rate that keeps the intended band
     * (the cutoff, or the built-in filter's pass band) alias-free. Only for chains that state their
     * out-of-band level; unfiltered chains are left to {@link #sensorBandProtected}.
     */
    public static boolean protectionMeetsNeed(SignalChain chain, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        if (ChainFigures.filterStage(chain) == null && !ChainFigures.hasBuiltInDigitalFilter(chain)) {
            return true;
        }
        Optional<ProtectionFigures> figures = ChainFigures.figures(chain);
        Optional<ChainFigures.Need> need = ChainFigures.need(chain);
        // only once the chain states what it must be protected against: under the worst case (a
        // full-scale tone) almost no real filter passes, and a warning on every chain would say nothing
        if (figures.isEmpty() || need.isEmpty() || !need.get().levelStated() || !(figures.get().marginDb() < 0)) {
            return true;
        }
        ProtectionFigures f = figures.get();
        ChainFigures.Need n = need.get();
        String band = f.aliasFreeBandHz() > 0 ? "0 to " + hz(f.aliasFreeBandHz()) : "none";
        if (!Double.isNaN(f.limitingSourceHz())) {
            band += " (content at " + hz(f.limitingSourceHz()) + " folds to "
                    + hz(org.foldbook.dsp.fold.Folding.apparentHz(f.limitingSourceHz(), f.sampleRateHz())) + ")";
        }
        String problem = String.format(Locale.ROOT,
                "content that folds is attenuated by as little as %.1f dB where %.1f dB is needed (%.1f dB %s + %.1f dBFS %s)"
                        + ": protection margin %.1f dB; alias-free band %s",
                f.requiredAttenuationDb() + f.marginDb(), f.requiredAttenuationDb(), n.dynamicRangeDb(),
                n.rangeStated() ? "dynamic range" : "ideal " + n.bits() + "-bit SNR", n.outOfBandLevelDbfs(),
                n.levelStated() ? "out-of-band content" : "content assumed at full scale", f.marginDb(), band);
        String remedy = "Use a steeper filter or a lower cutoff, or sample faster";
        double intended = ChainFigures.intendedBandHz(chain);
        Optional<RateSearchResult> lowest = ChainFigures.lowestAliasFreeRate(chain, intended);
        if (lowest.isPresent()) {
            Digitizer digitizer = (Digitizer) ChainFigures.samplingStage(chain).getDevice();
            remedy += lowest.get().found()
                    ? String.format(Locale.ROOT, ": %s keeps 0 to %s alias-free with this filter",
                            rate(lowest.get()), hz(intended))
                    : String.format(Locale.ROOT, "; no rate up to the digitizer's %s keeps 0 to %s alias-free with this filter",
                            hz(digitizer.getMaxRateHz()).replace("Hz", "S/s"), hz(intended));
        }
        return report(diagnostics, Diagnostic.WARNING, PROTECTION_SHORT_OF_NEED, chain, problem, remedy);
    }

    /**
     * A searched rate for a message, rounded up to 10 S/s (0.1 S/s below 1 kS/s) from the lowest end of
     * its bracket, so that the rate named is enough: "42.00 kS/s".
     */
    private static String rate(RateSearchResult found) {
        double low = found.rateHz() - found.toleranceHz();
        return low >= 1e3 ? String.format(Locale.ROOT, "%.2f kS/s", Math.ceil(low / 10) / 100)
                : String.format(Locale.ROOT, "%.1f S/s", Math.ceil(low * 10) / 10);
    }

    /** A camera cannot expose longer than one frame period (1/frame rate). */
    public static boolean exposureFitsFramePeriod(SignalChain chain, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Stage stage = ChainFigures.samplingStage(chain);
        if (stage == null || !(stage.getDevice() instanceof Camera camera)) {
            return true;
        }
        Double exposure = stage.getExposureS() != null ? stage.getExposureS() : camera.getExposureS();
        double rate = ChainFigures.samplingRateHz(chain);
        if (exposure == null || !(rate > 0)) {
            return true;
        }
        double period = 1.0 / rate;
        if (exposure <= period) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, EXPOSURE_LONGER_THAN_FRAME, chain,
                String.format(Locale.ROOT, "exposure %.4g ms is longer than the frame period %.4g ms at %s",
                        exposure * 1e3, period * 1e3, hz(rate)),
                String.format(Locale.ROOT, "Shorten the exposure to at most %.4g ms or lower the frame rate to "
                        + "at most %s", period * 1e3, hz(1.0 / exposure)));
    }
}
