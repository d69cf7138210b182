package org.foldbook.model.validation;

import static org.foldbook.model.validation.FindingKind.RATE_NOT_POSITIVE;
import static org.foldbook.model.validation.FindingReport.hz;
import static org.foldbook.model.validation.FindingReport.report;

import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.foldbook.model.Camera;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Recording;
import org.foldbook.model.Stage;
import org.foldbook.model.SweepPlan;

/** Every rate the notebook stores must be a positive, finite number of Hz. */
public final class RateRules {

    private RateRules() {
    }

    private static boolean positive(double rate) {
        return rate > 0 && Double.isFinite(rate);
    }

    public static boolean recordingRate(Recording recording, DiagnosticChain diagnostics, Map<Object, Object> context) {
        if (positive(recording.getDeclaredRateHz())) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, recording,
                "declared sampling rate is " + hz(recording.getDeclaredRateHz()),
                "Enter the rate the file was recorded at (a positive number of samples per second)");
    }

    public static boolean digitizerMaxRate(Digitizer digitizer, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        if (positive(digitizer.getMaxRateHz())) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, digitizer,
                "maximum sampling rate is " + hz(digitizer.getMaxRateHz()),
                "Enter the highest rate from the digitizer's data sheet (a positive number of Hz)");
    }

    public static boolean cameraFrameRates(Camera camera, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean valid = true;
        for (double rate : camera.getFrameRatesHz()) {
            if (!positive(rate)) {
                valid &= report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, camera,
                        "frame rate " + hz(rate) + " is not positive",
                        "Remove it or enter the frame rate in frames per second");
            }
        }
        return valid;
    }

    public static boolean stageRate(Stage stage, DiagnosticChain diagnostics, Map<Object, Object> context) {
        if (stage.getRateHz() == null || positive(stage.getRateHz())) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, stage,
                "rate setting is " + hz(stage.getRateHz()),
                "Enter the rate used (positive), or clear it to use the device's own rate");
    }

    public static boolean sweepPlanRates(SweepPlan plan, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean valid = true;
        if (!positive(plan.getMinRateHz()) || !positive(plan.getMaxRateHz())) {
            valid &= report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, plan,
                    "rates run from " + hz(plan.getMinRateHz()) + " to " + hz(plan.getMaxRateHz()),
                    "Give a positive lowest and highest rate");
        } else if (plan.getMinRateHz() > plan.getMaxRateHz()) {
            valid &= report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, plan,
                    "lowest rate " + hz(plan.getMinRateHz()) + " is above the highest " + hz(plan.getMaxRateHz()),
                    "Swap the two rates");
        }
        if (plan.getRateCount() < 1) {
            valid &= report(diagnostics, Diagnostic.ERROR, RATE_NOT_POSITIVE, plan,
                    "number of rates is " + plan.getRateCount(), "Ask for at least one rate");
        }
        return valid;
    }
}
