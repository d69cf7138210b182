package org.foldbook.model.persistence;

import java.io.IOException;
import java.io.InputStream;
import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EFactory;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.xmi.PackageNotFoundException;
import org.eclipse.emf.ecore.xmi.XMLHelper;
import org.eclipse.emf.ecore.xmi.XMLLoad;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.SAXXMIHandler;
import org.eclipse.emf.ecore.xmi.impl.XMIHelperImpl;
import org.eclipse.emf.ecore.xmi.impl.XMILoadImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceImpl;
import org.foldbook.model.NotebookPackage;
import org.xml.sax.helpers.DefaultHandler;

/**
 * XMI resource of a notebook file. Compared with a plain XMI resource it
 * <ul>
 * <li>always parses with {@link SecureXml} settings;</li>
 * <li>resolves only the notebook namespaces (current and previous) and packages already registered
 * in the JVM: an unknown namespace is reported, never demand-loaded from a location the file names;</li>
 * <li>keeps attributes and elements it does not know (a file written by a newer version) and writes
 * them back on save, so nothing is lost;</li>
 * <li>reads files of the previous version ({@link NotebookMigration#PREVIOUS_NS_URI}) and migrates
 * them in memory; they are written back in the current version;</li>
 * <li>reads the sweep-mode literals of older version-1 files ({@link NotebookMigration#OLD_SWEEP_MODES}).</li>
 * </ul>
 */
public class NotebookResource extends XMIResourceImpl {

    private boolean previousVersionRead;

    public NotebookResource(URI uri) {
        super(uri);
        Map<Object, Object> load = getDefaultLoadOptions();
        load.put(XMLResource.OPTION_RECORD_UNKNOWN_FEATURE, Boolean.TRUE);
        SecureXml.enforce(load);
        Map<Object, Object> save = getDefaultSaveOptions();
        save.put(XMLResource.OPTION_ENCODING, "UTF-8");
        save.put(XMLResource.OPTION_LINE_WIDTH, 120);
    }

    /** True when the last load read a file of the previous version and migrated it. */
    public boolean wasPreviousVersion() {
        return previousVersionRead;
    }

    @Override
    public void doLoad(InputStream inputStream, Map<?, ?> options) throws IOException {
        Map<Object, Object> secured = new HashMap<>();
        if (options != null) {
            secured.putAll(options);
        }
        secured.put(XMLResource.OPTION_RECORD_UNKNOWN_FEATURE, Boolean.TRUE);
        SecureXml.enforce(secured);
        previousVersionRead = false;
        try {
            super.doLoad(inputStream, secured);
            if (previousVersionRead) {
                NotebookMigration.migratePrevious(this);
                setModified(true);
            }
        } catch (IOException | RuntimeException e) {
            // the same clear message (file, line, problem) whoever opens the file, the workbench included
            if (getURI() != null && getURI().isFile() && !(e instanceof NotebookLoadException)) {
                throw NotebookStore.LoadProblems.describe(java.nio.file.Path.of(getURI().toFileString()), this, e);
            }
            throw e;
        }
    }

    /** Values are read as usual, except literals an older file may hold ({@link NotebookMigration#oldLiteral}). */
    @Override
    protected XMLHelper createXMLHelper() {
        return new XMIHelperImpl(this) {
            @Override
            protected Object createFromString(EFactory factory, EDataType type, String value) {
                Object old = NotebookMigration.oldLiteral(type, value);
                return old != null ? old : super.createFromString(factory, type, value);
            }
        };
    }

    @Override
    protected XMLLoad createXMLLoad() {
        return new XMILoadImpl(createXMLHelper()) {
            @Override
            protected DefaultHandler makeDefaultHandler() {
                return new NotebookHandler(resource, helper, options);
            }
        };
    }

    private final class NotebookHandler extends SAXXMIHandler {

        NotebookHandler(XMLResource resource, XMLHelper helper, Map<?, ?> options) {
            super(resource, helper, options);
        }

        @Override
        protected EPackage getPackageForURI(String uriString) {
            if (NotebookPackage.eNS_URI.equals(uriString)) {
                return NotebookPackage.eINSTANCE;
            }
            if (NotebookMigration.PREVIOUS_NS_URI.equals(uriString)) {
                previousVersionRead = true;
                return NotebookPackage.eINSTANCE;
            }
            EPackage registered = EPackage.Registry.INSTANCE.getEPackage(uriString);
            if (registered != null) {
                return registered;
            }
            error(new PackageNotFoundException(uriString, getLocation(), getLineNumber(), getColumnNumber()));
            return null;
        }
    }
}
