package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;

import org.eclipse.emf.common.util.URI;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SyntheticNotebooks;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Damaged, foreign and hostile files are refused with a message naming file, line and problem. */
class HostileFilesTest {

    @TempDir
    Path folder;

    String valid;

    @BeforeEach
    void writeValid() throws IOException {
        Path file = folder.resolve("valid.foldbook");
        NotebookStore.save(SyntheticNotebooks.bench(), file);
        valid = Files.readString(file, StandardCharsets.UTF_8);
    }

    private Path write(String name, String content) throws IOException {
        return Files.writeString(folder.resolve(name), content, StandardCharsets.UTF_8);
    }

    /** Loads and expects a refusal; checks that the refused file is left byte for byte as it was. */
    private NotebookLoadException refused(Path file) throws IOException {
        byte[] before = Files.readAllBytes(file);
        NotebookLoadException e = assertThrows(NotebookLoadException.class, () -> NotebookStore.load(file));
        assertArrayEquals(before, Files.readAllBytes(file), "a failed load must not change the file");
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        return e;
    }

    @Test
    @DisplayName("a truncated file: refused with its line, said to be truncated")
    void truncated() throws IOException {
        Path file = write("truncated.foldbook", valid.substring(0, valid.length() / 2));
        NotebookLoadException e = refused(file);
        assertTrue(e.line() > 1, "line of the problem: " + e.getMessage());
        assertTrue(e.getMessage().contains("truncated"), e.getMessage());
    }

    @Test
    @DisplayName("a foreign namespace: refused, naming the namespace and the ones this version reads")
    void wrongNamespace() throws IOException {
        Path file = write("foreign.foldbook", valid.replace(NotebookPackage.eNS_URI, "urn:example:someone-else:3"));
        NotebookLoadException e = refused(file);
        assertTrue(e.getMessage().contains("namespace 'urn:example:someone-else:3' is not a Foldbook notebook"),
                e.getMessage());
        assertTrue(e.getMessage().contains(NotebookPackage.eNS_URI), e.getMessage());
        // reported at the root element's start tag (it spans lines 2-3 of the saved file)
        assertTrue(e.line() >= 2 && e.line() <= 3, e.getMessage());
    }

    @Test
    @DisplayName("an external entity (XXE): the DOCTYPE is refused and the secret never read into the model")
    void externalEntity() throws IOException {
        Path secret = Files.writeString(folder.resolve("secret.txt"), "TOP-SECRET-CONTENT");
        String hostile = valid.replaceFirst("<\\?xml[^>]*\\?>",
                "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<!DOCTYPE foldbook:Notebook [<!ENTITY xxe SYSTEM \""
                        + secret.toUri() + "\">]>")
                .replace("title=\"Synthetic bench notebook\"", "title=\"&xxe;\"");
        Path file = write("xxe.foldbook", hostile);
        NotebookLoadException e = refused(file);
        assertTrue(e.getMessage().contains("DOCTYPE"), e.getMessage());
        assertFalse(e.getMessage().contains("TOP-SECRET-CONTENT"), e.getMessage());
        // the same through a resource set, as the workbench opens files by content type
        var resourceSet = NotebookStore.newResourceSet();
        RuntimeException wrapped = assertThrows(RuntimeException.class,
                () -> resourceSet.getResource(URI.createFileURI(file.toString()), true));
        assertTrue(wrapped.getCause() instanceof NotebookLoadException, wrapped::toString);
        assertTrue(wrapped.getCause().getMessage().startsWith(file.toString()), wrapped.getCause().getMessage());
    }

    @Test
    @DisplayName("an entity expansion bomb: refused at the DOCTYPE before any expansion")
    void entityBomb() throws IOException {
        StringBuilder entities = new StringBuilder("<!ENTITY a0 \"lol\">");
        for (int i = 1; i < 10; i++) {
            entities.append("<!ENTITY a").append(i).append(" \"").append(("&a" + (i - 1) + ";").repeat(10)).append("\">");
        }
        String hostile = valid.replaceFirst("<\\?xml[^>]*\\?>",
                "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<!DOCTYPE x [" + entities + "]>")
                .replace("title=\"Synthetic bench notebook\"", "title=\"&a9;\"");
        assertTrue(refused(write("bomb.foldbook", hostile)).getMessage().contains("DOCTYPE"));
    }

    @Test
    @DisplayName("a schema location for an unknown namespace is never fetched (loopback server sees no connection)")
    void schemaLocationNotFetched() throws Exception {
        AtomicInteger connections = new AtomicInteger();
        try (ServerSocket server = new ServerSocket(0, 10, InetAddress.getLoopbackAddress())) {
            Thread acceptor = new Thread(() -> {
                try {
                    while (true) {
                        try (Socket ignored = server.accept()) {
                            connections.incrementAndGet();
                        }
                    }
                } catch (SocketException closed) {
                    // server closed at the end of the test
                } catch (IOException e) {
                    throw new IllegalStateException(e);
                }
            });
            acceptor.setDaemon(true);
            acceptor.start();
            String location = "http://127.0.0.1:" + server.getLocalPort() + "/other.ecore";
            String hostile = valid.replace(NotebookPackage.eNS_URI, "urn:example:other:1")
                    .replace("xmlns:xsi=", "xsi:schemaLocation=\"urn:example:other:1 " + location + "\" xmlns:xsi=");
            NotebookLoadException e = refused(write("located.foldbook", hostile));
            assertTrue(e.getMessage().contains("urn:example:other:1"), e.getMessage());
        }
        assertEquals(0, connections.get(), "the loader contacted the schema location");
    }

    @Test
    @DisplayName("not XML at all, empty, and a model element other than a notebook at the root: each refused clearly")
    void otherDamage() throws IOException {
        assertTrue(refused(write("binary.foldbook", "\u0000\u0001PK garbage")).getMessage().contains("not well-formed"));
        assertTrue(refused(write("empty.foldbook", "")).line() >= 0);
        String rigOnly = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<foldbook:Rig xmi:version=\"2.0\""
                + " xmlns:xmi=\"http://www.omg.org/XMI\" xmlns:foldbook=\"" + NotebookPackage.eNS_URI
                + "\" name=\"lonely\"/>\n";
        assertTrue(refused(write("rig.foldbook", rigOnly)).getMessage().contains("root is Rig"));
        assertTrue(assertThrows(NotebookLoadException.class, () -> NotebookStore.load(folder.resolve("absent.foldbook")))
                .getMessage().contains("no such file"));
    }
}
