package org.foldbook.audit;

import java.util.List;

/**
 * One spectral peak of a channel with every frequency that could have put it there and the verdict.
 *
 * @param frequencyHz the peak's frequency in the recording
 * @param levelDb     its sine level, dBFS (dB re the channel's unit when full scale is unknown)
 * @param candidates  the in-band reading first, then every folded one within the front end's band
 * @param verdict     the verdict
 * @param reasoning   why, in words
 */
public record PeakAssessment(double frequencyHz, double levelDb, List<PeakCandidate> candidates, PeakVerdict verdict,
        String reasoning) {

    public PeakAssessment {
        candidates = List.copyOf(candidates);
    }
}
