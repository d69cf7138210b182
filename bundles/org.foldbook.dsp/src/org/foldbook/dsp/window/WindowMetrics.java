package org.foldbook.dsp.window;

/**
 * Figures of merit of a sampled window (see {@link Window} for the definitions).
 *
 * @param coherentGain      {@code sum(w) / n}
 * @param enbwBins          equivalent noise bandwidth in bins
 * @param scallopLossDb     loss of a tone half-way between bins, dB, positive
 * @param highestSidelobeDb highest sidelobe relative to the main-lobe peak, dB, negative; NaN if the
 *                          window is so short that its transform has no minimum (n <= 2)
 * @param sidelobeAtBins    where that sidelobe peaks, in bins from the main-lobe centre (NaN likewise)
 */
public record WindowMetrics(double coherentGain, double enbwBins, double scallopLossDb, double highestSidelobeDb,
        double sidelobeAtBins) {
}
