package org.foldbook.sweep;

/**
 * A peak found at one rate of the sweep, with the source peak that explains it.
 *
 * @param frequency   Hz, bin centre at this rate
 * @param levelDb     PSD level, dB re 1 unit²/Hz
 * @param verdict     {@link Verdict#SURVIVES}, {@link Verdict#FOLDS} or {@link Verdict#UNEXPLAINED}
 * @param sourcePeak  id of the source peak it came from, or -1 when unexplained
 * @param gainDb      bin power at this rate minus the source peak's bin power (the attenuation it got,
 *                    negative = weaker), NaN when unexplained
 * @param reason      the verdict in words
 */
public record ObservedPeak(double frequency, double levelDb, Verdict verdict, int sourcePeak, double gainDb,
        String reason) {
}
