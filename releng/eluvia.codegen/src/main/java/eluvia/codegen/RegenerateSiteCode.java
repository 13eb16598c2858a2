package eluvia.codegen;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.generator.GeneratorAdapterFactory;
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
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/**
 * Regenerates the EMF code of the site model without an IDE.
 *
 * <p>Steps: (1) load {@code bundles/eluvia.site/model/site.genmodel} and its {@code site.ecore};
 * (2) rebuild the generator model from the Ecore model and reconcile it with the stored settings
 * (what the IDE's "Reload" does), writing the reconciled {@code site.genmodel} back; (3) generate
 * into a scratch copy of the two bundles, so that the generator's project files (MANIFEST.MF,
 * plugin.xml, build.properties, .project, .classpath) never overwrite the hand-kept ones; (4) copy
 * back only the generated parts: {@code eluvia.site/src-gen}, and, when the edit bundle exists,
 * {@code eluvia.site.edit/src-gen}, {@code icons/} and {@code plugin.properties}.
 * The existing {@code src-gen} is copied into the scratch area first, so the generator's merge keeps
 * methods marked {@code @generated NOT}; files of classes no longer in the model disappear.
 *
 * <p>Argument: the repository root (the pom passes it).
 */
public final class RegenerateSiteCode {

  private static final String MODEL_BUNDLE = "eluvia.site";
  private static final String EDIT_BUNDLE = "eluvia.site.edit";

  private RegenerateSiteCode() {
  }

  public static void main(String[] args) throws IOException {
    Path root = Path.of(args.length > 0 ? args[0] : ".").toAbsolutePath().normalize();
    Path bundles = root.resolve("bundles");
    Path modelBundle = bundles.resolve(MODEL_BUNDLE);
    Path editBundle = bundles.resolve(EDIT_BUNDLE);
    Path genModelFile = modelBundle.resolve("model/site.genmodel");
    if (!Files.isRegularFile(genModelFile)) {
      throw new IllegalArgumentException("no generator model at " + genModelFile
          + "; pass the repository root as the first argument");
    }
    boolean withEdit = Files.isRegularFile(editBundle.resolve("META-INF/MANIFEST.MF"));

    Path scratch = Files.createTempDirectory("eluvia-codegen");
    try {
      Path scratchModel = scratch.resolve(MODEL_BUNDLE);
      Path scratchEdit = scratch.resolve(EDIT_BUNDLE);
      Files.createDirectories(scratchModel);
      Files.createDirectories(scratchEdit);
      copyTree(modelBundle.resolve("src-gen"), scratchModel.resolve("src-gen"));
      if (withEdit) {
        copyTree(editBundle.resolve("src-gen"), scratchEdit.resolve("src-gen"));
        copyTree(editBundle.resolve("icons"), scratchEdit.resolve("icons"));
        copyFile(editBundle.resolve("plugin.properties"), scratchEdit.resolve("plugin.properties"));
      }

      ResourceSet resourceSet = new ResourceSetImpl();
      resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("ecore", new EcoreResourceFactoryImpl());
      resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("genmodel", new XMIResourceFactoryImpl());
      resourceSet.getPackageRegistry().put(GenModelPackage.eNS_URI, GenModelPackage.eINSTANCE);
      resourceSet.getPackageRegistry().put(EcorePackage.eNS_URI, EcorePackage.eINSTANCE);
      Map<URI, URI> uriMap = resourceSet.getURIConverter().getURIMap();
      uriMap.put(URI.createPlatformResourceURI("/" + MODEL_BUNDLE + "/", false), folderUri(scratchModel));
      uriMap.put(URI.createPlatformResourceURI("/" + EDIT_BUNDLE + "/", false), folderUri(scratchEdit));

      Resource genModelResource = resourceSet.getResource(URI.createFileURI(genModelFile.toString()), true);
      GenModel stored = (GenModel) genModelResource.getContents().get(0);
      List<EPackage> ecorePackages = new ArrayList<>();
      for (GenPackage genPackage : stored.getGenPackages()) {
        ecorePackages.add(genPackage.getEcorePackage());
      }
      GenModel genModel = GenModelFactory.eINSTANCE.createGenModel();
      genModel.initialize(ecorePackages);
      genModel.getForeignModel().addAll(stored.getForeignModel());
      genModelResource.getContents().add(genModel);
      genModel.reconcile(stored);
      genModelResource.getContents().remove(stored);
      genModelResource.save(Map.of());
      System.out.println("reconciled " + genModelFile);

      genModel.reconcile();
      genModel.setCanGenerate(true);
      Diagnostic diagnostic = genModel.diagnose();
      if (diagnostic.getSeverity() == Diagnostic.ERROR) {
        throw new IllegalStateException("the generator model has errors: " + diagnostic);
      }

      GeneratorAdapterFactory.Descriptor.Registry.INSTANCE.addDescriptor(GenModelPackage.eNS_URI,
          GenModelGeneratorAdapterFactory.DESCRIPTOR);
      Generator generator = new Generator();
      generator.setInput(genModel);
      check(generator.generate(genModel, GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE, new BasicMonitor.Printing(System.out)));
      replaceTree(scratchModel.resolve("src-gen"), modelBundle.resolve("src-gen"));
      System.out.println("model code written to " + modelBundle.resolve("src-gen"));
      if (withEdit) {
        check(generator.generate(genModel, GenBaseGeneratorAdapter.EDIT_PROJECT_TYPE, new BasicMonitor.Printing(System.out)));
        replaceTree(scratchEdit.resolve("src-gen"), editBundle.resolve("src-gen"));
        replaceTree(scratchEdit.resolve("icons"), editBundle.resolve("icons"));
        Path properties = scratchEdit.resolve("plugin.properties");
        // The generator's template names a placeholder vendor; state ours.
        String text = Files.readString(properties)
            .replaceAll("(?m)^pluginName = .*$", "pluginName = Eluvia site model editing support")
            .replaceAll("(?m)^providerName = .*$", "providerName = Eluvia");
        Files.writeString(editBundle.resolve("plugin.properties"), text);
        System.out.println("edit code written to " + editBundle.resolve("src-gen"));
      } else {
        System.out.println("no " + EDIT_BUNDLE + " bundle yet: edit code not generated");
      }
    } finally {
      deleteTree(scratch);
    }
  }

  private static void check(Diagnostic diagnostic) {
    if (diagnostic.getSeverity() == Diagnostic.ERROR) {
      throw new IllegalStateException("code generation failed: " + diagnostic);
    }
  }

  private static URI folderUri(Path folder) {
    return URI.createFileURI(folder.toString() + "/");
  }

  private static void copyFile(Path from, Path to) throws IOException {
    if (Files.isRegularFile(from)) {
      Files.createDirectories(to.getParent());
      Files.copy(from, to, StandardCopyOption.REPLACE_EXISTING);
    }
  }

  private static void copyTree(Path from, Path to) throws IOException {
    if (!Files.isDirectory(from)) {
      return;
    }
    try (Stream<Path> files = Files.walk(from)) {
      files.forEach(source -> {
        try {
          Path target = to.resolve(from.relativize(source).toString());
          if (Files.isDirectory(source)) {
            Files.createDirectories(target);
          } else {
            Files.copy(source, target, StandardCopyOption.REPLACE_EXISTING);
          }
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        }
      });
    }
  }

  private static void replaceTree(Path from, Path to) throws IOException {
    if (!Files.isDirectory(from)) {
      throw new IllegalStateException("the generator wrote nothing to " + from);
    }
    deleteTree(to);
    copyTree(from, to);
  }

  private static void deleteTree(Path folder) throws IOException {
    if (!Files.exists(folder)) {
      return;
    }
    Files.walkFileTree(folder, new SimpleFileVisitor<>() {
      @Override
      public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
        Files.delete(file);
        return FileVisitResult.CONTINUE;
      }

      @Override
      public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
        Files.delete(dir);
        return FileVisitResult.CONTINUE;
      }
    });
  }
}
