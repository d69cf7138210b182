package org.foldbook.dsp.digitizer;

/** How far below full scale an alias must be pushed to count as harmless. */
public enum AliasCriterion {
    /** Alias RMS below the ideal quantisation noise RMS (q/√12): the strictest usual choice. */
    BELOW_NOISE_FLOOR,
    /** Alias peak amplitude below 1 LSB. */
    BELOW_ONE_LSB,
    /** Alias peak amplitude below ½ LSB (it can then change no code by itself). */
    BELOW_HALF_LSB
}
