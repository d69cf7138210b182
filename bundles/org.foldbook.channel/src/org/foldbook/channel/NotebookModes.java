package org.foldbook.channel;

import java.util.List;

import org.foldbook.model.SweepMode;
import org.foldbook.sweep.SimulationMode;

/**
 * The one link between the notebook's stored {@link SweepMode} and the sweep's {@link SimulationMode}:
 * a stored literal is the mode's word ({@code bare}, {@code modelled}, {@code ideal}), so the link goes by
 * that word and a mode added on one side only fails here, not somewhere downstream.
 */
public final class NotebookModes {

    private NotebookModes() {
    }

    /** The sweep's mode of a stored one. */
    public static SimulationMode of(SweepMode stored) {
        return SimulationMode.ofWord(stored.getLiteral());
    }

    /**
     * The stored form of {@code mode}.
     *
     * @throws IllegalArgumentException for a mode a notebook cannot hold (the side-by-side checks)
     */
    public static SweepMode stored(SimulationMode mode) {
        SweepMode s = SweepMode.get(mode.word());
        if (s == null) {
            throw new IllegalArgumentException("mode " + mode.word() + " is not one a notebook keeps (those are "
                    + SimulationMode.words(SimulationMode.notebookModes()) + ")");
        }
        return s;
    }

    /** The sweep's modes of stored ones, in their order. */
    public static List<SimulationMode> of(List<SweepMode> stored) {
        return stored.stream().map(NotebookModes::of).toList();
    }
}
