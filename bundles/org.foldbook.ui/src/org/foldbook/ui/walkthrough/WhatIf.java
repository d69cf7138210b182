package org.foldbook.ui.walkthrough;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CompoundCommand;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;

/**
 * A change to try without touching the notebook: another sampling (or frame) rate, another filter cutoff.
 * {@link #applyTo} gives a detached copy of the chain with the change made, so every figure is still
 * computed by the one mapper ({@code ChainModel}/{@code ChainFigures}) from a chain; {@link #keep} turns
 * the change into one undoable command on the notebook.
 *
 * @param rateHz   the rate to try, null: the notebook's
 * @param cutoffHz the anti-alias cutoff to try, null: the notebook's
 */
public record WhatIf(Double rateHz, Double cutoffHz) {

    /** Nothing changed: the notebook as it is. */
    public static final WhatIf NONE = new WhatIf(null, null);

    public WhatIf {
        if (rateHz != null && !(rateHz > 0 && Double.isFinite(rateHz))) {
            throw new IllegalArgumentException("rateHz must be a finite number > 0, was " + rateHz);
        }
        if (cutoffHz != null && !(cutoffHz > 0 && Double.isFinite(cutoffHz))) {
            throw new IllegalArgumentException("cutoffHz must be a finite number > 0, was " + cutoffHz);
        }
    }

    public boolean isNone() {
        return rateHz == null && cutoffHz == null;
    }

    /** The same change with the rate replaced (null: the notebook's). */
    public WhatIf withRate(Double rate) {
        return new WhatIf(rate, cutoffHz);
    }

    /** The same change with the cutoff replaced (null: the notebook's). */
    public WhatIf withCutoff(Double cutoff) {
        return new WhatIf(rateHz, cutoff);
    }

    /**
     * The change as far as it differs from {@code chain} (a value equal to the notebook's counts as no
     * change; a cutoff on a chain without a modelled filter stage is dropped).
     */
    public WhatIf against(SignalChain chain) {
        Double rate = rateHz != null && rateHz != ChainFigures.samplingRateHz(chain)
                && ChainFigures.samplingStage(chain) != null ? rateHz : null;
        Stage filter = ChainFigures.filterStage(chain);
        Double cutoff = cutoffHz != null && filter != null && cutoffHz != ChainFigures.effectiveCutoffHz(filter)
                ? cutoffHz : null;
        return new WhatIf(rate, cutoff);
    }

    /**
     * {@code chain} with the change made, as a copy outside any notebook resource (its stages still refer
     * to the notebook's devices, which are not changed). The chain itself when nothing changes.
     */
    public SignalChain applyTo(SignalChain chain) {
        WhatIf change = against(chain);
        if (change.isNone()) {
            return chain;
        }
        int samplerIndex = chain.getStages().indexOf(ChainFigures.samplingStage(chain));
        int filterIndex = chain.getStages().indexOf(ChainFigures.filterStage(chain));
        SignalChain copy = EcoreUtil.copy(chain);
        if (change.rateHz != null) {
            copy.getStages().get(samplerIndex).setRateHz(change.rateHz);
        }
        if (change.cutoffHz != null) {
            copy.getStages().get(filterIndex).setCutoffHz(change.cutoffHz);
        }
        return copy;
    }

    /**
     * The command that writes the change into the notebook (one undo step), or null when nothing
     * differs from it.
     */
    public Command keep(EditingDomain domain, SignalChain chain) {
        WhatIf change = against(chain);
        if (change.isNone()) {
            return null;
        }
        CompoundCommand command = new CompoundCommand("Keep the walkthrough's change");
        if (change.rateHz != null) {
            command.append(SetCommand.create(domain, ChainFigures.samplingStage(chain),
                    NotebookPackage.Literals.STAGE__RATE_HZ, change.rateHz));
        }
        if (change.cutoffHz != null) {
            command.append(SetCommand.create(domain, ChainFigures.filterStage(chain),
                    NotebookPackage.Literals.STAGE__CUTOFF_HZ, change.cutoffHz));
        }
        return command.unwrap();
    }
}
