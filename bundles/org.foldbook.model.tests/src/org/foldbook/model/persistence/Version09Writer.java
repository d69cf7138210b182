package org.foldbook.model.persistence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceImpl;

/**
 * Writes a genuine version 0.9 notebook: the frozen model/history/notebook-0.9.ecore is loaded as a
 * dynamic EPackage and a small, CLEARLY SYNTHETIC notebook is built and saved with plain EMF XMI, as
 * 0.9 would have. The committed fixture resources/notebooks/bench-0.9.foldbook was written by
 * {@link #main(String[])}.
 */
public final class Version09Writer {

    static final String FROZEN_ECORE = "model/history/notebook-0.9.ecore";

    private final EPackage v09;

    Version09Writer() throws IOException {
        ResourceSet resourceSet = new ResourceSetImpl();
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("*", new XMIResourceFactoryImpl());
        Resource ecore = resourceSet.createResource(URI.createURI("frozen-0.9.ecore"));
        try (InputStream in = Version09Writer.class.getClassLoader().getResourceAsStream(FROZEN_ECORE)) {
            if (in == null) {
                throw new IOException(FROZEN_ECORE + " is not on the class path of the model bundle");
            }
            ecore.load(in, null);
        }
        v09 = (EPackage) ecore.getContents().get(0);
    }

    EPackage frozenPackage() {
        return v09;
    }

    private EObject create(String className, Object... nameValuePairs) {
        EClass eClass = (EClass) v09.getEClassifier(className);
        EObject object = v09.getEFactoryInstance().create(eClass);
        for (int i = 0; i < nameValuePairs.length; i += 2) {
            object.eSet(eClass.getEStructuralFeature((String) nameValuePairs[i]), nameValuePairs[i + 1]);
        }
        return object;
    }

    @SuppressWarnings("unchecked")
    private static void add(EObject owner, String reference, EObject value) {
        ((List<EObject>) owner.eGet(owner.eClass().getEStructuralFeature(reference))).add(value);
    }

    /** The 0.9 notebook: a sensor with a "band", a recording with "rate", "channels" and "checksum". */
    EObject notebook(String checksum) {
        EObject notebook = create("Notebook", "title", "Synthetic 0.9 notebook", "owningGroup", "Test group (synthetic)");
        EObject sensor = create("Sensor", "id", "ACC-9", "modelName", "synthetic accelerometer", "quantity",
                "acceleration", "unit", "m/s^2", "band", "0.5..8000", "resonanceHz", 9000.0);
        EObject digitizer = create("Digitizer", "id", "ADC-9", "resolutionBits", 16, "maxRateHz", 48000.0);
        add(notebook, "devices", sensor);
        add(notebook, "devices", digitizer);
        EObject rig = create("Rig", "id", "RIG-9", "name", "old bench");
        EObject chain = create("SignalChain", "id", "CH-9", "name", "old chain");
        add(chain, "stages", create("Stage", "device", sensor));
        add(chain, "stages", create("Stage", "device", digitizer, "rateHz", 20000.0));
        add(rig, "chains", chain);
        add(notebook, "rigs", rig);
        EObject experiment = create("Experiment", "name", "old run", "rig", rig);
        EObject recording = create("Recording", "id", "REC-9", "path", "data/old.wav", "rate", 20000.0, "channels", 2,
                "checksum", checksum);
        add(experiment, "recordings", recording);
        add(experiment, "channels", create("Channel", "name", "old channel", "chain", chain, "recording", recording,
                "channelIndex", 1, "unit", "m/s^2"));
        add(notebook, "experiments", experiment);
        return notebook;
    }

    static final String EMPTY_SHA256 = "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855";

    Path write(Path file, String checksum) throws IOException {
        Resource resource = new XMIResourceImpl(URI.createFileURI(file.toAbsolutePath().toString()));
        resource.getContents().add(notebook(checksum));
        resource.save(Map.of(XMLResource.OPTION_ENCODING, "UTF-8"));
        return file;
    }

    public static void main(String[] args) throws IOException {
        new Version09Writer().write(Path.of(args[0]), "sha256:" + EMPTY_SHA256.toUpperCase(java.util.Locale.ROOT));
    }
}
