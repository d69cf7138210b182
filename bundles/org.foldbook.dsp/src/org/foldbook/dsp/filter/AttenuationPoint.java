package org.foldbook.dsp.filter;

/** An attenuation value (dB) and the frequency (Hz) it occurs at. */
public record AttenuationPoint(double frequencyHz, double attenuationDb) {
}
