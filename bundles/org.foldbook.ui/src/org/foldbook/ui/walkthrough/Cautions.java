package org.foldbook.ui.walkthrough;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Device;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.Names;

/**
 * The first page: the rig's own notes from the notebook, the notes of the devices on this chain, and the
 * usual general cautions — local rules and qualified staff come first; Foldbook's figures replace neither.
 */
public final class Cautions {

    /** The general cautions, always shown (common lab practice, not a rule set of our own). */
    public static final List<String> GENERAL = List.of(
            "Local rules and the instructions of qualified staff come first; ask before you touch a rig you do not know.",
            "Mains-powered conditioners, amplifiers and filter units: only with intact cases and cables, never opened, "
                    + "and with the lab's electrical checks in date.",
            "High-voltage stimulators: only under supervision and with the lab's procedure for the preparation or subject.",
            "Shakers and exciters: fixtures tight, limits set, hands and cables clear before the drive is enabled.",
            "Lasers (vibrometers, light sheets): the class on the label decides eye protection and who may switch them on.",
            "Rotating machinery: guards closed and interlocked, no loose clothing or hair, stop the drive before "
                    + "reaching in — also to fix a camera or a mark.");

    private Cautions() {
    }

    static StagePage page(Rig rig, SignalChain chain) {
        List<String> text = new ArrayList<>();
        text.add("Before anything else, the cautions for " + Names.label(rig) + ", chain "
                + Names.shortName(chain) + ".");
        if (rig.getNotes() != null && !rig.getNotes().isBlank()) {
            text.add("This rig's notes in the notebook: " + rig.getNotes().strip());
        } else {
            text.add("The notebook holds no notes for this rig: ask who runs it about its own hazards.");
        }
        Set<Device> devices = new LinkedHashSet<>();
        for (Stage stage : chain.getStages()) {
            if (stage.getDevice() != null) {
                devices.add(stage.getDevice());
            }
        }
        for (Device device : devices) {
            if (device.getNotes() != null && !device.getNotes().isBlank()) {
                text.add("Notes on " + Names.label(device) + ": " + device.getNotes().strip());
            }
        }
        List<String> conditioners = devices.stream().filter(d -> d instanceof Amplifier || d instanceof AntiAliasFilter)
                .map(Names::shortName).toList();
        if (!conditioners.isEmpty()) {
            text.add("On this chain, conditioning devices (ask whether they are mains-powered): "
                    + String.join(", ", conditioners) + ".");
        }
        boolean rotating = chain.getStages().stream()
                .anyMatch(s -> s.getDevice() instanceof Camera && s.getFilmedRotationHz() != null);
        if (rotating) {
            text.add("This chain films a rotating part: the rotating-machinery caution applies.");
        }
        text.add("General cautions:");
        text.addAll(GENERAL.stream().map(c -> "• " + c).toList());
        return new StagePage(StagePage.Kind.CAUTIONS, "Cautions: " + Names.shortName(rig), text, List.of(),
                Optional.empty(), Optional.empty(), -1);
    }
}
