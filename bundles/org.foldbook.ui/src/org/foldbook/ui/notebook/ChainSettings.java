package org.foldbook.ui.notebook;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.foldbook.dsp.NumberText;
import org.foldbook.model.Digitizer;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Quantities;

/**
 * A chain setting typed in the details pane, turned into an undoable command or into the reason it
 * cannot be applied. No SWT: the pane shows the outcome.
 */
final class ChainSettings {

    /** What a typed value leads to. */
    sealed interface Outcome {
    }

    /** Execute this command. */
    record Apply(Command command) implements Outcome {
    }

    /** Show this problem; nothing changes. */
    record Problem(String text) implements Outcome {
    }

    /** Nothing to do (no such stage, or the value is already unset). */
    record Nothing() implements Outcome {
    }

    private ChainSettings() {
    }

    /** The sampling rate (or frame rate) of the chain's sampling stage. */
    static Outcome rate(EditingDomain domain, SignalChain chain, String text) {
        Stage stage = ChainFigures.samplingStage(chain);
        if (stage == null) {
            return new Nothing();
        }
        double value;
        try {
            value = NumberText.positive("sampling rate", text);
        } catch (IllegalArgumentException e) {
            return new Problem(e.getMessage());
        }
        if (stage.getDevice() instanceof Digitizer digitizer && value > digitizer.getMaxRateHz()) {
            return new Problem("Sampling rate " + Quantities.rate(value) + " is above the digitizer's maximum "
                    + Quantities.rate(digitizer.getMaxRateHz()) + ".");
        }
        return new Apply(SetCommand.create(domain, stage, NotebookPackage.Literals.STAGE__RATE_HZ, value));
    }

    /** The cutoff set on the chain's anti-alias filter stage. */
    static Outcome cutoff(EditingDomain domain, SignalChain chain, String text) {
        Stage stage = ChainFigures.filterStage(chain);
        if (stage == null) {
            return new Nothing();
        }
        try {
            double value = NumberText.positive("filter cutoff", text);
            return new Apply(SetCommand.create(domain, stage, NotebookPackage.Literals.STAGE__CUTOFF_HZ, value));
        } catch (IllegalArgumentException e) {
            return new Problem(e.getMessage());
        }
    }

    /** The chain's out-of-band level in dBFS; empty text unsets it (0 dBFS, the worst case). */
    static Outcome outOfBandLevel(EditingDomain domain, SignalChain chain, String text) {
        Object value;
        if (text.isBlank()) {
            if (chain.getOutOfBandLevelDbfs() == null) {
                return new Nothing();
            }
            value = SetCommand.UNSET_VALUE;
        } else {
            try {
                value = NumberText.finite("out-of-band level", text);
            } catch (IllegalArgumentException e) {
                return new Problem(e.getMessage());
            }
        }
        return new Apply(SetCommand.create(domain, chain, NotebookPackage.Literals.SIGNAL_CHAIN__OUT_OF_BAND_LEVEL_DBFS,
                value));
    }
}
