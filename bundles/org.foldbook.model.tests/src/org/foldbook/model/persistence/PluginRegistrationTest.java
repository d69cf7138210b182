package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.foldbook.model.NotebookPackage;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.osgi.framework.BundleReference;

/**
 * The plugin.xml registrations, as the workbench sees them. Only meaningful inside OSGi (the
 * Tycho test run), where EMF reads the extension registry; on a plain class path it is skipped.
 */
class PluginRegistrationTest {

    @Test
    @DisplayName("in OSGi, a plain resource set opens *.foldbook with the notebook factory, and the package is registered")
    void extensionParserAndPackage() {
        Assumptions.assumeTrue(NotebookPackage.class.getClassLoader() instanceof BundleReference,
                "not running inside OSGi");
        Resource resource = new ResourceSetImpl().createResource(URI.createFileURI("/tmp/any.foldbook"));
        assertInstanceOf(NotebookResource.class, resource);
        assertEquals(NotebookPackage.eINSTANCE, EPackage.Registry.INSTANCE.getEPackage(NotebookPackage.eNS_URI));
    }
}
