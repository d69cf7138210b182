package org.foldbook.model.validation;

import static org.foldbook.model.validation.FindingKind.INDEX_OUTSIDE_RECORDING;
import static org.foldbook.model.validation.FindingKind.UNIT_MISMATCH;
import static org.foldbook.model.validation.FindingReport.report;

import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.foldbook.model.Channel;
import org.foldbook.model.Recording;
import org.foldbook.model.Sensor;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Names;

/** Rules linking a channel to its recording and to the sensor of its chain. */
public final class ChannelRules {

    private ChannelRules() {
    }

    public static boolean indexInsideRecording(Channel channel, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Recording recording = channel.getRecording();
        if (recording == null) {
            return true;
        }
        int index = channel.getChannelIndex();
        int count = recording.getChannelCount();
        if (index >= 0 && index < count) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, INDEX_OUTSIDE_RECORDING, channel,
                "channel index " + index + " is outside " + Names.label(recording) + ", which holds " + count
                        + " channel(s), indices 0 to " + (count - 1),
                "Pick an index from 0 to " + (count - 1) + ", or correct the recording's channel count");
    }

    public static boolean unitMatchesSensor(Channel channel, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        if (channel.getChain() == null || channel.getUnit() == null) {
            return true;
        }
        Stage stage = ChainFigures.sensorStage(channel.getChain());
        if (stage == null || ((Sensor) stage.getDevice()).getUnit() == null) {
            return true;
        }
        String sensorUnit = ((Sensor) stage.getDevice()).getUnit();
        if (UnitText.sameUnit(sensorUnit, channel.getUnit())) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, UNIT_MISMATCH, channel,
                "unit '" + channel.getUnit() + "' differs from '" + sensorUnit + "' measured by "
                        + Names.label(stage.getDevice()),
                "Set the channel's unit to '" + sensorUnit + "', or link the channel to the chain of the sensor it"
                        + " really came from");
    }
}
