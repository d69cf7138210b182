package org.foldbook.ui.walkthrough;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Rig;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Names;
import org.foldbook.ui.notebook.ChainSummary;

/**
 * The walkthrough of one chain of a rig: a cautions page, then one page per stage in signal order
 * (sensor, conditioner, anti-alias filter, digitizer or camera), each computed from the notebook — with
 * a {@link WhatIf} applied to a detached copy of the chain when one is being tried. Free of SWT.
 *
 * @param rig     the rig
 * @param chain   the notebook's chain
 * @param tried   the chain the pages describe: {@code chain}, or a copy with the what-if applied
 * @param whatIf  the change tried ({@link WhatIf#NONE}: the notebook as it is)
 * @param channel the channel the walkthrough was opened for, or null
 * @param pages   cautions first, then one page per stage
 * @param words   the rig's and the chain's names and the chain's path in words, taken when computed (the
 *                printable page is written off the UI thread and reads no model object)
 */
public record Walkthrough(Rig rig, SignalChain chain, SignalChain tried, WhatIf whatIf, Channel channel,
        List<StagePage> pages, Words words) {

    /** Words about the rig and chain, fixed when the walkthrough was computed. */
    public record Words(String rig, String chain, String chainId, String path) {
    }

    public Walkthrough {
        pages = List.copyOf(pages);
    }

    /** The walkthrough of {@code chain} (one of {@code rig}'s chains) with {@code whatIf} tried. */
    public static Walkthrough of(Rig rig, SignalChain chain, WhatIf whatIf, Channel channel) {
        if (rig == null || chain == null) {
            throw new IllegalArgumentException("a walkthrough needs a rig and a chain, got " + rig + " and " + chain);
        }
        WhatIf change = whatIf == null ? WhatIf.NONE : whatIf.against(chain);
        SignalChain tried = change.applyTo(chain);
        List<StagePage> pages = new ArrayList<>();
        pages.add(Cautions.page(rig, chain));
        List<Stage> stages = tried.getStages();
        for (int i = 0; i < stages.size(); i++) {
            Stage stage = stages.get(i);
            pages.add(switch (stage.getDevice()) {
                case Sensor s -> FrontEndPages.sensor(tried, stage, i);
                case Amplifier a -> FrontEndPages.conditioner(tried, stage, i);
                case AntiAliasFilter f -> FrontEndPages.filter(tried, stage, i);
                case Digitizer d -> DigitizerPage.of(tried, stage, i);
                case Camera c -> CameraPage.of(tried, stage, i);
                case null, default -> new StagePage(StagePage.Kind.OTHER, "Stage " + (i + 1) + ": " + Names.stageText(stage),
                        List.of("The notebook does not say what this stage does to the signal."), List.of(),
                        java.util.Optional.empty(), java.util.Optional.empty(), i);
            });
        }
        if (!change.isNone()) {
            pages = pages.stream().map(p -> marked(p, change, chain)).collect(java.util.stream.Collectors.toList());
        }
        return new Walkthrough(rig, chain, tried, change, channel, pages, new Words(
                Names.shortName(rig), Names.shortName(chain),
                chain.getId() != null ? chain.getId() : Names.shortName(chain),
                ChainSummary.path(tried)));
    }

    /** The page with the figures the what-if changed saying so, and what the notebook says instead. */
    private static StagePage marked(StagePage page, WhatIf change, SignalChain chain) {
        List<StagePage.Figure> figures = page.figures().stream().map(f -> {
            if (change.rateHz() != null && (f.name().equals("Sampling rate") || f.name().equals("Frame rate"))) {
                return new StagePage.Figure(f.name(), f.value(), "what-if; the notebook says "
                        + org.foldbook.model.derived.Quantities.plain(ChainFigures.samplingRateHz(chain)));
            }
            if (change.cutoffHz() != null && f.name().equals("Cutoff")) {
                return new StagePage.Figure(f.name(), f.value(), "what-if; the notebook says "
                        + org.foldbook.model.derived.Quantities.hz(ChainFigures.effectiveCutoffHz(ChainFigures.filterStage(chain))));
            }
            return f;
        }).toList();
        return new StagePage(page.kind(), page.title(), page.paragraphs(), figures, page.chart(), page.motion(),
                page.stageIndex());
    }

    /** The walkthrough for a channel: its chain, in the rig that holds the chain. */
    public static Walkthrough of(Channel channel, WhatIf whatIf) {
        SignalChain chain = channel.getChain();
        if (chain == null || !(chain.eContainer() instanceof Rig rig)) {
            throw new IllegalArgumentException(Names.label(channel) + " has no chain in a rig to walk through");
        }
        return of(rig, chain, whatIf, channel);
    }

    /** The stages as one line (the running picture's text form). */
    public String path() {
        return words.path();
    }

    /** The index of the page of stage {@code stageIndex}. */
    public int pageOfStage(int stageIndex) {
        for (int p = 0; p < pages.size(); p++) {
            if (pages.get(p).stageIndex() == stageIndex) {
                return p;
            }
        }
        return -1;
    }

    /** The first page of {@code kind}, or null. */
    public StagePage page(StagePage.Kind kind) {
        return pages.stream().filter(p -> p.kind() == kind).findFirst().orElse(null);
    }
}
