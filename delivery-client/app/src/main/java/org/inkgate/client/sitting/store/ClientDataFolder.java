package org.inkgate.client.sitting.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * The client's own folder on the candidate's machine: one SQLite database per sitting
 * ({@code sittings/}), the local copy of every response package written ({@code responses/})
 * and the installation's signing key ({@code installation/}). Nothing in it is shared with other
 * users of the machine: folders are created owner-only where the file system supports POSIX
 * permissions.
 *
 * @param root the folder itself
 */
public record ClientDataFolder(Path root) {

    /** System property that overrides the location (tests, or a test owner's chosen place). */
    public static final String PROPERTY = "inkgate.client.data";

    private static final Set<PosixFilePermission> OWNER_ONLY = PosixFilePermissions.fromString("rwx------");

    public ClientDataFolder {
        Objects.requireNonNull(root, "root");
        root = root.toAbsolutePath().normalize();
    }

    /**
     * The folder named by {@value #PROPERTY} when set, else the per-user data location of the
     * operating system: {@code %LOCALAPPDATA%\Inkgate\client} on Windows,
     * {@code ~/Library/Application Support/Inkgate/client} on macOS, and
     * {@code $XDG_DATA_HOME/inkgate/client} (default {@code ~/.local/share}) elsewhere.
     */
    public static ClientDataFolder standard() {
        return locate(System.getProperties().entrySet().stream()
                .collect(java.util.stream.Collectors.toMap(e -> String.valueOf(e.getKey()), e -> String.valueOf(e.getValue()))),
                System.getenv());
    }

    /** {@link #standard()} for given properties and environment, so the rule can be tested. */
    static ClientDataFolder locate(Map<String, String> properties, Map<String, String> environment) {
        String override = properties.get(PROPERTY);
        if (override != null && !override.isBlank()) {
            return new ClientDataFolder(Path.of(override));
        }
        Path home = Path.of(properties.getOrDefault("user.home", "."));
        String os = properties.getOrDefault("os.name", "").toLowerCase(Locale.ROOT);
        if (os.startsWith("windows")) {
            String local = environment.get("LOCALAPPDATA");
            Path base = local != null && !local.isBlank() ? Path.of(local) : home.resolve("AppData").resolve("Local");
            return new ClientDataFolder(base.resolve("Inkgate").resolve("client"));
        }
        if (os.startsWith("mac")) {
            return new ClientDataFolder(home.resolve("Library").resolve("Application Support").resolve("Inkgate").resolve("client"));
        }
        String xdg = environment.get("XDG_DATA_HOME");
        Path base = xdg != null && !xdg.isBlank() ? Path.of(xdg) : home.resolve(".local").resolve("share");
        return new ClientDataFolder(base.resolve("inkgate").resolve("client"));
    }

    /** Where the sitting databases are. */
    public Path sittings() {
        return root.resolve("sittings");
    }

    /** Where local copies of response packages are kept. */
    public Path responses() {
        return root.resolve("responses");
    }

    /** Where the installation key is kept. */
    public Path installation() {
        return root.resolve("installation");
    }

    /** Creates the folder and its parts (owner-only where supported); returns this. */
    public ClientDataFolder create() throws IOException {
        for (Path folder : new Path[] {root, sittings(), responses(), installation()}) {
            createPrivate(folder);
        }
        return this;
    }

    static void createPrivate(Path folder) throws IOException {
        if (Files.isDirectory(folder)) {
            return;
        }
        Files.createDirectories(folder);
        if (Files.getFileStore(folder).supportsFileAttributeView("posix")) {
            Files.setPosixFilePermissions(folder, OWNER_ONLY);
        }
    }
}
