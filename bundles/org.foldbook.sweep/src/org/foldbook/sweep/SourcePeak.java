package org.foldbook.sweep;

/**
 * A reference peak found in the recording at its own rate, which the sweep tracks across the ladder.
 *
 * @param id        0-based number, in order of frequency
 * @param frequency Hz, sub-bin estimate from the Hann kernel (far closer to a tone's frequency than the bin)
 * @param levelDb   PSD level at that frequency (scalloping corrected), dB re 1 unit²/Hz, at the source rate
 * @param powerDb   level of the peak bin as power in one bin ({@code levelDb + 10·log10(bin width)}), which
 *                  unlike the density level does not change with the rate for a pure tone
 */
public record SourcePeak(int id, double frequency, double levelDb, double powerDb) {
}
