package org.foldbook.model.validation;

import org.eclipse.emf.ecore.EObject;
import org.foldbook.model.Channel;
import org.foldbook.model.Device;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.SweepPlan;

/** Names an object of the notebook the way a diagnostic should: kind, name and where it sits. */
public final class Labels {

    private Labels() {
    }

    public static String of(EObject object) {
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
            return "chain " + quoted(name) + (chain.eContainer() != null ? " of " + of(chain.eContainer()) : "");
        }
        if (object instanceof Stage stage) {
            SignalChain chain = (SignalChain) stage.eContainer();
            String position = chain == null ? "" : "stage " + (chain.getStages().indexOf(stage) + 1) + " ";
            String device = stage.getDevice() == null ? "(no device)" : of(stage.getDevice());
            return position + "[" + device + "]" + (chain != null ? " of " + of(chain) : "");
        }
        if (object instanceof Experiment experiment) {
            return "experiment " + quoted(experiment.getName());
        }
        if (object instanceof Channel channel) {
            return "channel " + quoted(channel.getName())
                    + (channel.eContainer() != null ? " of " + of(channel.eContainer()) : "");
        }
        if (object instanceof Recording recording) {
            return "recording " + quoted(recording.getPath() != null ? recording.getPath() : recording.getId());
        }
        if (object instanceof SweepPlan plan) {
            return "sweep plan" + (plan.eContainer() != null ? " of " + of(plan.eContainer()) : "");
        }
        return object.eClass().getName();
    }

    private static String kind(Device device) {
        return switch (device.eClass().getName()) {
            case "AntiAliasFilter" -> "anti-alias filter";
            default -> device.eClass().getName().toLowerCase(java.util.Locale.ROOT);
        };
    }

    private static String quoted(String name) {
        return name == null || name.isBlank() ? "(unnamed)" : "'" + name + "'";
    }
}
