package org.foldbook.ui.walkthrough;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.dsp.filter.ExposureBoxcar;
import org.foldbook.dsp.fold.ApparentMotion;
import org.foldbook.dsp.fold.RotationSeenByCamera;
import org.foldbook.model.derived.Quantities;

/**
 * A rotating part with identical marks, filmed at a frame rate with an exposure: how it appears, from the
 * DSP core's fold arithmetic ({@link RotationSeenByCamera}), the exposure's smear, and the positions the
 * views draw — the true mark angle at any time, the filmed one in each frame. Free of SWT.
 *
 * @param seen            the apparent motion (signed apparent pattern and rotation rates, what is seen)
 * @param exposureSeconds the exposure, 0 when not logged (frames taken as instants)
 */
public record FilmedMotion(RotationSeenByCamera seen, double exposureSeconds) {

    /** Fastest rotation the animation shows on screen (rev/s), well below any display's refresh. */
    static final double SCREEN_REV_PER_S = 0.4;

    public static FilmedMotion of(int marks, double revolutionsPerSecond, double frameRateHz, double exposureSeconds) {
        return new FilmedMotion(RotationSeenByCamera.of(marks, revolutionsPerSecond, frameRateHz), exposureSeconds);
    }

    /** Degrees between neighbouring marks: the pattern repeats after this turn. */
    public double pitchDegrees() {
        return 360.0 / seen.repeatsPerRevolution();
    }

    /** True angle of the first mark at time t (degrees, in [0, 360)). */
    public double trueAngleDeg(double seconds) {
        return wrap(360.0 * seen.revolutionsPerSecond() * seconds, 360);
    }

    /** The angle the frame taken at {@code frame}/fps shows (degrees, in [0, 360)). */
    public double filmedAngleDeg(long frame) {
        return trueAngleDeg(frame / seen.frameRateHz());
    }

    /** How far the mark turns while the shutter is open, in degrees: 360 · rev/s · exposure. */
    public double smearDegrees() {
        return 360.0 * Math.abs(seen.revolutionsPerSecond()) * exposureSeconds;
    }

    /** The smear as a fraction of the mark pitch: pattern rate × exposure. */
    public double smearOfPitch() {
        return Math.abs(seen.patternHz()) * exposureSeconds;
    }

    /** The exposure's box-car attenuation at the pattern rate (dB; 0 without an exposure). */
    public double exposureAttenuationDb() {
        return exposureSeconds > 0 ? new ExposureBoxcar(exposureSeconds).attenuationDb(Math.abs(seen.patternHz())) : 0;
    }

    /** The slow-motion factor of the animation: the true rotation shown at most {@value #SCREEN_REV_PER_S} rev/s. */
    public double slowMotion() {
        return Math.max(1, Math.abs(seen.revolutionsPerSecond()) / SCREEN_REV_PER_S);
    }

    /** What is seen, in words with the numbers. */
    public String words() {
        double apparent = seen.apparentRevolutionsPerSecond();
        double truth = seen.revolutionsPerSecond();
        String rev = Quantities.number(Math.abs(apparent)) + " rev/s";
        return switch (seen.motion()) {
            case STANDS_STILL -> "appears to stand still";
            case FLICKERS_WITHOUT_DIRECTION -> "flickers between two positions: no direction can be seen";
            case TURNS_BACKWARD -> "appears to turn backward at " + rev;
            case TURNS_FORWARD -> Math.abs(Math.abs(apparent) - Math.abs(truth)) <= 1e-9 * seen.frameRateHz()
                    ? "turns forward at its true rate, " + rev
                    : "appears to turn forward, slowly: " + rev + " instead of " + Quantities.number(Math.abs(truth)) + " rev/s";
        };
    }

    /** The motion in one word for headings: still, forward, backward, flicker. */
    public String shortWord() {
        return switch (seen.motion()) {
            case STANDS_STILL -> "standing still";
            case TURNS_FORWARD -> Math.abs(seen.apparentRevolutionsPerSecond()) < Math.abs(seen.revolutionsPerSecond())
                    - 1e-9 * seen.frameRateHz() ? "slow forward" : "forward";
            case TURNS_BACKWARD -> "backward";
            case FLICKERS_WITHOUT_DIRECTION -> "flicker";
        };
    }

    /** True when the film shows the motion as it is (forward at the true rate). */
    public boolean faithful() {
        return seen.motion() == ApparentMotion.TURNS_FORWARD && Math.abs(seen.patternHz()) < seen.frameRateHz() / 2;
    }

    /**
     * The strobe chart: the mark's position within one pitch over {@code frames} frames — the true motion
     * (a dense line), where each frame catches it (points), and the motion the film shows (a line at the
     * signed apparent rate through the frames).
     */
    public StageChart strobeChart(int frames) {
        double fps = seen.frameRateHz();
        double duration = frames / fps;
        double pitch = pitchDegrees();
        int dense = 1000;
        double[] t = new double[dense + 1];
        double[] truth = new double[dense + 1];
        double[] film = new double[dense + 1];
        for (int i = 0; i <= dense; i++) {
            t[i] = 1000 * duration * i / dense;
            truth[i] = wrap(360.0 * seen.patternHz() / seen.repeatsPerRevolution() * (t[i] / 1000), pitch);
            film[i] = wrap(360.0 * seen.apparentPatternHz() / seen.repeatsPerRevolution() * (t[i] / 1000), pitch);
        }
        double[] ft = new double[frames];
        double[] fa = new double[frames];
        for (int n = 0; n < frames; n++) {
            ft[n] = 1000 * n / fps;
            fa[n] = wrap(filmedAngleDeg(n), pitch);
        }
        List<StageChart.Line> lines = new ArrayList<>();
        lines.add(new StageChart.Line("true motion", t, truth, StageChart.Style.LINE));
        lines.add(new StageChart.Line("on film: " + shortWord(), t, film, StageChart.Style.LINE));
        lines.add(new StageChart.Line("frames", ft, fa, StageChart.Style.POINTS));
        return new StageChart("The mark, true and on film, at " + Quantities.number(fps) + " frames/s", "Time (ms)",
                "Mark angle (°)", lines, List.of(), new double[] { 0, 1000 * duration },
                new double[] { 0, pitch });
    }

    private static double wrap(double value, double period) {
        double w = value % period;
        return w < 0 ? w + period : w;
    }
}
