package org.foldbook.model.edit;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.ecore.resource.ResourceSet;
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

    /** A domain over a new notebook resource set ({@link NotebookStore#newResourceSet()}). */
    public static AdapterFactoryEditingDomain newEditingDomain() {
        return newEditingDomain(NotebookStore.newResourceSet());
    }

    /** A domain over {@code resourceSet}; dispose its adapter factory when the editor closes. */
    public static AdapterFactoryEditingDomain newEditingDomain(ResourceSet resourceSet) {
        ComposedAdapterFactory adapters = new ComposedAdapterFactory(ComposedAdapterFactory.Descriptor.Registry.INSTANCE);
        adapters.addAdapterFactory(new ResourceItemProviderAdapterFactory());
        adapters.addAdapterFactory(new ReflectiveItemProviderAdapterFactory());
        return new AdapterFactoryEditingDomain(adapters, new BasicCommandStack(), resourceSet);
    }
}
