package org.foldbook.ui.walkthrough;

import java.util.List;
import java.util.Optional;

/**
 * One page of the walkthrough, computed from the notebook (never canned): what the stage does to the
 * signal in this rig, in sentences and figures, with an optional chart and, for a camera, the motion a
 * rotating part shows on film. Free of SWT; the part and the HTML export draw it.
 *
 * @param kind       what the page is about
 * @param title      heading ("Sensor: ACC-H1")
 * @param paragraphs what the stage does here, in sentences with this rig's numbers
 * @param figures    the numbers that matter, each with how it was obtained
 * @param chart      a chart of the stage, when there is something to draw
 * @param motion     a camera stage's rotating part on film
 * @param stageIndex index of the stage in the chain, -1 for the cautions page
 */
public record StagePage(Kind kind, String title, List<String> paragraphs, List<Figure> figures,
        Optional<StageChart> chart, Optional<FilmedMotion> motion, int stageIndex) {

    /** What a page is about. */
    public enum Kind {
        CAUTIONS, SENSOR, CONDITIONER, ANTI_ALIAS_FILTER, DIGITIZER, CAMERA, OTHER
    }

    /**
     * One number of a page.
     *
     * @param name  what it is
     * @param value with its unit, as Foldbook writes quantities
     * @param how   where it comes from (notebook value, formula), shown as a hint
     */
    public record Figure(String name, String value, String how) {
    }

    public StagePage {
        paragraphs = List.copyOf(paragraphs);
        figures = List.copyOf(figures);
    }

    /** The value of the figure named {@code name}, or null (tests, the export). */
    public String figure(String name) {
        return figures.stream().filter(f -> f.name().equals(name)).map(Figure::value).findFirst().orElse(null);
    }
}
