package eluvia.site.internal.files;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.impl.ExtensibleURIConverterImpl;

/**
 * A URI converter that opens nothing: project files are read from a stream and written to a
 * stream, so any attempt to open a URI comes from content of the file (an href to another file,
 * a schema location) and is refused. This keeps a hostile file from making EMF read other files or
 * reach the network.
 */
public final class LockedUriConverter extends ExtensibleURIConverterImpl {

    @Override
    public InputStream createInputStream(URI uri, Map<?, ?> options) throws IOException {
        throw new IOException("project files may not refer to other files or addresses (" + uri + ")");
    }

    @Override
    public OutputStream createOutputStream(URI uri, Map<?, ?> options) throws IOException {
        throw new IOException("project files are written through ProjectFiles.save only (" + uri + ")");
    }

    @Override
    public boolean exists(URI uri, Map<?, ?> options) {
        return false;
    }

    @Override
    public Map<String, ?> getAttributes(URI uri, Map<?, ?> options) {
        return Map.of();
    }
}
