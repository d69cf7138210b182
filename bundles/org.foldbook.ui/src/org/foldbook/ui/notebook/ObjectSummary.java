package org.foldbook.ui.notebook;

import org.foldbook.model.derived.Quantities;
import org.foldbook.model.derived.Names;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.Rig;
import org.foldbook.model.Sensor;
import org.foldbook.ui.notebook.ChainSummary.Row;

/**
 * The facts the details pane lists for what is not a chain: a device's data-sheet values, a rig's
 * validity and notes (where the rig's safety cautions are written), an experiment's who/when/why and
 * a recording's file, rate and logged checksum. Only what the notebook holds; empty values are left out.
 */
final class ObjectSummary {

    private ObjectSummary() {
    }

    static List<Row> rows(EObject object) {
        List<Row> rows = new ArrayList<>();
        if (object instanceof Device device) {
            add(rows, "Kind", Names.kind(device));
            add(rows, "Model", device.getModelName());
            add(rows, "Serial number", device.getSerialNumber());
            add(rows, "Calibrated", day(device.getCalibrationDate()));
            deviceRows(device, rows);
            add(rows, "Notes", device.getNotes());
        } else if (object instanceof Rig rig) {
            add(rows, "Valid from", day(rig.getValidFrom()));
            add(rows, "Valid until", rig.getValidUntil() == null ? "open" : day(rig.getValidUntil()));
            add(rows, "Chains", Integer.toString(rig.getChains().size()));
            add(rows, "Notes", rig.getNotes());
        } else if (object instanceof Experiment experiment) {
            add(rows, "Date", day(experiment.getDate()));
            add(rows, "Rig", experiment.getRig() == null ? null : Names.shortName(experiment.getRig()));
            add(rows, "Operator", experiment.getOperator());
            add(rows, "Purpose", experiment.getPurpose());
            add(rows, "Notes", experiment.getNotes());
        } else if (object instanceof Recording recording) {
            add(rows, "File", recording.getPath());
            add(rows, "Format", recording.getFormat() == null ? null : recording.getFormat().getLiteral());
            add(rows, "Declared rate", Quantities.rate(recording.getDeclaredRateHz()));
            add(rows, "Channels", Integer.toString(recording.getChannelCount()));
            add(rows, "Size", recording.getSizeBytes() + " bytes");
            add(rows, "SHA-256 logged", recording.getSha256());
        } else if (object instanceof Notebook notebook) {
            add(rows, "Group", notebook.getOwningGroup());
            add(rows, "Devices", Integer.toString(notebook.getDevices().size()));
            add(rows, "Rigs", Integer.toString(notebook.getRigs().size()));
            add(rows, "Experiments", Integer.toString(notebook.getExperiments().size()));
        }
        return rows;
    }

    private static void deviceRows(Device device, List<Row> rows) {
        if (device instanceof Sensor s) {
            add(rows, "Measures", s.getQuantity() == null ? null : s.getQuantity() + (s.getUnit() == null ? "" : " in " + s.getUnit()));
            add(rows, "Sensitivity", s.getSensitivity() == null ? null
                    : Quantities.number(s.getSensitivity()) + " " + (s.getSensitivityUnit() == null ? "" : s.getSensitivityUnit()));
            if (s.getUsableMinHz() != null || s.getUsableMaxHz() != null) {
                add(rows, "Usable band", (s.getUsableMinHz() == null ? "?" : Quantities.hz(s.getUsableMinHz())) + " – "
                        + (s.getUsableMaxHz() == null ? "?" : Quantities.hz(s.getUsableMaxHz())));
            }
            add(rows, "Resonance", s.getResonanceHz() == null ? null : Quantities.hz(s.getResonanceHz()));
        } else if (device instanceof Amplifier a) {
            add(rows, "Gains", a.getGainSettings().isEmpty() ? null
                    : String.join(", ", a.getGainSettings().stream().map(g -> "×" + Quantities.number(g)).toList()));
            add(rows, "Bandwidth up to", a.getBandwidthHighHz() == null ? null : Quantities.hz(a.getBandwidthHighHz()));
        } else if (device instanceof AntiAliasFilter f) {
            add(rows, "Response", Names.familyText(f));
            add(rows, "Cutoff", f.getCutoffHz() > 0 ? Quantities.hz(f.getCutoffHz()) : null);
        } else if (device instanceof Digitizer d) {
            add(rows, "Resolution", d.getResolutionBits() + " bits");
            add(rows, "Dynamic range", d.getDynamicRangeDb() != null ? Quantities.number(d.getDynamicRangeDb()) + " dB (specification)"
                    : d.getResolutionBits() > 0 && d.getResolutionBits() <= org.foldbook.dsp.digitizer.IdealQuantiser.MAX_BITS
                            ? Quantities.number(new org.foldbook.dsp.digitizer.IdealQuantiser(d.getResolutionBits(), 1.0).snrDb())
                                    + " dB (not given: ideal quantiser, 6.02·N + 1.76 dB)"
                            : null);
            add(rows, "Highest rate", Quantities.rate(d.getMaxRateHz()));
            add(rows, "Built-in digital filter", d.isDigitalFilter() ? "yes (delta-sigma)" : "no");
        } else if (device instanceof Camera c) {
            add(rows, "Frame rates", c.getFrameRatesHz().isEmpty() ? null
                    : String.join(", ", c.getFrameRatesHz().stream().map(Quantities::number).toList()) + " frames/s");
            add(rows, "Exposure", c.getExposureS() == null ? null : Quantities.ms(c.getExposureS()));
        }
    }

    private static void add(List<Row> rows, String figure, String value) {
        if (value != null && !value.isBlank()) {
            rows.add(new Row(figure, value));
        }
    }

    private static String day(Date date) {
        return date == null ? null : date.toInstant().toString().substring(0, 10);
    }
}
