package org.foldbook.ui.walkthrough;

import java.util.List;
import java.util.Optional;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.foldbook.dsp.NumberText;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Notebook;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Quantities;

/**
 * What the walkthrough part shows, without SWT: the rig and chain picked (or the channel that picked
 * them), the what-if being tried, the page, and the walkthrough computed from them. The part draws it;
 * tests drive it directly. Every change recomputes the pages from the notebook.
 */
public final class WalkthroughSession {

    private Notebook notebook;
    private Rig rig;
    private SignalChain chain;
    private Channel channel;
    private WhatIf whatIf = WhatIf.NONE;
    private int page;
    private Walkthrough walkthrough;

    /** Shows {@code next} (null: none): its first rig and that rig's first chain. */
    public void setNotebook(Notebook next) {
        notebook = next;
        rig = null;
        chain = null;
        channel = null;
        if (next != null && !next.getRigs().isEmpty()) {
            pick(next.getRigs().get(0), null);
        } else {
            recompute();
        }
    }

    public Notebook notebook() {
        return notebook;
    }

    /** The rigs to pick from. */
    public List<Rig> rigs() {
        return notebook == null ? List.of() : List.copyOf(notebook.getRigs());
    }

    /** Picks {@code nextRig} and one of its chains (null: its first); the what-if and the page start over. */
    public void pick(Rig nextRig, SignalChain nextChain) {
        rig = nextRig;
        chain = nextChain != null ? nextChain : nextRig == null || nextRig.getChains().isEmpty() ? null
                : nextRig.getChains().get(0);
        channel = null;
        whatIf = WhatIf.NONE;
        page = 0;
        recompute();
    }

    /** Picks the channel's chain and its rig (nothing happens for a channel without a chain in a rig). */
    public boolean pick(Channel next) {
        if (next == null || next.getChain() == null || !(next.getChain().eContainer() instanceof Rig r)) {
            return false;
        }
        pick(r, next.getChain());
        channel = next;
        recompute();
        return true;
    }

    /** Follows a notebook selection: a channel, a chain, a stage or a rig; anything else is ignored. */
    public boolean follow(Object selection) {
        if (selection instanceof Channel c) {
            return pick(c);
        }
        if (selection instanceof Stage s && s.eContainer() instanceof SignalChain c && c.eContainer() instanceof Rig r) {
            pick(r, c);
            page = Math.max(0, walkthrough.pageOfStage(c.getStages().indexOf(s)));
            return true;
        }
        if (selection instanceof SignalChain c && c.eContainer() instanceof Rig r) {
            pick(r, c);
            return true;
        }
        if (selection instanceof Rig r) {
            pick(r, null);
            return true;
        }
        return false;
    }

    public Rig rig() {
        return rig;
    }

    public SignalChain chain() {
        return chain;
    }

    public Channel channel() {
        return channel;
    }

    public WhatIf whatIf() {
        return whatIf;
    }

    /** The walkthrough now, or null without a rig and chain. */
    public Walkthrough walkthrough() {
        return walkthrough;
    }

    public int pageIndex() {
        return page;
    }

    /** The page shown, or null. */
    public StagePage page() {
        return walkthrough == null ? null : walkthrough.pages().get(page);
    }

    public int pageCount() {
        return walkthrough == null ? 0 : walkthrough.pages().size();
    }

    public boolean canGoBack() {
        return page > 0;
    }

    public boolean canGoOn() {
        return page + 1 < pageCount();
    }

    public void next() {
        goTo(page + 1);
    }

    public void back() {
        goTo(page - 1);
    }

    /** Shows page {@code index} (clamped to the pages there are). */
    public void goTo(int index) {
        page = Math.max(0, Math.min(index, pageCount() - 1));
    }

    /**
     * Tries another rate (blank: the notebook's); returns the problem with the text, if any, and then
     * leaves the what-if as it was.
     */
    public Optional<String> tryRate(String text) {
        if (chain == null || ChainFigures.samplingStage(chain) == null) {
            return Optional.of("This chain has no digitizer or camera whose rate could change.");
        }
        if (text == null || text.isBlank()) {
            whatIf = whatIf.withRate(null);
            recompute();
            return Optional.empty();
        }
        double value;
        try {
            value = NumberText.positive("Rate", text);
        } catch (IllegalArgumentException e) {
            return Optional.of(e.getMessage());
        }
        if (ChainFigures.samplingStage(chain).getDevice() instanceof Digitizer d && value > d.getMaxRateHz()) {
            return Optional.of("Rate " + Quantities.rate(value) + " is above the digitizer's maximum "
                    + Quantities.rate(d.getMaxRateHz()) + ".");
        }
        whatIf = whatIf.withRate(value);
        recompute();
        return Optional.empty();
    }

    /** Tries another anti-alias cutoff (blank: the notebook's); returns the problem, if any. */
    public Optional<String> tryCutoff(String text) {
        if (chain == null || ChainFigures.filterStage(chain) == null) {
            return Optional.of("This chain has no working anti-alias filter whose cutoff could change.");
        }
        if (text == null || text.isBlank()) {
            whatIf = whatIf.withCutoff(null);
            recompute();
            return Optional.empty();
        }
        try {
            whatIf = whatIf.withCutoff(NumberText.positive("Filter cutoff", text));
        } catch (IllegalArgumentException e) {
            return Optional.of(e.getMessage());
        }
        recompute();
        return Optional.empty();
    }

    /** Drops the what-if: the notebook as it is. */
    public void reset() {
        whatIf = WhatIf.NONE;
        recompute();
    }

    /**
     * The command that keeps the what-if in the notebook (run it on the document's command stack; it can
     * be undone), or null when nothing differs. The what-if is dropped: once kept, the notebook says it.
     */
    public Command keep(EditingDomain domain) {
        if (chain == null) {
            return null;
        }
        Command command = whatIf.keep(domain, chain);
        whatIf = WhatIf.NONE;
        return command;
    }

    /** After the notebook changed (a command, undo, redo): the pages are computed again. */
    public void recompute() {
        if (rig != null && chain != null && chain.eContainer() != rig) { // the chain was removed
            chain = rig.getChains().isEmpty() ? null : rig.getChains().get(0);
        }
        walkthrough = rig == null || chain == null ? null : Walkthrough.of(rig, chain, whatIf, channel);
        if (walkthrough != null) {
            whatIf = walkthrough.whatIf();
        }
        goTo(page);
    }
}
