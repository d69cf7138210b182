package org.foldbook.sweep;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The ways of taking a recording to a lower rate, the one vocabulary of Foldbook's modes: the
 * {@link #word()} is what the sweep's JSON says, what {@code foldbook sweep --mode} takes and what a notebook
 * stores (the notebook's {@code SweepMode} literals are these words, mapped by
 * {@code org.foldbook.channel.NotebookModes}); the {@link #title()} is what the workbench shows.
 * Each {@link Resampling} names its mode.
 */
public enum SimulationMode {
    /** No anti-alias filter: shows what folds ({@link Resampling#bare()}). */
    BARE("bare", "bare sampling", true),
    /** The chain's own modelled filters, then bare sampling ({@link Resampling#modelledChannel}). */
    MODELLED("modelled", "the chain's own model", true),
    /** A correct digital down-sampler ({@link Resampling#idealDecimator()}). */
    IDEAL("ideal", "ideal decimator", true),
    /** The windowed-sinc kernel alone, for side-by-side checks ({@link Resampling#bareKernel()}). */
    BARE_KERNEL("bare-kernel", "the bare kernel alone", false),
    /** A common polyphase resampler's default filter, for side-by-side checks ({@link Resampling#polyphaseDefault()}). */
    POLYPHASE_DEFAULT("polyphase-default", "a common resampler's default filter", false);

    private static final List<SimulationMode> NOTEBOOK = Arrays.stream(values()).filter(m -> m.inNotebooks).toList();

    private final String word;
    private final String title;
    private final boolean inNotebooks;

    SimulationMode(String word, String title, boolean inNotebooks) {
        this.word = word;
        this.title = title;
        this.inNotebooks = inNotebooks;
    }

    /** The word of JSON, the command line and the notebook file, e.g. {@code bare-kernel}. */
    public String word() {
        return word;
    }

    /** The mode's name for people, e.g. "ideal decimator". */
    public String title() {
        return title;
    }

    /** True for the modes a notebook's sweep plan can hold (the others are for side-by-side checks). */
    public boolean inNotebooks() {
        return inNotebooks;
    }

    /** The modes a notebook can hold, in the notebook's order. */
    public static List<SimulationMode> notebookModes() {
        return NOTEBOOK;
    }

    /**
     * The mode whose {@link #word()} is {@code word}.
     *
     * @throws IllegalArgumentException naming the words there are
     */
    public static SimulationMode ofWord(String word) {
        for (SimulationMode m : values()) {
            if (m.word.equals(word)) {
                return m;
            }
        }
        throw new IllegalArgumentException("mode must be one of " + words(Arrays.asList(values())) + ", was '"
                + word + "'");
    }

    /** The words of {@code modes}, comma-separated. */
    public static String words(List<SimulationMode> modes) {
        return modes.stream().map(SimulationMode::word).collect(Collectors.joining(", "));
    }

    /** The word (so lists of candidates and messages show the words people type). */
    @Override
    public String toString() {
        return word;
    }
}
