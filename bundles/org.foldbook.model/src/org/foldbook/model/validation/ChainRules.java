package org.foldbook.model.validation;

import static org.foldbook.model.validation.Findings.CUTOFF_AT_OR_ABOVE_NYQUIST;
import static org.foldbook.model.validation.Findings.EXPOSURE_LONGER_THAN_FRAME;
import static org.foldbook.model.validation.Findings.NO_SAMPLING_STAGE;
import static org.foldbook.model.validation.Findings.UNPROTECTED_BAND_FOLDS;
import static org.foldbook.model.validation.Findings.hz;
import static org.foldbook.model.validation.Findings.report;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.foldbook.model.Camera;
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
