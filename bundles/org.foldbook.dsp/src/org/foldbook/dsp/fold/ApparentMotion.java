package org.foldbook.dsp.fold;

/** How a periodically moving pattern looks when filmed (our own names). */
public enum ApparentMotion {
    /** The pattern appears to stand still (its repeat rate is a multiple of the frame rate). */
    STANDS_STILL,
    /** It appears to turn the way it really turns (possibly slower). */
    TURNS_FORWARD,
    /** It appears to turn the opposite way. */
    TURNS_BACKWARD,
    /**
     * Its repeat rate is an odd multiple of half the frame rate: successive frames alternate between
     * two positions, and no direction can be seen.
     */
    FLICKERS_WITHOUT_DIRECTION
}
