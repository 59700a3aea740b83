package org.inkgate.admin.core.store.postgresql;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.testutil.TlsServer;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 19 §3, "TLS options passed through", against a real PostgreSQL server that lets the store's
 * role in only over TLS ({@link TlsServer}): with {@code sslmode=verify-full} and the server's
 * certificate as {@code sslrootcert} the store opens and works; without TLS, or trusting another
 * certificate, it is refused in words that say what to change (pgJDBC's documented parameters,
 * "Connection Parameters"; PostgreSQL docs 19.9 "Secure TCP/IP Connections with SSL").
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PostgresTlsTest {

    private TlsServer server;
    private Path otherCertificate;

    @BeforeAll
    void start(@TempDir Path dir) throws Exception {
        server = TlsServer.start();
        otherCertificate = TlsServer.otherCertificate(dir.resolve("other"));
    }

    @AfterAll
    void stop() throws Exception {
        if (server != null) {
            server.close();
        }
    }

    private StoreLocation.Server at(Map<String, String> parameters) {
        return new StoreLocation.Server("localhost", server.port(), "tls_store", TlsServer.TLS_ROLE, parameters, null);
    }

    @Test
    void verifyFull_withTheServersCertificate_opensAndUsesTheStore() throws Exception {
        StoreLocation.Server tls = at(Map.of("sslmode", "verify-full",
                "sslrootcert", server.rootCertificate().toString()));
        try (ResultsStore store = Stores.openResults(tls)) {
            assertEquals(List.of(), store.examIds());
        }
        try (ResultsStore again = Stores.openResultsForReading(tls)) {
            assertEquals(List.of(), again.examIds());
        }
    }

    @Test
    void withoutTls_isRefusedSayingTheServerWantsTls() {
        StoreException refused = assertThrows(StoreException.class,
                () -> Stores.openResults(at(Map.of("sslmode", "disable"))).close());
        String said = refused.getMessage();
        assertTrue(said.contains("TLS") && said.contains("sslmode"), said);
        assertFalse(said.contains("password"), "not a password problem: " + said);
    }

    @Test
    void trustingAnotherCertificate_isRefusedSayingTheCertificateCheckFailed() {
        StoreException refused = assertThrows(StoreException.class, () -> Stores.openResults(at(Map.of(
                "sslmode", "verify-full", "sslrootcert", otherCertificate.toString()))).close());
        String said = refused.getMessage();
        assertTrue(said.contains("certificate") && said.contains("sslrootcert"), said);
        assertFalse(said.contains("is the server running"), "the server is running; its certificate failed: " + said);
    }
}
