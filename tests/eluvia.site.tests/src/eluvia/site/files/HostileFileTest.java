package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile files: entities (external, expanding, parameter), document type declarations, references
 * to other files or addresses, and oversized input must be refused without reading anything else.
 * A listening socket on the loopback address counts any attempt to fetch something.
 */
final class HostileFileTest {

    private static final String SECRET = "SECRET-c0ffee-never-read";

    @TempDir
    Path folder;

    private Path secretFile;
    private ServerSocket listener;
    private final AtomicInteger connections = new AtomicInteger();
    private Thread acceptor;

    @BeforeEach
    void setUp() throws IOException {
        secretFile = folder.resolve("secret.txt");
        Files.writeString(secretFile, SECRET);
        listener = new ServerSocket(0, 10, InetAddress.getLoopbackAddress());
        listener.setSoTimeout(200);
        acceptor = new Thread(() -> {
            while (!listener.isClosed()) {
                try (Socket socket = listener.accept()) {
                    connections.incrementAndGet();
                } catch (SocketTimeoutException e) {
                    // poll again until closed
                } catch (IOException e) {
                    return;
                }
            }
        }, "hostile-file-test-listener");
        acceptor.setDaemon(true);
        acceptor.start();
    }

    @AfterEach
    void tearDown() throws Exception {
        listener.close();
        acceptor.join(2000);
    }

    private String loopbackUrl(String path) {
        return "http://127.0.0.1:" + listener.getLocalPort() + "/" + path;
    }

    @Test
    void anExternalFileEntityIsNotRead() {
        String xml = "<?xml version=\"1.0\"?>\n"
                + "<!DOCTYPE p [ <!ENTITY leak SYSTEM \"" + secretFile.toUri() + "\"> ]>\n"
                + "<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\" name=\"&leak;\"/>";

        ProjectFileException e = assertThrows(ProjectFileException.class, () -> load(xml));

        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("document type declaration"), e.getMessage());
        assertFalse(e.getMessage().contains(SECRET), "the secret must not reach the message");
    }

    @Test
    void entityExpansionIsRefusedQuickly() {
        // The "billion laughs" pattern: ten levels of ten-fold expansion.
        StringBuilder dtd = new StringBuilder("<!DOCTYPE p [ <!ENTITY l0 \"lol\">");
        for (int i = 1; i <= 10; i++) {
            dtd.append("<!ENTITY l").append(i).append(" \"");
            for (int j = 0; j < 10; j++) {
                dtd.append("&l").append(i - 1).append(';');
            }
            dtd.append("\">");
        }
        dtd.append("]>");
        String xml = "<?xml version=\"1.0\"?>\n" + dtd + "\n<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\" name=\"&l10;\"/>";

        ProjectFileException e = assertTimeoutPreemptively(Duration.ofSeconds(5),
                () -> assertThrows(ProjectFileException.class, () -> load(xml)));

        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("document type declaration"), e.getMessage());
    }

    @Test
    void anExternalDtdAndParameterEntitiesAreNotFetched() {
        String external = "<?xml version=\"1.0\"?>\n<!DOCTYPE p SYSTEM \"" + loopbackUrl("evil.dtd") + "\">\n"
                + "<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\"/>";
        String parameter = "<?xml version=\"1.0\"?>\n<!DOCTYPE p [ <!ENTITY % remote SYSTEM \"" + loopbackUrl("p.dtd")
                + "\"> %remote; ]>\n<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\"/>";

        assertThrows(ProjectFileException.class, () -> load(external));
        assertThrows(ProjectFileException.class, () -> load(parameter));

        assertEquals(0, connections.get(), "nothing may be fetched from the network");
    }

    @Test
    void referencesToOtherFilesOrAddressesAreRefusedAndNotFollowed() throws Exception {
        Path other = folder.resolve("other.eluvia");
        Files.writeString(other, "<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\"><contaminants name=\"x\"/></site:Project>");
        String toFile = "<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\">\n"
                + "<cleanupLevels contaminant=\"" + other.toUri() + "#//@contaminants.0\"/>\n</site:Project>";
        String toAddress = "<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\">\n"
                + "<cleanupLevels contaminant=\"" + loopbackUrl("x.eluvia") + "#//@contaminants.0\"/>\n</site:Project>";
        String schemaLocation = "<site:Project xmlns:site=\"urn:eluvia:site\" xmlns:other=\"urn:unknown\""
                + " xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\" xsi:schemaLocation=\"urn:unknown "
                + loopbackUrl("x.ecore") + "\" schemaVersion=\"1\">\n<contaminants xsi:type=\"other:Thing\"/>\n</site:Project>";

        ProjectFileException fileRef = assertThrows(ProjectFileException.class, () -> load(toFile));
        ProjectFileException addressRef = assertThrows(ProjectFileException.class, () -> load(toAddress));
        assertThrows(ProjectFileException.class, () -> load(schemaLocation));

        assertTrue(fileRef.getMessage().contains("self-contained"), fileRef.getMessage());
        assertTrue(addressRef.getMessage().contains("self-contained"), addressRef.getMessage());
        assertEquals(0, connections.get(), "nothing may be fetched from the network");
    }

    @Test
    void deepNestingIsRefusedWithALine() {
        StringBuilder xml = new StringBuilder("<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"1\">\n");
        for (int i = 0; i < 10_000; i++) {
            xml.append("<a>");
        }
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> load(xml.toString()));

        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("nested more than"), e.getMessage());
    }

    @Test
    void anOversizedFileIsRefusedUnread() {
        InputStream endless = new InputStream() {
            private long remaining = ProjectFiles.MAX_FILE_BYTES + 1;

            @Override
            public int read() {
                return remaining-- > 0 ? ' ' : -1;
            }

            @Override
            public int read(byte[] b, int off, int len) {
                if (remaining <= 0) {
                    return -1;
                }
                int n = (int) Math.min(len, remaining);
                java.util.Arrays.fill(b, off, off + n, (byte) ' ');
                remaining -= n;
                return n;
            }
        };

        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFiles.load(endless, "big.eluvia"));

        assertTrue(e.getMessage().contains("larger than"), e.getMessage());
    }

    private static void load(String xml) throws ProjectFileException {
        ProjectFiles.load(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)), "hostile.eluvia");
    }
}
