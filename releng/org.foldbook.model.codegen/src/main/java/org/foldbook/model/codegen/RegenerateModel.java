package org.foldbook.model.codegen;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.genmodel.GenModel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelFactory;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelPackage;
import org.eclipse.emf.codegen.ecore.genmodel.GenPackage;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenBaseGeneratorAdapter;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenModelGeneratorAdapterFactory;
import org.eclipse.emf.common.util.BasicMonitor;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.plugin.EcorePlugin;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;

/**
 * Runs EMF's code generator outside the IDE: reloads the genmodel from its .ecore the way the IDE's
 * "Reload" does, saves the reloaded genmodel, and generates the model code into the bundle's
 * {@code modelDirectory} (src-gen). Hand-written {@code @generated NOT} members survive, since the
 * generator merges into the existing files.
 *
 * <p>Arguments: the bundle folder (holding model/), then the genmodel path relative to it.
 */
public final class RegenerateModel {

    private RegenerateModel() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 2) {
            throw new IllegalArgumentException(
                    "usage: RegenerateModel <bundle folder> <genmodel path inside it>; got " + args.length + " arguments");
        }
        Path bundle = Path.of(args[0]).toAbsolutePath().normalize();
        Path genmodelFile = bundle.resolve(args[1]).normalize();
        if (!Files.isRegularFile(genmodelFile)) {
            throw new IllegalArgumentException("genmodel: no such file " + genmodelFile);
        }
        String bundleName = bundle.getFileName().toString();

        // Standalone: nothing registers the file extensions or platform:/ URIs for us.
        Resource.Factory.Registry.INSTANCE.getExtensionToFactoryMap().put("ecore", new EcoreResourceFactoryImpl());
        Resource.Factory.Registry.INSTANCE.getExtensionToFactoryMap().put("genmodel", new EcoreResourceFactoryImpl());
        GenModelPackage.eINSTANCE.eClass();
        EcorePackage.eINSTANCE.eClass();

        ResourceSet resourceSet = new ResourceSetImpl();
        // platform:/plugin/... of the jars on the class path (Ecore.genmodel for the used Ecore types)
        resourceSet.getURIConverter().getURIMap().putAll(EcorePlugin.computePlatformURIMap(true));
        // modelDirectory="/<bundle>/src-gen" is a platform:/resource path: point it at the folder
        EcorePlugin.getPlatformResourceMap().put(bundleName, URI.createFileURI(bundle.toString() + "/"));

        URI genmodelUri = URI.createPlatformResourceURI("/" + bundleName + "/" + args[1], true);
        Resource genmodelResource = resourceSet.getResource(genmodelUri, true);
        GenModel old = (GenModel) genmodelResource.getContents().get(0);

        GenModel fresh = reload(old);
        genmodelResource.getContents().set(0, fresh);
        genmodelResource.save(Collections.emptyMap());

        fresh.setCanGenerate(true);
        Diagnostic check = fresh.diagnose();
        if (check.getSeverity() == Diagnostic.ERROR) {
            throw new IllegalStateException("genmodel " + genmodelFile + " is not valid: " + describe(check));
        }

        Generator generator = new Generator();
        // Without this descriptor the generator finds no adapter for GenModel and silently writes nothing.
        generator.getAdapterFactoryDescriptorRegistry().addDescriptor(GenModelPackage.eNS_URI,
                GenModelGeneratorAdapterFactory.DESCRIPTOR);
        generator.setInput(fresh);
        Diagnostic result = generator.generate(fresh, GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE,
                new BasicMonitor.Printing(System.out));
        if (result.getSeverity() == Diagnostic.ERROR) {
            throw new IllegalStateException("generation from " + genmodelFile + " failed: " + describe(result));
        }
        requireDelegatedConstraints(bundle, fresh);
        System.out.println("Generated model code for " + bundleName + " into " + fresh.getModelDirectory()
                + " (" + describe(result) + ")");
    }

    /**
     * What the IDE's reload does: a new GenModel built from the current EPackages, then the settings of
     * the old one carried over. A bare {@code reconcile()} on the old genmodel misses new attributes.
     */
    private static GenModel reload(GenModel old) {
        List<EPackage> ePackages = new ArrayList<>();
        for (GenPackage genPackage : old.getGenPackages()) {
            EPackage ePackage = genPackage.getEcorePackage();
            if (ePackage == null || ePackage.eIsProxy()) {
                throw new IllegalStateException("genmodel: cannot resolve the EPackage of " + genPackage.getPrefix());
            }
            ePackages.add(ePackage);
        }
        GenModel fresh = GenModelFactory.eINSTANCE.createGenModel();
        fresh.initialize(ePackages);
        fresh.getForeignModel().addAll(old.getForeignModel());
        fresh.setImporterID(old.getImporterID());
        fresh.reconcile(old);
        fresh.getUsedGenPackages().addAll(fresh.computeMissingUsedGenPackages());
        return fresh;
    }

    /**
     * A constraint the generator has just added comes with a TODO body that always passes. Fail until
     * it delegates to hand code (see MODEL.md), so that a new rule cannot silently do nothing.
     */
    private static void requireDelegatedConstraints(Path bundle, GenModel genModel) throws IOException {
        String marker = "// TODO implement the constraint";
        for (GenPackage genPackage : genModel.getGenPackages()) {
            if (!genPackage.hasConstraints()) {
                continue;
            }
            String validator = genPackage.getUtilitiesPackageName().replace('.', '/') + "/"
                    + genPackage.getValidatorClassName() + ".java";
            String relative = genModel.getModelDirectory().replaceFirst("^/[^/]+/", "") + "/" + validator;
            Path file = bundle.resolve(relative);
            List<String> lines = Files.readAllLines(file);
            List<String> undelegated = new ArrayList<>();
            for (int i = 0; i < lines.size(); i++) {
                if (lines.get(i).contains(marker)) {
                    for (int j = i; j >= 0; j--) {
                        if (lines.get(j).contains("public boolean validate")) {
                            undelegated.add(lines.get(j).strip().replaceFirst("\\(.*", ""));
                            break;
                        }
                    }
                }
            }
            if (!undelegated.isEmpty()) {
                throw new IllegalStateException(file + ": constraints without a delegation to src/.../validation"
                        + " (replace the TODO body by one line and mark it @generated NOT): " + undelegated);
            }
        }
    }

    private static String describe(Diagnostic diagnostic) {
        StringBuilder text = new StringBuilder(diagnostic.getMessage() == null ? "" : diagnostic.getMessage());
        for (Diagnostic child : diagnostic.getChildren()) {
            text.append("; ").append(describe(child));
        }
        return text.toString();
    }
}
