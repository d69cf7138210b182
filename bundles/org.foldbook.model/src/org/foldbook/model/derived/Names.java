package org.foldbook.model.derived;

import static org.foldbook.model.derived.Quantities.hz;
import static org.foldbook.model.derived.Quantities.number;
import static org.foldbook.model.derived.Quantities.rate;

import java.util.Locale;

import org.eclipse.emf.ecore.EObject;
import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Channel;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.SweepPlan;

/**
 * How Foldbook names a notebook object for people, everywhere: {@link #kind} ("anti-alias filter"),
 * {@link #shortName} (tree rows, tables), {@link #label} (diagnostics: kind, name and where it sits)
 * and {@link #stageText} (a stage with the settings in effect).
 */
public final class Names {

    private Names() {
    }

    /** The kind of object in words: "sensor", "anti-alias filter", "chain", "channel" … */
    public static String kind(EObject object) {
        return switch (object.eClass().getName()) {
            case "AntiAliasFilter" -> "anti-alias filter";
            case "SignalChain" -> "chain";
            case "SweepPlan" -> "sweep plan";
            case "SimulationRun" -> "simulation run";
            default -> object.eClass().getName().toLowerCase(Locale.ROOT);
        };
    }

    /** {@link #kind} with a capital first letter, for headings. */
    public static String kindTitle(EObject object) {
        String k = kind(object);
        return Character.toUpperCase(k.charAt(0)) + k.substring(1);
    }

    public static String label(EObject object) {
        if (object instanceof Notebook notebook) {
            return "notebook " + quoted(notebook.getTitle());
        }
        if (object instanceof Device device) {
            String name = device.getId() != null ? device.getId() : device.getModelName();
            return kind(device) + " " + quoted(name)
                    + (device.getSerialNumber() != null ? " (serial " + device.getSerialNumber() + ")" : "");
        }
        if (object instanceof Rig rig) {
            return "rig " + quoted(rig.getName() != null ? rig.getName() : rig.getId());
        }
        if (object instanceof SignalChain chain) {
            String name = chain.getName() != null ? chain.getName() : chain.getId();
            return "chain " + quoted(name) + (chain.eContainer() != null ? " of " + label(chain.eContainer()) : "");
        }
        if (object instanceof Stage stage) {
            SignalChain chain = (SignalChain) stage.eContainer();
            String position = chain == null ? "" : "stage " + (chain.getStages().indexOf(stage) + 1) + " ";
            String device = stage.getDevice() == null ? "(no device)" : label(stage.getDevice());
            return position + "[" + device + "]" + (chain != null ? " of " + label(chain) : "");
        }
        if (object instanceof Experiment experiment) {
            return "experiment " + quoted(experiment.getName());
        }
        if (object instanceof Channel channel) {
            return "channel " + quoted(channel.getName())
                    + (channel.eContainer() != null ? " of " + label(channel.eContainer()) : "");
        }
        if (object instanceof Recording recording) {
            return "recording " + quoted(recording.getPath() != null ? recording.getPath() : recording.getId());
        }
        if (object instanceof SweepPlan plan) {
            return "sweep plan" + (plan.eContainer() != null ? " of " + label(plan.eContainer()) : "");
        }
        return object.eClass().getName();
    }

    /** A short name of a model object (for the tree and the findings list). */
    public static String shortName(EObject object) {
        if (object instanceof Device device) {
            return device.getId() != null ? device.getId() : String.valueOf(device.getModelName());
        }
        if (object instanceof Rig rig) {
            return rig.getName() != null ? rig.getName() : String.valueOf(rig.getId());
        }
        if (object instanceof SignalChain chain) {
            return chain.getName() != null ? chain.getName() : String.valueOf(chain.getId());
        }
        if (object instanceof Stage stage) {
            return stageText(stage);
        }
        if (object instanceof Experiment experiment) {
            return String.valueOf(experiment.getName());
        }
        if (object instanceof Channel channel) {
            return String.valueOf(channel.getName());
        }
        if (object instanceof Recording recording) {
            return recording.getPath() != null ? recording.getPath() : String.valueOf(recording.getId());
        }
        if (object instanceof Notebook notebook) {
            return String.valueOf(notebook.getTitle());
        }
        return object.eClass().getName();
    }

    /** A stage's device and its settings, short. */
    public static String stageText(Stage stage) {
        Device device = stage.getDevice();
        if (device == null) {
            return "(no device)";
        }
        String name = device.getId() != null ? device.getId() : String.valueOf(device.getModelName());
        if (device instanceof Amplifier) {
            return name + (stage.getGain() != null ? " ×" + number(stage.getGain()) : "");
        }
        if (device instanceof AntiAliasFilter filter) {
            if (filter.getFamily() == FilterFamily.NONE) {
                return name + " (no filtering)";
            }
            return name + " " + familyText(filter) + " @ " + hz(ChainFigures.effectiveCutoffHz(stage));
        }
        if (device instanceof Digitizer digitizer) {
            return name + " " + digitizer.getResolutionBits() + "-bit @ " + rate(ChainFigures.stageRateHz(stage))
                    + (digitizer.isDigitalFilter() ? " (built-in filter)" : "");
        }
        if (device instanceof Camera) {
            double rate = ChainFigures.stageRateHz(stage);
            return name + " @ " + (Double.isNaN(rate) ? "?" : number(rate) + " frames/s");
        }
        return name;
    }

    /** "Butterworth 4", "RC", "elliptic 6". */
    public static String familyText(AntiAliasFilter filter) {
        String family = switch (filter.getFamily()) {
            case RC -> "RC";
            case BUTTERWORTH -> "Butterworth";
            case BESSEL -> "Bessel";
            case CHEBYSHEV_I -> "Chebyshev I";
            case ELLIPTIC -> "elliptic";
            case NONE -> "none";
            case UNKNOWN -> "unknown type";
        };
        return filter.getOrder() > 0 && filter.getFamily() != FilterFamily.RC ? family + " " + filter.getOrder() : family;
    }

    private static String quoted(String name) {
        return name == null || name.isBlank() ? "(unnamed)" : "'" + name + "'";
    }
}
