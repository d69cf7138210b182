package org.foldbook.ui.walkthrough;

import static org.foldbook.model.derived.Quantities.db;
import static org.foldbook.model.derived.Quantities.hz;
import static org.foldbook.model.derived.Quantities.ms;
import static org.foldbook.model.derived.Quantities.number;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.foldbook.dsp.filter.ExposureBoxcar;
import org.foldbook.model.Camera;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.model.derived.Names;
import org.foldbook.ui.walkthrough.StagePage.Figure;

/** A camera stage's page: frame rate, exposure and its smear, and a rotating part's apparent motion on film. */
final class CameraPage {

    /** Frames the strobe chart shows. */
    static final int STROBE_FRAMES = 16;

    private CameraPage() {
    }

    static StagePage of(SignalChain chain, Stage stage, int index) {
        Camera camera = (Camera) stage.getDevice();
        List<String> text = new ArrayList<>();
        List<Figure> figures = new ArrayList<>();
        double fps = ChainFigures.stageRateHz(stage);
        double exposure = ChainModel.of(chain).exposureSeconds();
        String name = Names.shortName(camera);
        if (!(fps > 0)) {
            text.add(name + ": the notebook gives no frame rate, so nothing can be said about what it films.");
            return new StagePage(StagePage.Kind.CAMERA, "Camera: " + name, text, figures, Optional.empty(),
                    Optional.empty(), index);
        }
        figures.add(new Figure("Frame rate", number(fps) + " frames/s", stage.getRateHz() != null ? "stage setting"
                : "the camera's first frame rate"));
        figures.add(new Figure("Frame period", ms(1 / fps), "1 / frame rate"));
        figures.add(new Figure("Nyquist frequency", hz(fps / 2), "frame rate / 2"));
        text.add(name + " takes " + number(fps) + " frames/s: each frame is a sample in time, so anything that repeats "
                + "faster than " + hz(fps / 2) + " (half the frame rate) folds, exactly like a digitizer's input.");
        if (exposure > 0) {
            figures.add(new Figure("Exposure", ms(exposure) + String.format(Locale.ROOT, " (%.0f %% of the frame period)",
                    100 * exposure * fps), stage.getExposureS() != null ? "stage setting" : "camera setting"));
            ExposureBoxcar boxcar = new ExposureBoxcar(exposure);
            figures.add(new Figure("Exposure smear at Nyquist", db(boxcar.attenuationDb(fps / 2)),
                    "box-car |sin(π f T)/(π f T)|"));
            figures.add(new Figure("Smear's first null", hz(1 / exposure), "1 / exposure"));
            text.add("The shutter stays open " + ms(exposure) + ": motion during it smears, which acts as a gentle "
                    + "low-pass (a box-car): " + db(boxcar.attenuationDb(fps / 2)) + " at " + hz(fps / 2)
                    + ", first null at " + hz(1 / exposure) + ". It does not stop folding.");
        } else {
            text.add("No exposure time is logged: frames are taken as instants.");
        }
        Optional<FilmedMotion> motion = Optional.empty();
        if (stage.getFilmedRotationHz() != null) {
            int marks = stage.getFilmedMarksPerTurn() != null ? stage.getFilmedMarksPerTurn() : 1;
            FilmedMotion m = FilmedMotion.of(marks, stage.getFilmedRotationHz(), fps, exposure);
            motion = Optional.of(m);
            double rot = m.seen().revolutionsPerSecond();
            figures.add(new Figure("Filmed part turns at", number(rot) + " rev/s (" + number(60 * rot) + " rpm)",
                    "notebook, camera stage"));
            figures.add(new Figure("Marks per turn", String.valueOf(marks), "notebook, camera stage"));
            figures.add(new Figure("Mark rate", hz(m.seen().patternHz()), "marks × rev/s"));
            figures.add(new Figure("Apparent mark rate", signed(m.seen().apparentPatternHz()) + " Hz",
                    "f − k·fps, k = round(f / fps)"));
            figures.add(new Figure("Apparent rotation", signed(m.seen().apparentRevolutionsPerSecond()) + " rev/s ("
                    + m.shortWord() + ")", "apparent mark rate / marks"));
            figures.add(new Figure("Faithful above", number(2 * Math.abs(m.seen().patternHz())) + " frames/s",
                    "2 × mark rate"));
            if (exposure > 0) {
                figures.add(new Figure("Smear per frame", String.format(Locale.ROOT, "%.3g° (%.3g of the mark pitch)",
                        m.smearDegrees(), m.smearOfPitch()), "360° × rev/s × exposure"));
            }
            text.add("The filmed part turns at " + number(rot) + " rev/s with " + marks + (marks == 1 ? " mark" : " marks")
                    + ": the pattern repeats " + hz(Math.abs(m.seen().patternHz())) + ". On film it " + m.words() + ".");
            text.add(m.faithful() ? "The frame rate is more than twice the mark rate, so the film shows the true motion."
                    : "The frame rate is below twice the mark rate (" + number(2 * Math.abs(m.seen().patternHz()))
                            + " frames/s): the film does not show the true motion.");
            if (exposure > 0) {
                text.add(String.format(Locale.ROOT, "During one exposure the mark moves %.3g°, %.3g of the way to the next"
                        + " mark: each frame shows it as a short streak.", m.smearDegrees(), m.smearOfPitch()));
            }
        } else {
            text.add("The notebook describes no rotating part for this camera (set the filmed rotation and marks on the "
                    + "camera stage to see how it appears on film).");
        }
        Optional<StageChart> chart = motion.map(m -> m.strobeChart(STROBE_FRAMES));
        return new StagePage(StagePage.Kind.CAMERA, "Camera: " + name, text, figures, chart, motion, index);
    }

    private static String signed(double value) {
        return value < 0 ? "−" + number(-value) : "+" + number(value);
    }
}
