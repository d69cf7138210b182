package org.foldbook.ui.recording;

import java.util.Locale;

import org.foldbook.model.Amplifier;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.validation.UnitText;

/**
 * From full-scale fractions (what a PCM recording holds) to the sensor's quantity, through the chain as
 * the notebook logs it: {@code value = x · range / (gains · sensitivity)}, where range is the digitizer
 * stage's input range in V (full scale = ±range), gains the product of the amplifier stages' gains, and
 * sensitivity the sensor's in V per unit. A charge sensor (pC per unit) takes the first amplifier's gain as
 * mV/pC, the way charge amplifiers state it (common practice). When a figure is missing the scale is
 * absent and says why; the view then shows dBFS only.
 *
 * @param unitsPerFullScale the quantity at x = 1, NaN when absent
 * @param unit              the quantity's unit as the notebook writes it ("m/s^2")
 * @param how               the arithmetic in words, or why there is no scale
 */
public record PhysicalScale(double unitsPerFullScale, String unit, String how) {

    public boolean present() {
        return Double.isFinite(unitsPerFullScale);
    }

    /**
     * The reference of level in dB for the unit: 1 µm/s² for acceleration, 1 nm/s for velocity, 20 µPa
     * for sound pressure (ISO 1683:2015 preferred references), 1 of the unit otherwise.
     */
    public double dbReference() {
        if (UnitText.sameUnit(unit, "m/s^2")) {
            return 1e-6;
        }
        if (UnitText.sameUnit(unit, "m/s")) {
            return 1e-9;
        }
        if (UnitText.sameUnit(unit, "Pa")) {
            return 20e-6;
        }
        return 1.0;
    }

    /** "1 µm/s²", "20 µPa", "1 V". */
    public String dbReferenceText() {
        if (UnitText.sameUnit(unit, "m/s^2")) {
            return "1 µm/s²";
        }
        if (UnitText.sameUnit(unit, "m/s")) {
            return "1 nm/s";
        }
        if (UnitText.sameUnit(unit, "Pa")) {
            return "20 µPa";
        }
        return "1 " + pretty(unit);
    }

    /** The unit with superscripts: "m/s²". */
    public static String pretty(String unit) {
        return unit == null ? "" : unit.replace("^2", "²").replace("^3", "³");
    }

    static PhysicalScale absent(String unit, String why) {
        return new PhysicalScale(Double.NaN, unit == null ? "" : unit, why);
    }

    /** The scale of {@code channel}'s samples, or an absent one saying which figure is missing. */
    public static PhysicalScale of(Channel channel) {
        String unit = channel.getUnit();
        SignalChain chain = channel.getChain();
        if (chain == null) {
            return absent(unit, "the channel names no chain");
        }
        Sensor sensor = null;
        Stage sampler = null;
        double gains = 1;
        boolean charge = false;
        boolean chargeConverted = false;
        StringBuilder gainText = new StringBuilder();
        for (Stage stage : chain.getStages()) {
            if (stage.getDevice() instanceof Sensor s && sensor == null) {
                sensor = s;
            } else if (stage.getDevice() instanceof Amplifier a) {
                Double g = stage.getGain() != null ? stage.getGain()
                        : a.getGainSettings().size() == 1 ? a.getGainSettings().get(0) : null;
                if (g == null || !(g > 0)) {
                    return absent(unit, "amplifier " + a.getId() + " has no gain logged for this chain");
                }
                gains *= g;
                gainText.append(" × ").append(fmt(g)).append(charge && !chargeConverted ? " mV/pC" : "");
                chargeConverted = true;
            } else if (stage.getDevice() instanceof Digitizer) {
                sampler = stage;
            }
            if (sensor != null && !charge && sensitivityVolts(sensor) == null && isCharge(sensor)) {
                charge = true;
            }
        }
        if (sampler == null) {
            return absent(unit, "the chain has no digitizer (a camera's levels are brightness)");
        }
        Digitizer digitizer = (Digitizer) sampler.getDevice();
        Double range = sampler.getRangeV() != null ? sampler.getRangeV()
                : digitizer.getInputRangesV().size() == 1 ? digitizer.getInputRangesV().get(0) : null;
        if (range == null || !(range > 0)) {
            return absent(unit, "no input range is logged for digitizer " + digitizer.getId());
        }
        if (sensor == null || sensor.getSensitivity() == null || !(sensor.getSensitivity() > 0)) {
            return absent(unit, "no sensor sensitivity is logged");
        }
        String per = perUnit(sensor.getSensitivityUnit());
        if (per == null || unit == null || !UnitText.sameUnit(per, unit)) {
            return absent(unit, "sensitivity in " + sensor.getSensitivityUnit() + " does not match the channel's unit "
                    + unit);
        }
        double voltsPerUnit;
        if (charge) {
            if (!chargeConverted) {
                return absent(unit, "a charge sensor needs a charge amplifier's gain (mV/pC)");
            }
            double pcPerUnit = sensor.getSensitivity() * chargeFactor(sensor.getSensitivityUnit());
            voltsPerUnit = pcPerUnit * gains * 1e-3; // gains in mV/pC (and plain factors after it)
        } else {
            Double v = sensitivityVolts(sensor);
            if (v == null) {
                return absent(unit, "sensitivity unit " + sensor.getSensitivityUnit() + " is not V, mV, µV or pC per unit");
            }
            voltsPerUnit = v * gains;
        }
        String how = String.format(Locale.ROOT, "full scale ±%s V / (%s %s%s) = %s %s", fmt(range),
                fmt(sensor.getSensitivity()), sensor.getSensitivityUnit(), gainText, fmt(range / voltsPerUnit),
                pretty(unit));
        return new PhysicalScale(range / voltsPerUnit, unit, how);
    }

    private static boolean isCharge(Sensor s) {
        String u = s.getSensitivityUnit();
        return u != null && (u.startsWith("pC/") || u.startsWith("nC/"));
    }

    private static double chargeFactor(String u) {
        return u.startsWith("nC/") ? 1000 : 1;
    }

    /** Sensitivity in V per unit for a voltage sensor, or null. */
    private static Double sensitivityVolts(Sensor s) {
        String u = s.getSensitivityUnit();
        if (u == null || s.getSensitivity() == null) {
            return null;
        }
        String head = u.substring(0, Math.max(0, u.indexOf('/'))).trim();
        double f = switch (head) {
            case "V" -> 1;
            case "mV" -> 1e-3;
            case "µV", "μV", "uV" -> 1e-6;
            default -> Double.NaN;
        };
        return Double.isNaN(f) ? null : s.getSensitivity() * f;
    }

    /** "pC/(m/s^2)" → "m/s^2"; "mV/Pa" → "Pa". */
    private static String perUnit(String u) {
        if (u == null || u.indexOf('/') < 0) {
            return null;
        }
        String per = u.substring(u.indexOf('/') + 1).trim();
        if (per.startsWith("(") && per.endsWith(")")) {
            per = per.substring(1, per.length() - 1);
        }
        return per;
    }

    static String fmt(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        if (s.contains("e")) {
            return s;
        }
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }
}
