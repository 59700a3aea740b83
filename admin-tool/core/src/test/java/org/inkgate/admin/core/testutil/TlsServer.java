package org.inkgate.admin.core.testutil;

import io.zonky.test.db.postgres.embedded.EmbeddedPostgres;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.KeyStore;
import java.security.PrivateKey;
import java.security.cert.Certificate;
import java.util.Base64;
import java.util.concurrent.TimeUnit;

/**
 * A PostgreSQL server of its own that speaks TLS, for the tests of the store's TLS parameters. Its
 * certificate is made for the run by the JDK's keytool (self-signed, CN and subject alternative
 * names localhost and 127.0.0.1, two days), so the client can check it with {@code sslrootcert}.
 * Its host-based authentication (PostgreSQL docs, 21.1 "The pg_hba.conf File") lets the role
 * {@value #TLS_ROLE} in only over TLS ({@code hostssl}, and {@code hostnossl ... reject}), while the
 * library's own superuser connections stay plain.
 */
public final class TlsServer implements AutoCloseable {

    /** The role that may log in only over TLS (trust, no password: the test is about the channel). */
    public static final String TLS_ROLE = "tls_only";

    private final EmbeddedPostgres server;
    private final Path rootCertificate;

    private TlsServer(EmbeddedPostgres server, Path rootCertificate) {
        this.server = server;
        this.rootCertificate = rootCertificate;
    }

    /**
     * Makes the certificate in a new folder of the system's temporary folder and starts the server.
     * Not in a test's own temporary folder: that is the test user's alone, and the server runs as
     * nobody when the tests run as root, so it could not reach its files there.
     */
    public static TlsServer start() throws Exception {
        Path folder = Files.createTempDirectory("inkgate-tls-server");
        // the server does not run as the test's user when the tests run as root: it must reach these files
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
        Path store = folder.resolve("server.p12");
        keytool("-genkeypair", "-alias", "server", "-keyalg", "RSA", "-keysize", "2048", "-validity", "2",
                "-dname", "CN=localhost", "-ext", "SAN=dns:localhost,ip:127.0.0.1", "-storetype", "PKCS12",
                "-keystore", store.toString(), "-storepass", "test-only", "-keypass", "test-only");
        KeyStore ks = KeyStore.getInstance("PKCS12");
        try (InputStream in = Files.newInputStream(store)) {
            ks.load(in, "test-only".toCharArray());
        }
        PrivateKey key = (PrivateKey) ks.getKey("server", "test-only".toCharArray());
        Certificate cert = ks.getCertificate("server");
        Path crt = folder.resolve("server.crt");
        Path keyFile = folder.resolve("server.key");
        Path hba = folder.resolve("pg_hba.conf");
        Files.writeString(crt, pem("CERTIFICATE", cert.getEncoded()), StandardCharsets.US_ASCII);
        Files.writeString(keyFile, pem("PRIVATE KEY", key.getEncoded()), StandardCharsets.US_ASCII);
        Files.writeString(hba, """
                # written by the tests (TlsServer)
                hostssl all %1$s 127.0.0.1/32 trust
                hostssl all %1$s ::1/128 trust
                hostnossl all %1$s all reject
                host all all 127.0.0.1/32 trust
                host all all ::1/128 trust
                """.formatted(TLS_ROLE));
        // PostgreSQL refuses a key file others can read (docs, 19.9.3 "Setting up the Server's Certificate")
        Files.setPosixFilePermissions(keyFile, PosixFilePermissions.fromString("rw-------"));
        Files.setPosixFilePermissions(crt, PosixFilePermissions.fromString("rw-r--r--"));
        Files.setPosixFilePermissions(hba, PosixFilePermissions.fromString("rw-r--r--"));
        EmbeddedPostgres.Builder builder = EmbeddedPostgres.builder()
                .setServerConfig("ssl", "on")
                .setServerConfig("ssl_cert_file", crt.toString())
                .setServerConfig("ssl_key_file", keyFile.toString())
                .setServerConfig("hba_file", hba.toString());
        if (ServerUserBinaries.runningAsRoot()) {
            // the key stays root's: the server then runs in a user namespace where root's files and the
            // server's own user look alike, which is what PostgreSQL's owner check of the key asks for
            builder.setPgBinaryResolver(new ServerUserBinaries());
        }
        EmbeddedPostgres pg = builder.start();
        try (var c = pg.getPostgresDatabase().getConnection(); var s = c.createStatement()) {
            s.execute("CREATE ROLE " + TLS_ROLE + " LOGIN");
            s.execute("CREATE DATABASE tls_store OWNER " + TLS_ROLE);
        }
        return new TlsServer(pg, crt);
    }

    public int port() {
        return server.getPort();
    }

    /** The server's own certificate, which the client trusts as the root. */
    public Path rootCertificate() {
        return rootCertificate;
    }

    @Override
    public void close() throws IOException {
        server.close();
        try (var files = Files.list(rootCertificate.getParent())) {
            for (Path f : files.toList()) {
                Files.delete(f);
            }
        }
        Files.delete(rootCertificate.getParent());
    }

    /** A second self-signed certificate, not the server's: a client trusting only it must refuse the server. */
    public static Path otherCertificate(Path folder) throws Exception {
        Files.createDirectories(folder);
        Path store = folder.resolve("other.p12");
        keytool("-genkeypair", "-alias", "other", "-keyalg", "RSA", "-keysize", "2048", "-validity", "2",
                "-dname", "CN=localhost", "-ext", "SAN=dns:localhost,ip:127.0.0.1", "-storetype", "PKCS12",
                "-keystore", store.toString(), "-storepass", "test-only", "-keypass", "test-only");
        KeyStore ks = KeyStore.getInstance("PKCS12");
        try (InputStream in = Files.newInputStream(store)) {
            ks.load(in, "test-only".toCharArray());
        }
        Path crt = folder.resolve("other.crt");
        Files.writeString(crt, pem("CERTIFICATE", ks.getCertificate("other").getEncoded()), StandardCharsets.US_ASCII);
        return crt;
    }

    private static String pem(String type, byte[] der) {
        return "-----BEGIN " + type + "-----\n" + Base64.getMimeEncoder(64, new byte[] {'\n'}).encodeToString(der)
                + "\n-----END " + type + "-----\n";
    }

    private static void keytool(String... args) throws Exception {
        String[] command = new String[args.length + 1];
        command[0] = Path.of(System.getProperty("java.home"), "bin", "keytool").toString();
        System.arraycopy(args, 0, command, 1, args.length);
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String said = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS) || p.exitValue() != 0) {
            throw new IllegalStateException("keytool failed: " + said);
        }
    }
}
