package org.foldbook.ui.simulation;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CompoundCommand;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.foldbook.channel.ChannelSimulation;
import org.foldbook.channel.SimulationSetup;
import org.foldbook.dsp.NumberText;
import org.foldbook.model.Channel;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.RateSpacing;
import org.foldbook.model.SignalChain;
import org.foldbook.model.SweepPlan;
import org.foldbook.sweep.PeakThreshold;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.SimulationMode;

/**
 * The simulation part's plan, without SWT: typed values become undoable EMF commands on the channel's
 * stored {@link SweepPlan} (one is created when the channel has none), or a problem in words; and a
 * {@link Request} turns plan + choices into the channel service's set-up. A list of rates is for one run
 * only: the notebook stores a plan as highest/lowest/count/spacing.
 */
final class SimulationPlanner {
    private static final NotebookPackage P = NotebookPackage.eINSTANCE;

    private SimulationPlanner() {
    }

    /**
     * What to run: the mode, a list of rates replacing the plan's ladder (null: the plan's), and the peak rule
     * of the workbench's preferences (null: the sweep's default). With the default rule the set-up is the
     * command line's {@code sweep --notebook} exactly.
     */
    record Request(SimulationMode mode, double[] rateList, PeakThreshold threshold) {
        SimulationSetup setup(Channel channel, double sourceRate) {
            SimulationSetup s = ChannelSimulation.setup(channel, mode, sourceRate);
            if (rateList != null) {
                s = s.withLadder(RateLadder.ofRates(sourceRate, rateList, ChannelSimulation.MAX_DENOMINATOR));
            }
            if (threshold != null && !threshold.equals(s.settings().threshold())) {
                s = s.withSettings(s.settings().withThreshold(threshold));
            }
            return s;
        }
    }

    private static final Pattern THRESHOLD = Pattern.compile("PeakThreshold\\[[^\\]]*\\]");

    /**
     * The peak rule a kept run was made with, from its set-up signature: the one it names when the rule was
     * replaced ({@link SimulationSetup#withSettings}), else the sweep's default (the notebook's set-up keeps it).
     */
    static String thresholdOf(String setupSignature) {
        Matcher m = THRESHOLD.matcher(setupSignature == null ? "" : setupSignature);
        String found = null;
        while (m.find()) {
            found = m.group();   // the last replacement counts
        }
        return found != null ? found : PeakThreshold.DEFAULT.toString();
    }

    /** Parses a list of rates typed by a person (S/s). */
    static double[] rateList(String text) {
        return NumberText.positiveList("rate in S/s", text);
    }

    /** A command setting {@code feature} of the channel's plan to the typed {@code text}; throws with the problem. */
    static Command edit(EditingDomain domain, Channel channel, EStructuralFeature feature, String text) {
        Object value;
        if (feature == P.getSweepPlan_RateCount()) {
            int v = NumberText.atLeast("number of rates", text, 1);
            if (v > 1000) {
                throw new IllegalArgumentException("Number of rates must be at most 1000, was " + v + ".");
            }
            value = v;
        } else if (feature == P.getSweepPlan_BandLowHz()) {
            Double v = text.isBlank() ? null : NumberText.finite("band low edge in Hz", text);
            if (v != null && v < 0) {
                throw new IllegalArgumentException("Band low edge must not be negative, was " + v + " Hz.");
            }
            value = v;
        } else if (feature == P.getSweepPlan_BandHighHz()) {
            value = text.isBlank() ? null : NumberText.positive("band high edge in Hz", text);
        } else {
            value = NumberText.positive(feature == P.getSweepPlan_MaxRateHz() ? "highest rate in S/s"
                    : "lowest rate in S/s", text);
        }
        return set(domain, channel, feature, value);
    }

    /** A command setting the plan's spacing. */
    static Command spacing(EditingDomain domain, Channel channel, RateSpacing spacing) {
        return set(domain, channel, P.getSweepPlan_Spacing(), spacing);
    }

    /** A command setting the chain the modelled mode applies (null: the channel's own). */
    static Command throughChain(EditingDomain domain, Channel channel, SignalChain chain) {
        return set(domain, channel, P.getSweepPlan_ThroughChain(), chain);
    }

    private static Command set(EditingDomain domain, Channel channel, EStructuralFeature feature, Object value) {
        SweepPlan plan = channel.getSweepPlan();
        if (plan != null) {
            return SetCommand.create(domain, plan, feature, value);
        }
        // the channel has no plan yet: one, as the service's default, carrying the new value
        SweepPlan fresh = NotebookFactory.eINSTANCE.createSweepPlan();
        fresh.setSpacing(RateSpacing.GEOMETRIC);
        fresh.eSet(feature, value);
        CompoundCommand c = new CompoundCommand("Sweep plan of " + channel.getName());
        c.append(SetCommand.create(domain, channel, P.getChannel_SweepPlan(), fresh));
        return c;
    }
}
