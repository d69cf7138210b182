package org.foldbook.model.persistence;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/**
 * Creates {@link NotebookResource}s. Registered for the {@code .foldbook} extension and the
 * {@code org.foldbook.model.notebook} content type in plugin.xml; {@link NotebookStore} registers
 * it by hand in the resource sets it makes, so it works outside OSGi too.
 */
public class NotebookResourceFactory extends XMIResourceFactoryImpl {

    @Override
    public Resource createResource(URI uri) {
        return new NotebookResource(uri);
    }
}
