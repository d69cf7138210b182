package org.foldbook.audit;

import static org.foldbook.audit.Subject.fig;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.Channel;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.model.derived.Names;
import org.foldbook.model.derived.Quantities;

/**
 * Findings from the notebook alone: the alias-free band and the bands the front end passes into the fold
 * (figures from {@link ChainFigures} and {@link ChainModel}, the one chain mapper), settings the figures
 * need but the notebook lacks, calibrations and rig validity at the recording date.
 */
final class ChainAudit {
    /** Grid points between Nyquist and the front end's upper edge when looking for unprotected bands. */
    private static final int GRID = 4000;

    private ChainAudit() {
    }

    static void audit(Channel channel, AuditPolicy policy, List<Finding> out) {
        Subject at = new Subject(channel, out);
        SignalChain chain = channel.getChain();
        if (chain == null) {
            at.add(AuditKind.SETTING_MISSING, Severity.ERROR, "no signal chain: nothing can be said about aliasing");
            return;
        }
        ChainModel model = ChainModel.of(chain);
        double rate = model.samplingRateHz();
        double upper = ChainFigures.frontEndUpperHz(chain);
        if (!(rate > 0)) {
            at.add(AuditKind.SETTING_MISSING, Severity.ERROR, "the chain states no sampling rate");
        }
        if (!(upper > 0)) {
            at.add(AuditKind.SETTING_MISSING, "the sensor states neither a usable maximum nor a resonance: "
                    + "the band that can fold is unknown");
        }
        switch (model.antiAliasState()) {
        case ABSENT -> at.add(AuditKind.SETTING_MISSING, Severity.INFO, model.digitizerFilter().isPresent()
                ? "no analog anti-alias filter; the digitizer's built-in digital filter protects the band"
                : "no anti-alias filter in the chain");
        case UNDESCRIBED -> at.add(AuditKind.SETTING_MISSING,
                "the anti-alias filter's family, order or cutoff is not recorded; it is treated as absent");
        case BYPASSED -> at.add(AuditKind.SETTING_MISSING, Severity.INFO, "the anti-alias filter is in bypass");
        case MODELLED -> {
        }
        }
        Stage sampler = ChainFigures.samplingStage(chain);
        if (sampler != null && sampler.getDevice() instanceof Digitizer d) {
            if (d.getResolutionBits() <= 0) {
                at.add(AuditKind.SETTING_MISSING, "digitizer " + d.getId() + " has no resolution");
            }
            if (sampler.getRangeV() == null && d.getInputRangesV().isEmpty()) {
                at.add(AuditKind.SETTING_MISSING, Severity.INFO, "no input range recorded for digitizer "
                        + d.getId() + ": levels stay in fractions of full scale");
            }
        }
        Optional<ProtectionFigures> figures = ChainFigures.figures(chain);
        if (figures.isPresent()) {
            ProtectionFigures p = figures.get();
            at.add(AuditKind.ALIAS_FREE_BAND, (p.aliasFreeBandHz() > 0 ? "alias-free from 0 to "
                    + Quantities.hz(p.aliasFreeBandHz()) : "no band is alias-free") + " at "
                    + Quantities.rate(rate) + " (needs " + Words.db(p.requiredAttenuationDb())
                    + " of attenuation; " + Words.db(p.attenuationAtNyquistDb()) + " at Nyquist)",
                    fig("aliasFreeBandHz", p.aliasFreeBandHz(), "Hz"), fig("nyquistHz", p.nyquistHz(), "Hz"),
                    fig("requiredAttenuationDb", p.requiredAttenuationDb(), "dB"),
                    fig("attenuationAtNyquistDb", p.attenuationAtNyquistDb(), "dB"), fig("marginDb", p.marginDb(), "dB"));
            unprotectedBands(at, model.protection(rate), rate, upper, p.requiredAttenuationDb());
        }
        Experiment experiment = channel.eContainer() instanceof Experiment e ? e : null;
        if (experiment != null) {
            datesAt(at, experiment, chain, policy);
        }
    }

    /** The stretches above Nyquist where the chain attenuates less than needed, and where they land. */
    static List<FoldBand> foldBands(FrequencyResponse protection, double rate, double upper, double requiredDb) {
        List<FoldBand> bands = new ArrayList<>();
        double nyq = rate / 2;
        if (!(upper > nyq) || !(rate > 0)) {
            return bands;
        }
        double step = (upper - nyq) / GRID;
        double start = Double.NaN, least = Double.POSITIVE_INFINITY, lo = Double.POSITIVE_INFINITY, hi = 0;
        for (int i = 0; i <= GRID; i++) {
            double f = nyq + i * step;
            double att = protection.attenuationDb(f);
            boolean weak = att < requiredDb;
            if (weak) {
                if (Double.isNaN(start)) {
                    start = f;
                    least = Double.POSITIVE_INFINITY;
                    lo = Double.POSITIVE_INFINITY;
                    hi = 0;
                }
                least = Math.min(least, att);
                double a = Folding.apparentHz(f, rate);
                lo = Math.min(lo, a);
                hi = Math.max(hi, a);
            }
            if (!Double.isNaN(start) && (!weak || i == GRID)) {
                bands.add(new FoldBand(start, weak ? f : f - step, lo, hi, least));
                start = Double.NaN;
            }
        }
        return bands;
    }

    private static void unprotectedBands(Subject at, FrequencyResponse protection, double rate, double upper,
            double requiredDb) {
        for (FoldBand b : foldBands(protection, rate, upper, requiredDb)) {
            at.add(AuditKind.UNPROTECTED_BAND, "the front end passes " + Quantities.hz(b.fromHz()) + "–"
                    + Quantities.hz(b.toHz()) + " with as little as " + Words.db(b.leastAttenuationDb())
                    + " of attenuation (" + Words.db(requiredDb) + " needed); it folds onto "
                    + Quantities.hz(b.landsFromHz()) + "–" + Quantities.hz(b.landsToHz()),
                    fig("fromHz", b.fromHz(), "Hz"), fig("toHz", b.toHz(), "Hz"),
                    fig("landsFromHz", b.landsFromHz(), "Hz"), fig("landsToHz", b.landsToHz(), "Hz"),
                    fig("leastAttenuationDb", b.leastAttenuationDb(), "dB"));
        }
    }

    private static void datesAt(Subject at, Experiment experiment, SignalChain chain, AuditPolicy policy) {
        if (experiment.getDate() == null) {
            at.add(AuditKind.SETTING_MISSING, Severity.INFO, "the experiment has no date: calibrations are not checked");
            return;
        }
        LocalDate when = day(experiment.getDate());
        for (Stage s : chain.getStages()) {
            Device d = s.getDevice();
            if (d == null || d.getCalibrationDate() == null) {
                continue;
            }
            LocalDate cal = day(d.getCalibrationDate());
            LocalDate due = cal.plusMonths(policy.calibrationValidMonths());
            if (when.isAfter(due)) {
                long days = java.time.temporal.ChronoUnit.DAYS.between(due, when);
                at.add(AuditKind.CALIBRATION_EXPIRED, Names.label(d) + " was calibrated on " + cal
                        + "; recorded on " + when + ", " + days + " days after the calibration ran out (" + due
                        + ", " + policy.calibrationValidMonths() + " months)",
                        fig("daysOverdue", days, "days"), fig("validMonths", policy.calibrationValidMonths(), "months"));
            } else if (when.isBefore(cal)) {
                at.add(AuditKind.CALIBRATION_EXPIRED, Severity.INFO, Names.label(d) + " was calibrated on " + cal
                        + ", after this recording (" + when + "); the calibration before it is not in the notebook");
            }
        }
        Rig rig = experiment.getRig();
        if (rig != null) {
            boolean afterStart = rig.getValidFrom() == null || !when.isBefore(day(rig.getValidFrom()));
            boolean beforeEnd = rig.getValidUntil() == null || !when.isAfter(day(rig.getValidUntil()));
            if (!afterStart || !beforeEnd) {
                at.add(AuditKind.RIG_NOT_VALID, "recorded on " + when + ", outside the validity of " + Names.label(rig)
                        + " (" + (rig.getValidFrom() == null ? "…" : day(rig.getValidFrom())) + " to "
                        + (rig.getValidUntil() == null ? "now" : day(rig.getValidUntil()))
                        + "): the notebook does not describe the rig as used");
            }
        }
    }

    static LocalDate day(Date date) {
        return date.toInstant().atZone(ZoneOffset.UTC).toLocalDate();
    }

    /**
     * One stretch of front-end band above Nyquist the chain under-protects.
     *
     * @param fromHz             lower edge
     * @param toHz               upper edge
     * @param landsFromHz        lowest frequency it folds onto
     * @param landsToHz          highest
     * @param leastAttenuationDb the chain's least attenuation over the stretch
     */
    record FoldBand(double fromHz, double toHz, double landsFromHz, double landsToHz, double leastAttenuationDb) {
    }
}
