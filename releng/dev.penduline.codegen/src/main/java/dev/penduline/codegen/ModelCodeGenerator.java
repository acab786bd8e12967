package dev.penduline.codegen;

import java.io.File;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.generator.GeneratorAdapterFactory;
import org.eclipse.emf.codegen.ecore.genmodel.GenModel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelPackage;
import org.eclipse.emf.codegen.ecore.genmodel.GenPackage;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenBaseGeneratorAdapter;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenModelGeneratorAdapterFactory;
import org.eclipse.emf.common.util.BasicMonitor;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;

/**
 * Generates the EMF model code of one genmodel outside Eclipse.
 *
 * <p>Usage: {@code ModelCodeGenerator --genmodel FILE --project-root DIR [--write-genmodel]}.
 * The genmodel's {@code modelDirectory} (e.g. {@code /dev.penduline.model/src-gen}) is a workspace
 * path; its first segment, the project name, is mapped onto {@code --project-root}, so the model
 * code lands in {@code DIR/src-gen}. The generator also writes project files (MANIFEST.MF,
 * plugin.xml, build.properties) when they are missing: point {@code --project-root} at an empty
 * scratch folder and copy only {@code src-gen} back, as {@code regenerate-model.sh} does.
 *
 * <p>Only the model code is generated (no .edit or .editor projects). The in-memory genmodel is
 * first completed from the .ecore ({@code GenModel.initialize}), so a class or feature added to
 * the .ecore needs no manual genmodel edit; {@code --write-genmodel} saves that completed genmodel
 * back so that the checked-in file lists every element.
 *
 * <p>Exit codes: 0 done, 1 generation or validation failed, 2 bad command line.
 */
public final class ModelCodeGenerator {

    /** A loadable class that is not a FacadeHelper: it switches JMerge off without loading JDT. */
    private static final String NO_MERGER = Object.class.getName();

    private ModelCodeGenerator() {
    }

    /**
     * Runs the generator.
     *
     * @param args the command line (see the class comment)
     */
    public static void main(String[] args) {
        final Map<String, String> options = parse(args);
        if (options == null) {
            System.err.println("usage: ModelCodeGenerator --genmodel FILE --project-root DIR [--write-genmodel]");
            System.exit(2);
            return;
        }
        try {
            final boolean ok = generate(new File(options.get("--genmodel")), new File(options.get("--project-root")),
                    options.containsKey("--write-genmodel"));
            System.exit(ok ? 0 : 1);
        } catch (IOException | RuntimeException e) {
            System.err.println("penduline-codegen: " + e);
            e.printStackTrace(System.err);
            System.exit(1);
        }
    }

    private static Map<String, String> parse(String[] args) {
        final Map<String, String> options = new HashMap<>();
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--genmodel", "--project-root" -> {
                    if (i + 1 >= args.length) {
                        return null;
                    }
                    options.put(args[i], args[++i]);
                }
                case "--write-genmodel" -> options.put(args[i], "true");
                default -> {
                    return null;
                }
            }
        }
        return options.containsKey("--genmodel") && options.containsKey("--project-root") ? options : null;
    }

    private static boolean generate(File genModelFile, File projectRoot, boolean writeGenModel) throws IOException {
        // Without this descriptor the Generator finds no adapter for a GenModel and silently writes nothing.
        GeneratorAdapterFactory.Descriptor.Registry.INSTANCE.addDescriptor(GenModelPackage.eNS_URI,
                GenModelGeneratorAdapterFactory.DESCRIPTOR);

        final ResourceSet resourceSet = new ResourceSetImpl();
        resourceSet.getPackageRegistry().put(EcorePackage.eNS_URI, EcorePackage.eINSTANCE);
        resourceSet.getPackageRegistry().put(GenModelPackage.eNS_URI, GenModelPackage.eINSTANCE);
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("ecore", new EcoreResourceFactoryImpl());
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("genmodel", new EcoreResourceFactoryImpl());

        final Resource resource = resourceSet.getResource(URI.createFileURI(genModelFile.getAbsolutePath()), true);
        final GenModel genModel = (GenModel) resource.getContents().get(0);

        final String modelDirectory = genModel.getModelDirectory();
        final String projectName = URI.createURI(modelDirectory).segment(0);
        resourceSet.getURIConverter().getURIMap().put(URI.createPlatformResourceURI("/" + projectName + "/", false),
                URI.createFileURI(projectRoot.getAbsolutePath() + File.separator));

        final List<EPackage> ePackages = new ArrayList<>();
        for (GenPackage genPackage : genModel.getGenPackages()) {
            ePackages.add(genPackage.getEcorePackage());
        }
        genModel.initialize(ePackages);
        genModel.reconcile();
        genModel.setCanGenerate(true);

        final Diagnostic check = genModel.diagnose();
        if (check.getSeverity() == Diagnostic.ERROR) {
            report(check);
            return false;
        }
        if (writeGenModel) {
            final Map<Object, Object> saveOptions = new HashMap<>();
            saveOptions.put(XMLResource.OPTION_LINE_DELIMITER, "\n");
            saveOptions.put(XMLResource.OPTION_ENCODING, "UTF-8");
            resource.save(saveOptions);
        }

        // The merger's facade needs JDT; we always generate into an empty folder, so there is
        // nothing to merge. A class that is not a facade helper leaves the merger off (EMF logs
        // one "Unable to instantiate a facade helper" line) instead of failing on missing JDT.
        // Set in memory only, after the genmodel was written back.
        genModel.setFacadeHelperClass(NO_MERGER);

        final Generator generator = new Generator();
        generator.getOptions().resourceSet = resourceSet;
        generator.setInput(genModel);
        final Diagnostic result = generator.generate(genModel, GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE,
                new BasicMonitor());
        if (result.getSeverity() >= Diagnostic.WARNING) {
            report(result);
        }
        return result.getSeverity() < Diagnostic.ERROR;
    }

    private static void report(Diagnostic diagnostic) {
        System.err.println("penduline-codegen: " + diagnostic.getMessage());
        for (Diagnostic child : diagnostic.getChildren()) {
            report(child);
        }
    }
}
