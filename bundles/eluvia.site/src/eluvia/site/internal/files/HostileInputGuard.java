package eluvia.site.internal.files;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.Map;

import javax.xml.XMLConstants;
import javax.xml.parsers.ParserConfigurationException;
import javax.xml.parsers.SAXParser;
import javax.xml.parsers.SAXParserFactory;

import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.Locator;
import org.xml.sax.SAXException;
import org.xml.sax.SAXParseException;
import org.xml.sax.helpers.DefaultHandler;

import eluvia.site.files.ProjectFileException;
import eluvia.site.model.SitePackage;

/**
 * First pass over a project file's bytes, before EMF sees them: a secure, non-validating SAX parse
 * that refuses any document type declaration (hence every internal, external or parameter
 * entity), bounds the element nesting, checks well-formedness with line numbers, and reads the
 * root element and its schemaVersion attribute.
 */
public final class HostileInputGuard {

    /** Deeper nesting than this never occurs in a project file; refusing it bounds the parsers' stacks. */
    public static final int MAX_ELEMENT_DEPTH = 64;

    private static final String DISALLOW_DOCTYPE = "http://apache.org/xml/features/disallow-doctype-decl";
    private static final String EXTERNAL_GENERAL = "http://xml.org/sax/features/external-general-entities";
    private static final String EXTERNAL_PARAMETER = "http://xml.org/sax/features/external-parameter-entities";
    private static final String LOAD_EXTERNAL_DTD = "http://apache.org/xml/features/nonvalidating/load-external-dtd";

    private HostileInputGuard() {
    }

    /** The root element of a project file as read by the first pass. */
    public record RootInfo(String namespace, String localName, String schemaVersionText, int line) {
    }

    /** The parser features that make a JAXP SAX parser refuse entities; also given to EMF's parser. */
    public static Map<String, Boolean> parserFeatures() {
        return Map.of(XMLConstants.FEATURE_SECURE_PROCESSING, Boolean.TRUE,
                DISALLOW_DOCTYPE, Boolean.TRUE,
                EXTERNAL_GENERAL, Boolean.FALSE,
                EXTERNAL_PARAMETER, Boolean.FALSE,
                LOAD_EXTERNAL_DTD, Boolean.FALSE);
    }

    /**
     * Parses the bytes securely and returns the root element.
     *
     * @throws ProjectFileException for a DOCTYPE, malformed XML, too deep nesting or a root that is
     *     not a project
     */
    public static RootInfo check(byte[] bytes, String name) throws ProjectFileException {
        if (bytes.length == 0) {
            throw new ProjectFileException(name, 0, "the file is empty");
        }
        SAXParser parser = newSecureParser();
        RootHandler handler = new RootHandler(name);
        try {
            parser.parse(new InputSource(new ByteArrayInputStream(bytes)), handler);
        } catch (SAXParseException e) {
            throw new ProjectFileException(name, e.getLineNumber(), describe(e), e);
        } catch (StopParsing e) {
            throw e.problem;
        } catch (SAXException | IOException e) {
            throw new ProjectFileException(name, 0, "the file is not well-formed XML (" + e.getMessage() + ")", e);
        }
        if (handler.root == null) {
            throw new ProjectFileException(name, 0, "the file has no root element");
        }
        return handler.root;
    }

    private static String describe(SAXParseException e) {
        String message = String.valueOf(e.getMessage());
        if (message.contains("DOCTYPE") || message.contains("disallow-doctype-decl")) {
            return "the file contains a document type declaration (<!DOCTYPE ...>); project files never have one, "
                    + "and it could make the reader fetch other files or expand entities, so the file was not read";
        }
        String lower = message.toLowerCase(java.util.Locale.ROOT);
        if (lower.contains("entity") && !lower.contains("same entity")) {
            return "the file uses an XML entity that is not allowed in project files; the file was not read ("
                    + message + ")";
        }
        return "the file is not well-formed XML: " + message;
    }

    private static SAXParser newSecureParser() {
        try {
            // The JDK's own parser, whatever else is on the class path: its secure features are known.
            SAXParserFactory factory = SAXParserFactory.newDefaultInstance();
            factory.setNamespaceAware(true);
            factory.setValidating(false);
            factory.setXIncludeAware(false);
            for (Map.Entry<String, Boolean> feature : parserFeatures().entrySet()) {
                factory.setFeature(feature.getKey(), feature.getValue());
            }
            return factory.newSAXParser();
        } catch (ParserConfigurationException | SAXException e) {
            throw new IllegalStateException("the XML parser of this Java runtime cannot be made secure", e);
        }
    }

    /** Carries a ProjectFileException out of the SAX callbacks. */
    private static final class StopParsing extends SAXException {
        private static final long serialVersionUID = 1L;
        private final transient ProjectFileException problem;

        StopParsing(ProjectFileException problem) {
            super(problem.getMessage());
            this.problem = problem;
        }
    }

    private static final class RootHandler extends DefaultHandler {
        private final String name;
        private Locator locator;
        private int depth;
        private RootInfo root;

        RootHandler(String name) {
            this.name = name;
        }

        @Override
        public void setDocumentLocator(Locator locator) {
            this.locator = locator;
        }

        private int line() {
            return locator == null ? 0 : locator.getLineNumber();
        }

        @Override
        public void startElement(String uri, String localName, String qName, Attributes attributes) throws SAXException {
            depth++;
            if (depth > MAX_ELEMENT_DEPTH) {
                throw new StopParsing(new ProjectFileException(name, line(), "elements are nested more than "
                        + MAX_ELEMENT_DEPTH + " deep, which no project file is; the file was not read"));
            }
            if (root == null) {
                if (!SitePackage.eNS_URI.equals(uri) || !"Project".equals(localName)) {
                    throw new StopParsing(new ProjectFileException(name, line(), "this is not an Eluvia project file: "
                            + "its root element is '" + qName + "'" + (uri.isEmpty() ? "" : " in namespace " + uri)
                            + ", expected 'Project' in namespace " + SitePackage.eNS_URI));
                }
                root = new RootInfo(uri, localName, attributes.getValue("", "schemaVersion"), line());
            }
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            depth--;
        }

        @Override
        public InputSource resolveEntity(String publicId, String systemId) throws SAXException {
            // Never reached with DOCTYPE refused; kept so that no configuration can fetch anything.
            throw new StopParsing(new ProjectFileException(name, line(),
                    "the file refers to an external entity (" + systemId + "); the file was not read"));
        }
    }
}
