package eluvia.site.files;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Iterator;
import java.util.Map;
import java.util.Objects;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

import eluvia.site.internal.files.AtomicFileWriter;
import eluvia.site.internal.files.HostileInputGuard;
import eluvia.site.internal.files.LoadErrors;
import eluvia.site.internal.files.LockedUriConverter;
import eluvia.site.internal.files.SchemaMigrations;
import eluvia.site.model.Project;
import eluvia.site.model.SitePackage;

/**
 * Reads and writes Eluvia project files ({@code .eluvia}).
 *
 * <p>A project file is EMF XMI of the {@code urn:eluvia:site} model with the schema version as the
 * {@code schemaVersion} attribute of the root {@code site:Project} element. Reading is defensive:
 * the XML parser refuses any document type declaration (so no external or expanding entities can
 * be read), element nesting and file size are bounded, references to anything outside the file are
 * refused, files of older schema versions are migrated step by step and files of newer versions are
 * refused with a message saying so. Every problem is reported as a {@link ProjectFileException}
 * whose message names the file and the line.
 *
 * <p>Writing is atomic: the new content goes to a temporary file in the same folder, is flushed and
 * forced to the device, the previous file (if any) is kept as {@code <name>.eluvia.bak}, and the
 * temporary file is then moved over the target in one atomic rename. At every moment the target
 * is either the complete old file or the complete new one.
 *
 * <p>Works inside and outside OSGi: the model package is reached through
 * {@link SitePackage#eINSTANCE}, and the resource factory is registered on a private resource set.
 */
public final class ProjectFiles {

    /** The file name extension of project files, without the dot. */
    public static final String EXTENSION = "eluvia";

    /** The schema version this code writes, and the newest it reads. */
    public static final int CURRENT_SCHEMA_VERSION = 2;

    /** Appended to the project file's name for the one backup kept by {@link #save}. */
    public static final String BACKUP_SUFFIX = ".bak";

    /** Files larger than this (in bytes) are refused unread. */
    public static final long MAX_FILE_BYTES = 64L * 1024 * 1024;

    /** The URI given to resources read from a stream; never resolved (see LockedUriConverter). */
    static final URI LOAD_URI = URI.createURI("eluvia:/loaded/project." + EXTENSION);

    private ProjectFiles() {
    }

    /**
     * Reads a project file.
     *
     * @param file the file to read
     * @return the project, migrated to {@link #CURRENT_SCHEMA_VERSION}
     * @throws ProjectFileException when the file cannot be read, is not a project file, is of a newer
     *     schema version, or is malformed or hostile; the message names the line
     */
    public static Project load(Path file) throws ProjectFileException {
        Objects.requireNonNull(file, "file");
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        try (InputStream in = Files.newInputStream(file)) {
            return load(in, name);
        } catch (NoSuchFileException e) {
            throw new ProjectFileException(name, 0, "the file does not exist", e);
        } catch (IOException e) {
            throw new ProjectFileException(name, 0, "the file could not be read (" + e.getMessage() + ")", e);
        }
    }

    /**
     * Reads a project from a stream (which is read to its end but not closed).
     *
     * @param in the file's bytes
     * @param nameForMessages the name to show in messages, e.g. the file name
     * @return the project, migrated to {@link #CURRENT_SCHEMA_VERSION}
     * @throws ProjectFileException as {@link #load(Path)}
     */
    public static Project load(InputStream in, String nameForMessages) throws ProjectFileException {
        Objects.requireNonNull(in, "in");
        String name = nameForMessages == null || nameForMessages.isBlank() ? "project file" : nameForMessages;
        byte[] bytes;
        try {
            bytes = readBounded(in, name);
        } catch (IOException e) {
            throw new ProjectFileException(name, 0, "the file could not be read (" + e.getMessage() + ")", e);
        }
        try {
            HostileInputGuard.RootInfo root = HostileInputGuard.check(bytes, name);
            SchemaMigrations.Plan plan = SchemaMigrations.plan(root, name);
            Project project = parse(plan.beforeLoad(bytes, name), name);
            plan.afterLoad(project);
            project.setSchemaVersion(CURRENT_SCHEMA_VERSION);
            return project;
        } catch (RuntimeException | StackOverflowError e) {
            // Defensive: whatever EMF or the parser throws for a damaged file becomes a message.
            throw new ProjectFileException(name, 0, "the file is damaged and could not be read ("
                    + e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")", e);
        }
    }

    private static byte[] readBounded(InputStream in, String name) throws IOException, ProjectFileException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] buffer = new byte[64 * 1024];
        long total = 0;
        int n;
        while ((n = in.read(buffer)) >= 0) {
            total += n;
            if (total > MAX_FILE_BYTES) {
                throw new ProjectFileException(name, 0, "the file is larger than " + (MAX_FILE_BYTES >> 20)
                        + " MiB, far more than any project file; it was not read");
            }
            out.write(buffer, 0, n);
        }
        return out.toByteArray();
    }

    private static Project parse(byte[] bytes, String name) throws ProjectFileException {
        ResourceSet resourceSet = newResourceSet();
        Resource resource = resourceSet.createResource(LOAD_URI);
        try {
            resource.load(new ByteArrayInputStream(bytes), loadOptions());
        } catch (IOException e) {
            throw LoadErrors.toProjectFileException(e, resource, name);
        }
        if (!resource.getErrors().isEmpty()) {
            throw LoadErrors.toProjectFileException(resource.getErrors().get(0), name);
        }
        if (resource.getContents().size() != 1 || !(resource.getContents().get(0) instanceof Project)) {
            throw new ProjectFileException(name, 1, "the file does not hold exactly one project");
        }
        Project project = (Project) resource.getContents().get(0);
        refuseOutsideReferences(project, resource, name);
        return project;
    }

    private static void refuseOutsideReferences(Project project, Resource resource, String name)
            throws ProjectFileException {
        for (Iterator<EObject> it = EcoreUtil.getAllProperContents(project, false); it.hasNext();) {
            EObject object = it.next();
            check(object, resource, name);
        }
        check(project, resource, name);
    }

    private static void check(EObject object, Resource resource, String name) throws ProjectFileException {
        if (object.eIsProxy()) {
            throw new ProjectFileException(name, 0, "the file refers to content in another file ("
                    + EcoreUtil.getURI(object) + "); project files must be self-contained");
        }
        for (EReference reference : object.eClass().getEAllReferences()) {
            if (reference.isContainment() || reference.isContainer() || reference.isDerived()
                    || reference.isTransient() || !object.eIsSet(reference)) {
                continue;
            }
            Object value = object.eGet(reference, false);
            Iterable<?> targets = reference.isMany() ? (Iterable<?>) value : java.util.List.of(value);
            for (Object target : targets) {
                EObject eTarget = (EObject) target;
                if (eTarget.eIsProxy() || eTarget.eResource() != resource) {
                    throw new ProjectFileException(name, 0, "field " + reference.getName() + " of a "
                            + object.eClass().getName() + " refers to content outside the file ("
                            + EcoreUtil.getURI(eTarget) + "); project files must be self-contained");
                }
            }
        }
    }

    /**
     * Writes a project file atomically, keeping the previous content as {@code <name>.bak}.
     *
     * <p>The project itself is not changed and stays in its resource: a copy is written, with
     * {@code schemaVersion} = {@link #CURRENT_SCHEMA_VERSION}.
     *
     * @param project the project to write; every object it refers to must be part of it
     * @param file the target; its folder must exist
     * @throws IOException when the folder cannot be written
     * @throws IllegalArgumentException when the project refers to objects outside itself
     */
    public static void save(Project project, Path file) throws IOException {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(file, "file");
        byte[] bytes = toBytes(project);
        AtomicFileWriter.write(file, bytes, BACKUP_SUFFIX);
    }

    /** The file content {@link #save} writes, as bytes (UTF-8 XMI). */
    static byte[] toBytes(Project project) throws IOException {
        refuseForeignReferences(project);
        Project copy = EcoreUtil.copy(project);
        copy.setSchemaVersion(CURRENT_SCHEMA_VERSION);
        Resource resource = newResourceSet().createResource(LOAD_URI);
        resource.getContents().add(copy);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        resource.save(out, saveOptions());
        return out.toByteArray();
    }

    private static void refuseForeignReferences(Project project) {
        for (Iterator<EObject> it = EcoreUtil.getAllProperContents(project, false); it.hasNext();) {
            EObject object = it.next();
            for (EReference reference : object.eClass().getEAllReferences()) {
                if (reference.isContainment() || reference.isContainer() || reference.isDerived()
                        || reference.isTransient() || !object.eIsSet(reference)) {
                    continue;
                }
                Object value = object.eGet(reference, false);
                Iterable<?> targets = reference.isMany() ? (Iterable<?>) value : java.util.List.of(value);
                for (Object target : targets) {
                    if (!EcoreUtil.isAncestor(project, (EObject) target)) {
                        throw new IllegalArgumentException("field " + reference.getName() + " of a "
                                + object.eClass().getName() + " refers to an object that is not part of project '"
                                + project.getName() + "'; choose one from this project before saving");
                    }
                }
            }
        }
    }

    static ResourceSet newResourceSet() {
        ResourceSet resourceSet = new ResourceSetImpl();
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap()
                .put(Resource.Factory.Registry.DEFAULT_EXTENSION, new XMIResourceFactoryImpl());
        resourceSet.getResourceFactoryRegistry().getProtocolToFactoryMap().put("eluvia", new XMIResourceFactoryImpl());
        resourceSet.getPackageRegistry().put(SitePackage.eNS_URI, SitePackage.eINSTANCE);
        resourceSet.setURIConverter(new LockedUriConverter());
        return resourceSet;
    }

    private static Map<Object, Object> loadOptions() {
        Map<Object, Object> options = new HashMap<>();
        options.put(XMLResource.OPTION_PARSER_FEATURES, HostileInputGuard.parserFeatures());
        options.put(XMLResource.OPTION_DEFER_IDREF_RESOLUTION, Boolean.TRUE);
        options.put(XMLResource.OPTION_RECORD_UNKNOWN_FEATURE, Boolean.FALSE);
        options.put(XMLResource.OPTION_ENCODING, "UTF-8");
        return options;
    }

    private static Map<Object, Object> saveOptions() {
        Map<Object, Object> options = new HashMap<>();
        options.put(XMLResource.OPTION_ENCODING, "UTF-8");
        options.put(XMLResource.OPTION_LINE_WIDTH, 100);
        options.put(XMLResource.OPTION_PROCESS_DANGLING_HREF, XMLResource.OPTION_PROCESS_DANGLING_HREF_THROW);
        return options;
    }
}
