package org.foldbook.model.edit;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;
import org.eclipse.emf.edit.provider.resource.ResourceItemProviderAdapterFactory;
import org.foldbook.model.persistence.NotebookStore;

/**
 * The editing domain the UI changes notebooks through: every change is an EMF command on a
 * {@link BasicCommandStack}, so it can be undone and redone. Item providers are EMF's reflective
 * ones (labels and property descriptors from the model itself); no .edit code is generated.
 */
public final class NotebookEditing {

    private NotebookEditing() {
    }

    /**
     * A domain with its own resource set, set up for notebooks ({@link NotebookStore#configure}); the
     * set knows its domain, so {@code AdapterFactoryEditingDomain.getEditingDomainFor(object)} works.
     * Dispose the domain's adapter factory when the editor closes.
     */
    public static AdapterFactoryEditingDomain newEditingDomain() {
        ComposedAdapterFactory adapters = new ComposedAdapterFactory(ComposedAdapterFactory.Descriptor.Registry.INSTANCE);
        adapters.addAdapterFactory(new ResourceItemProviderAdapterFactory());
        adapters.addAdapterFactory(new ReflectiveItemProviderAdapterFactory());
        AdapterFactoryEditingDomain domain = new AdapterFactoryEditingDomain(adapters, new BasicCommandStack());
        NotebookStore.configure(domain.getResourceSet());
        return domain;
    }
}
