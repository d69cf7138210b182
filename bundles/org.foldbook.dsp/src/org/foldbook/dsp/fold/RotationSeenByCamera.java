package org.foldbook.dsp.fold;

import org.foldbook.dsp.Check;

/**
 * A rotating part with a pattern that repeats {@code repeatsPerRevolution} times per turn (spokes,
 * blades, marks), turning at {@code revolutionsPerSecond} (negative = the other way), filmed at
 * {@code frameRateHz}. The pattern is a tone of repeats × rev/s; frames sample it, so it appears at
 * the signed apparent frequency ({@link Folding#signedApparentHz}). Immutable.
 *
 * @param repeatsPerRevolution          pattern repeats per revolution (≥ 1)
 * @param revolutionsPerSecond          true rotation rate
 * @param frameRateHz                   frames per second
 * @param patternHz                     true pattern rate, repeats × rev/s
 * @param apparentPatternHz             signed apparent pattern rate, in [−fps/2, fps/2)
 * @param apparentRevolutionsPerSecond  apparent rotation rate (apparentPatternHz / repeats), signed as
 *                                      the true rotation is
 * @param motion                        what the viewer sees
 */
public record RotationSeenByCamera(int repeatsPerRevolution, double revolutionsPerSecond, double frameRateHz,
        double patternHz, double apparentPatternHz, double apparentRevolutionsPerSecond, ApparentMotion motion) {

    /** Relative tolerance (of the frame rate) within which the pattern counts as standing still or at fps/2. */
    public static final double TOLERANCE = 1e-9;

    public static RotationSeenByCamera of(int repeatsPerRevolution, double revolutionsPerSecond, double frameRateHz) {
        Check.atLeast("repeatsPerRevolution", repeatsPerRevolution, 1);
        Check.finite("revolutionsPerSecond", revolutionsPerSecond);
        Check.positive("frameRateHz", frameRateHz);
        double pattern = repeatsPerRevolution * revolutionsPerSecond;
        double apparent = Folding.signedApparentHz(pattern, frameRateHz);
        double tol = TOLERANCE * frameRateHz;
        ApparentMotion motion;
        if (Math.abs(apparent) <= tol) {
            apparent = 0;
            motion = ApparentMotion.STANDS_STILL;
        } else if (Math.abs(Math.abs(apparent) - 0.5 * frameRateHz) <= tol) {
            motion = ApparentMotion.FLICKERS_WITHOUT_DIRECTION;
        } else if (Math.signum(apparent) == Math.signum(pattern)) {
            motion = ApparentMotion.TURNS_FORWARD;
        } else {
            motion = ApparentMotion.TURNS_BACKWARD;
        }
        return new RotationSeenByCamera(repeatsPerRevolution, revolutionsPerSecond, frameRateHz, pattern, apparent,
                apparent / repeatsPerRevolution, motion);
    }
}
