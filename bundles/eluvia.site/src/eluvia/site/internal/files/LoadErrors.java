package eluvia.site.internal.files;

import java.io.IOException;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.xmi.ClassNotFoundException;
import org.eclipse.emf.ecore.xmi.FeatureNotFoundException;
import org.eclipse.emf.ecore.xmi.IllegalValueException;
import org.eclipse.emf.ecore.xmi.PackageNotFoundException;
import org.eclipse.emf.ecore.xmi.UnresolvedReferenceException;
import org.eclipse.emf.ecore.xmi.XMIException;
import org.xml.sax.SAXParseException;

import eluvia.site.files.ProjectFileException;

/** Turns what EMF reports while loading into messages an engineer can act on, with the line. */
public final class LoadErrors {

    private LoadErrors() {
    }

    /** For an exception thrown by {@code Resource.load}. */
    public static ProjectFileException toProjectFileException(IOException e, Resource resource, String name) {
        if (!resource.getErrors().isEmpty()) {
            return toProjectFileException(resource.getErrors().get(0), name);
        }
        Throwable cause = e instanceof Resource.IOWrappedException && e.getCause() != null ? e.getCause() : e;
        if (cause instanceof Resource.Diagnostic diagnostic) {
            return toProjectFileException(diagnostic, name);
        }
        if (cause instanceof SAXParseException parse) {
            return new ProjectFileException(name, parse.getLineNumber(), "the file is not well-formed XML: "
                    + parse.getMessage(), e);
        }
        return new ProjectFileException(name, 0, "the file could not be read (" + cause.getMessage() + ")", e);
    }

    /** For an error EMF recorded on the resource. */
    public static ProjectFileException toProjectFileException(Resource.Diagnostic diagnostic, String name) {
        int line = diagnostic.getLine();
        Throwable cause = diagnostic instanceof Throwable t ? t : null;
        String reason;
        if (diagnostic instanceof FeatureNotFoundException e) {
            reason = "unknown field '" + e.getName() + "'; the file is damaged or was written by another program";
        } else if (diagnostic instanceof IllegalValueException e && e.getValue() instanceof EObject element) {
            reason = "field " + e.getFeature().getName() + " holds an element of type " + element.eClass().getName()
                    + " where a " + e.getFeature().getEType().getName() + " belongs; the file is damaged";
        } else if (diagnostic instanceof IllegalValueException e) {
            reason = "field " + e.getFeature().getName() + " = '" + e.getValue() + "' is not a valid "
                    + describeType(e.getFeature().getEType().getInstanceClass()) + "; correct the value";
        } else if (diagnostic instanceof ClassNotFoundException e) {
            reason = "unknown element type '" + e.getName() + "'; the file is damaged or was written by another program";
        } else if (diagnostic instanceof PackageNotFoundException e) {
            reason = "unknown namespace '" + e.uri() + "'; project files use only urn:eluvia:site";
        } else if (diagnostic instanceof UnresolvedReferenceException e) {
            reason = "field " + (e.getFeature() == null ? "?" : e.getFeature().getName()) + " refers to '"
                    + e.getReference() + "', which is not in the file";
        } else {
            reason = "the file could not be read (" + stripLocation(diagnostic) + ")";
        }
        return new ProjectFileException(name, line, reason, cause);
    }

    private static String describeType(Class<?> type) {
        if (type == double.class || type == Double.class) {
            return "number";
        }
        if (type == int.class || type == Integer.class) {
            return "whole number";
        }
        if (type == boolean.class || type == Boolean.class) {
            return "true/false value";
        }
        if (type == java.util.Date.class) {
            return "date and time (written like 2026-12-01T12:00:00.000+0000)";
        }
        if (type != null && type.isEnum()) {
            return "choice (one of " + java.util.Arrays.toString(type.getEnumConstants()) + ")";
        }
        return "value";
    }

    private static String stripLocation(Resource.Diagnostic diagnostic) {
        String message = String.valueOf(diagnostic.getMessage());
        if (diagnostic instanceof XMIException) {
            int at = message.lastIndexOf(" (" + diagnostic.getLocation());
            if (at > 0) {
                return message.substring(0, at);
            }
        }
        return message;
    }
}
