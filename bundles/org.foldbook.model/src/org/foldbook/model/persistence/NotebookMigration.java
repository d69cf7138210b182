package org.foldbook.model.persistence;

import org.foldbook.model.derived.Names;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.FeatureMap;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xml.type.AnyType;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.Recording;
import org.foldbook.model.Sensor;
import org.foldbook.model.SweepMode;

/**
 * Reads notebooks of the previous format version, 0.9 (namespace {@value #PREVIOUS_NS_URI}; its
 * model is frozen in model/history/notebook-0.9.ecore). Version 1 renamed or split three things:
 * <ul>
 * <li>Recording {@code rate} became {@code declaredRateHz}, {@code channels} became
 * {@code channelCount};</li>
 * <li>Recording {@code checksum="sha256:<hex>"} became {@code sha256="<hex>"};</li>
 * <li>Sensor {@code band="<low>..<high>"} (Hz) became {@code usableMinHz} and {@code usableMaxHz}.</li>
 * </ul>
 * The resource loads a 0.9 file with the current package (its namespace maps to it), so the old
 * attributes arrive as unknown features; this class turns them into the new ones. Anything else
 * unknown is left for the resource to write back unchanged.
 *
 * <p>Within version 1 the {@link SweepMode} literals became the sweep's mode words ({@code bare},
 * {@code modelled}, {@code ideal}); files written before hold {@link #OLD_SWEEP_MODES}, read as the same
 * modes and written back with the new literals.
 */
public final class NotebookMigration {

    public static final String PREVIOUS_NS_URI = "urn:foldbook:notebook:0.9";

    /** The {@link SweepMode} literals of files written before the literals became the mode words. */
    public static final Map<String, SweepMode> OLD_SWEEP_MODES = Map.of("BARE_SAMPLING", SweepMode.BARE,
            "FILTERED", SweepMode.MODELLED, "IDEAL_DECIMATOR", SweepMode.IDEAL);

    private NotebookMigration() {
    }

    /** The value an old literal of {@code type} stands for, or null when {@code value} is none. */
    static Object oldLiteral(EDataType type, String value) {
        return type == NotebookPackage.Literals.SWEEP_MODE ? OLD_SWEEP_MODES.get(value) : null;
    }

    static void migratePrevious(XMLResource resource) throws IOException {
        List<String> problems = new ArrayList<>();
        Map<EObject, AnyType> extensions = resource.getEObjectToExtensionMap();
        for (Iterator<Map.Entry<EObject, AnyType>> entries = extensions.entrySet().iterator(); entries.hasNext();) {
            Map.Entry<EObject, AnyType> entry = entries.next();
            EObject object = entry.getKey();
            FeatureMap attributes = entry.getValue().getAnyAttribute();
            for (Iterator<FeatureMap.Entry> it = attributes.iterator(); it.hasNext();) {
                FeatureMap.Entry attribute = it.next();
                String name = attribute.getEStructuralFeature().getName();
                String value = String.valueOf(attribute.getValue());
                try {
                    if (migrate(object, name, value)) {
                        it.remove();
                    }
                } catch (IllegalArgumentException e) {
                    problems.add(Names.label(object) + ": " + e.getMessage());
                }
            }
            AnyType rest = entry.getValue();
            if (rest.getAnyAttribute().isEmpty() && rest.getMixed().isEmpty() && rest.getAny().isEmpty()) {
                entries.remove();
            }
        }
        if (!problems.isEmpty()) {
            throw new IOException("cannot read " + resource.getURI() + " as a version 0.9 notebook: "
                    + String.join("; ", problems));
        }
    }

    /** Applies one 0.9 attribute; false when it is not a 0.9 attribute of that object. */
    private static boolean migrate(EObject object, String name, String value) {
        if (object instanceof Recording recording) {
            switch (name) {
                case "rate" -> recording.setDeclaredRateHz(number(name, value));
                case "channels" -> recording.setChannelCount(integer(name, value));
                case "checksum" -> recording.setSha256(sha256(value));
                default -> {
                    return false;
                }
            }
            return true;
        }
        if (object instanceof Sensor sensor && name.equals("band")) {
            int dots = value.indexOf("..");
            if (dots < 0) {
                throw new IllegalArgumentException("0.9 attribute band='" + value + "' is not of the form <low>..<high>");
            }
            sensor.setUsableMinHz(number(name, value.substring(0, dots)));
            sensor.setUsableMaxHz(number(name, value.substring(dots + 2)));
            return true;
        }
        return false;
    }

    private static double number(String name, String value) {
        try {
            return Double.parseDouble(value.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("0.9 attribute " + name + "='" + value + "' is not a number", e);
        }
    }

    private static int integer(String name, String value) {
        try {
            return Integer.parseInt(value.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("0.9 attribute " + name + "='" + value + "' is not an integer", e);
        }
    }

    private static String sha256(String value) {
        String prefix = "sha256:";
        String hex = value.strip();
        if (!hex.startsWith(prefix) || !hex.substring(prefix.length()).matches("[0-9a-fA-F]{64}")) {
            throw new IllegalArgumentException(
                    "0.9 attribute checksum='" + value + "' is not of the form sha256:<64 hex digits>");
        }
        return hex.substring(prefix.length()).toLowerCase(java.util.Locale.ROOT);
    }
}
