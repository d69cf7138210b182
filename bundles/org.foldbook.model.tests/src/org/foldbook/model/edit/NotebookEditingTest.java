package org.foldbook.model.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.SyntheticNotebooks;
import org.foldbook.model.persistence.NotebookStore;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NotebookEditingTest {

    @TempDir
    Path folder;

    @Test
    @DisplayName("edits go through the command stack: undo and redo restore values, derived figures follow")
    void undoRedo() {
        AdapterFactoryEditingDomain domain = NotebookEditing.newEditingDomain();
        Resource resource = NotebookStore.createResource(domain.getResourceSet(), folder.resolve("e.foldbook"));
        Notebook notebook = SyntheticNotebooks.bench();
        resource.getContents().add(notebook);
        SignalChain chain = SyntheticNotebooks.vibrationChain(notebook);
        Stage sampler = chain.getStages().get(3);

        Command slower = SetCommand.create(domain, sampler, NotebookPackage.Literals.STAGE__RATE_HZ, 8000.0);
        assertTrue(slower.canExecute());
        domain.getCommandStack().execute(slower);
        assertEquals(4000.0, chain.nyquistHz());
        Command add = AddCommand.create(domain, notebook, NotebookPackage.Literals.NOTEBOOK__DEVICES,
                NotebookFactory.eINSTANCE.createCamera());
        domain.getCommandStack().execute(add);
        assertEquals(6, notebook.getDevices().size());

        domain.getCommandStack().undo();
        assertEquals(5, notebook.getDevices().size());
        domain.getCommandStack().undo();
        assertEquals(20000.0, sampler.getRateHz());
        assertEquals(10000.0, chain.nyquistHz(), "computed, so it follows the undone setting");
        assertFalse(domain.getCommandStack().canUndo());
        domain.getCommandStack().redo();
        assertEquals(8000.0, sampler.getRateHz());
        assertTrue(domain.getCommandStack().canRedo());
        assertEquals(domain, AdapterFactoryEditingDomain.getEditingDomainFor(notebook));
    }

    @Test
    @DisplayName("the reflective item providers give labels from the model")
    void labels() {
        AdapterFactoryEditingDomain domain = NotebookEditing.newEditingDomain();
        Notebook notebook = SyntheticNotebooks.bench();
        var provider = (org.eclipse.emf.edit.provider.IItemLabelProvider) domain.getAdapterFactory()
                .adapt(notebook.getDevices().get(0), org.eclipse.emf.edit.provider.IItemLabelProvider.class);
        assertTrue(provider.getText(notebook.getDevices().get(0)).contains("ACC-1"),
                provider.getText(notebook.getDevices().get(0)));
    }
}
