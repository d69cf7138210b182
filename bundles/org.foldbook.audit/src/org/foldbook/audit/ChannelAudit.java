package org.foldbook.audit;

import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.filter.FrequencyResponse;

/**
 * Everything the audit found about one channel, an immutable value.
 *
 * @param experiment   the experiment's name
 * @param channel      the channel's name
 * @param subjectRef   the channel's URI fragment in its notebook
 * @param chainText    the chain, stage by stage, with the settings in effect
 * @param rateHz       the sampling rate the notebook states
 * @param frontEndUpperHz the front end's upper edge (NaN when unknown)
 * @param protection   the chain's protection before sampling at its rate (ChainModel.protection)
 * @param foldBands    the stretches above Nyquist passed into the fold
 * @param findings     the findings, notebook first, then data, then spectrum
 * @param spectrum     the channel's spectrum, empty when the data could not be read
 * @param peaks        every peak assessed
 * @param modelNoise   folded noise from the model
 * @param dataNoise    folded noise from a higher-rate recording, when there is one
 * @param reference    the higher-rate recording's label, when there is one
 */
public record ChannelAudit(String experiment, String channel, String subjectRef, List<String> chainText, double rateHz,
        double frontEndUpperHz, FrequencyResponse protection, List<FoldBandView> foldBands, List<Finding> findings,
        Optional<ChannelSpectrum> spectrum, List<PeakAssessment> peaks, Optional<FoldedNoise> modelNoise,
        Optional<FoldedNoise> dataNoise, Optional<String> reference) {

    public ChannelAudit {
        chainText = List.copyOf(chainText);
        foldBands = List.copyOf(foldBands);
        findings = List.copyOf(findings);
        peaks = List.copyOf(peaks);
    }

    public Summary summary() {
        return Summary.of(findings);
    }

    /**
     * A stretch of front-end band above Nyquist passed into the fold.
     *
     * @param fromHz             lower edge at the sensor
     * @param toHz               upper edge
     * @param landsFromHz        lowest frequency it lands on
     * @param landsToHz          highest
     * @param leastAttenuationDb the chain's least attenuation over it
     */
    public record FoldBandView(double fromHz, double toHz, double landsFromHz, double landsToHz,
            double leastAttenuationDb) {
    }
}
