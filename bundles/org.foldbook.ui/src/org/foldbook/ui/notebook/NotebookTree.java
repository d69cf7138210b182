package org.foldbook.ui.notebook;

import org.foldbook.model.derived.Quantities;
import org.foldbook.model.derived.Names;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.foldbook.model.Channel;
import org.foldbook.model.Device;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;

/**
 * What the notebook tree shows: the notebook, then its inventory (devices), its rigs (chains, their
 * stages) and its experiments (recordings and channels). The two headings are {@link Heading}
 * values; everything else is the model object itself, so a selection is a model object.
 */
final class NotebookTree implements ITreeContentProvider {

    /** A heading of the tree ("Inventory", "Rigs", "Experiments") and what it holds. */
    record Heading(String title, Notebook notebook) {
        List<?> children() {
            return switch (title) {
                case INVENTORY -> notebook.getDevices();
                case RIGS -> notebook.getRigs();
                default -> notebook.getExperiments();
            };
        }
    }

    /** The viewer's input: never the notebook itself, as JFace needs the input to differ from every element. */
    record Root(Notebook notebook) {
    }

    static final String INVENTORY = "Inventory";
    static final String RIGS = "Rigs";
    static final String EXPERIMENTS = "Experiments";

    @Override
    public Object[] getElements(Object input) {
        return input instanceof Root root ? new Object[] { root.notebook() } : new Object[0];
    }

    @Override
    public Object[] getChildren(Object element) {
        if (element instanceof Notebook notebook) {
            return new Object[] { new Heading(INVENTORY, notebook), new Heading(RIGS, notebook),
                    new Heading(EXPERIMENTS, notebook) };
        }
        if (element instanceof Heading heading) {
            return heading.children().toArray();
        }
        if (element instanceof Rig rig) {
            return rig.getChains().toArray();
        }
        if (element instanceof SignalChain chain) {
            return chain.getStages().toArray();
        }
        if (element instanceof Experiment experiment) {
            Object[] recordings = experiment.getRecordings().toArray();
            Object[] channels = experiment.getChannels().toArray();
            Object[] all = new Object[recordings.length + channels.length];
            System.arraycopy(channels, 0, all, 0, channels.length);
            System.arraycopy(recordings, 0, all, channels.length, recordings.length);
            return all;
        }
        return new Object[0];
    }

    @Override
    public Object getParent(Object element) {
        if (element instanceof Heading heading) {
            return heading.notebook();
        }
        if (element instanceof Device || element instanceof Rig || element instanceof Experiment) {
            Notebook notebook = (Notebook) ((EObject) element).eContainer();
            if (notebook == null) {
                return null;
            }
            String title = element instanceof Device ? INVENTORY : element instanceof Rig ? RIGS : EXPERIMENTS;
            return new Heading(title, notebook);
        }
        if (element instanceof Notebook) {
            return null;
        }
        return element instanceof EObject o ? o.eContainer() : null;
    }

    @Override
    public boolean hasChildren(Object element) {
        return getChildren(element).length > 0;
    }

    /** Text of the tree's first column. */
    static String name(Object element) {
        if (element instanceof Heading heading) {
            return heading.title() + " (" + heading.children().size() + ")";
        }
        if (element instanceof Notebook notebook) {
            return notebook.getTitle() == null ? "(untitled notebook)" : notebook.getTitle();
        }
        return element instanceof EObject o ? Names.shortName(o) : String.valueOf(element);
    }

    /** Text of the tree's second column: the one fact worth seeing without selecting the row. */
    static String summary(Object element) {
        if (element instanceof Device device) {
            return Names.kind(device) + deviceSpec(device);
        }
        if (element instanceof SignalChain chain) {
            double rate = ChainFigures.samplingRateHz(chain);
            return Double.isNaN(rate) ? "no sampling stage"
                    : "Nyquist " + Quantities.hz(rate / 2) + ", " + chain.getStages().size()
                            + (chain.getStages().size() == 1 ? " stage" : " stages");
        }
        if (element instanceof Stage stage) {
            return stage.getDevice() == null ? "" : Names.kind(stage.getDevice());
        }
        if (element instanceof Channel channel) {
            String unit = channel.getUnit() == null ? "" : "[" + channel.getUnit() + "] ";
            return unit + (channel.getRecording() == null ? "no recording"
                    : channel.getRecording().getId() + " ch " + channel.getChannelIndex());
        }
        if (element instanceof Recording recording) {
            return recording.getChannelCount() + " ch @ " + Quantities.rate(recording.getDeclaredRateHz())
                    + (recording.getFormat() != null ? ", " + recording.getFormat().getLiteral() : "");
        }
        if (element instanceof Experiment experiment) {
            return experiment.getDate() == null ? "" : experiment.getDate().toInstant().toString().substring(0, 10);
        }
        if (element instanceof Rig rig) {
            return rig.getChains().size() + " chains";
        }
        return "";
    }

    /** The figure that tells devices of one kind apart, e.g. ", 24-bit, 51.2 kS/s max". */
    private static String deviceSpec(Device device) {
        if (device instanceof org.foldbook.model.Sensor sensor) {
            return (sensor.getUnit() != null ? ", " + sensor.getUnit() : "")
                    + (sensor.getUsableMaxHz() != null ? ", to " + Quantities.hz(sensor.getUsableMaxHz()) : "");
        }
        if (device instanceof org.foldbook.model.AntiAliasFilter filter) {
            return filter.getFamily() == org.foldbook.model.FilterFamily.NONE ? ", bypass"
                    : ", " + Names.familyText(filter) + " @ " + Quantities.hz(filter.getCutoffHz());
        }
        if (device instanceof org.foldbook.model.Digitizer digitizer) {
            return ", " + digitizer.getResolutionBits() + "-bit, " + Quantities.rate(digitizer.getMaxRateHz()) + " max"
                    + (digitizer.isDigitalFilter() ? ", delta-sigma" : "");
        }
        if (device instanceof org.foldbook.model.Camera camera && !camera.getFrameRatesHz().isEmpty()) {
            return ", to " + Quantities.number(java.util.Collections.max(camera.getFrameRatesHz())) + " frames/s";
        }
        return "";
    }
}
