package org.inkgate.format.io;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.AclEntry;
import java.nio.file.attribute.AclEntryFlag;
import java.nio.file.attribute.AclEntryPermission;
import java.nio.file.attribute.AclEntryType;
import java.nio.file.attribute.AclFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.stream.Stream;

/**
 * Owner-only access for files that hold decrypted texts or candidates' personal fields (the results
 * store, exports, reports, rating sheets): {@code 0600} files and {@code 0700} folders on POSIX
 * systems; on Windows an access control list with one entry, the owner's, with inheritance from
 * the parent removed. The one place this rule is written; docs/test-owner-guide.md, "Who can read
 * the files".
 */
public final class OwnerOnly {

    private static final boolean POSIX = FileSystems.getDefault().supportedFileAttributeViews().contains("posix");

    private OwnerOnly() {
    }

    /**
     * Creates {@code folder} and any missing parents, each new one owner-only. A folder that existed is
     * left as it is: it may be one the user shares on purpose; what is written into it is restricted.
     */
    public static Path folder(Path folder) throws IOException {
        Path absolute = folder.toAbsolutePath().normalize();
        List<Path> missing = new ArrayList<>();
        for (Path p = absolute; p != null && !Files.exists(p); p = p.getParent()) {
            missing.addFirst(p);
        }
        for (Path p : missing) {
            Files.createDirectory(p);
            restrict(p);
        }
        return folder;
    }

    /**
     * Makes sure {@code file} exists and is owner-only, creating it empty if missing: SQLite then gives
     * its {@code -wal}, {@code -shm} and {@code -journal} files the same mode as the database file (on
     * POSIX; on Windows they inherit the folder's list). An existing file that cannot be changed (on
     * read-only media, or owned by someone else) is left as it is.
     */
    public static void file(Path file) throws IOException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null && !Files.exists(parent)) {
            folder(parent);
        }
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            if (POSIX) {
                Files.createFile(file, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rw-------")));
            } else {
                Files.createFile(file);
            }
            restrict(file);
            return;
        }
        tryRestrict(file);
        for (String sidecar : List.of("-wal", "-shm", "-journal")) {
            Path s = file.resolveSibling(file.getFileName() + sidecar);
            if (Files.exists(s, LinkOption.NOFOLLOW_LINKS)) {
                tryRestrict(s);
            }
        }
    }

    /** Makes {@code root} and, if a folder, everything under it owner-only (symbolic links are not followed). */
    public static void tree(Path root) throws IOException {
        if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.toList()) {
                if (!Files.isSymbolicLink(p)) {
                    restrict(p);
                }
            }
        }
    }

    /** Makes one file or folder owner-only. */
    public static void restrict(Path path) throws IOException {
        boolean folder = Files.isDirectory(path, LinkOption.NOFOLLOW_LINKS);
        if (POSIX) {
            Files.setPosixFilePermissions(path, PosixFilePermissions.fromString(folder ? "rwx------" : "rw-------"));
            return;
        }
        AclFileAttributeView acl = Files.getFileAttributeView(path, AclFileAttributeView.class, LinkOption.NOFOLLOW_LINKS);
        if (acl == null) {
            return; // a file system with neither (FAT on a USB stick): nothing to set; the guide says so
        }
        AclEntry.Builder owner = AclEntry.newBuilder().setType(AclEntryType.ALLOW).setPrincipal(acl.getOwner())
                .setPermissions(EnumSet.allOf(AclEntryPermission.class));
        if (folder) {
            owner.setFlags(AclEntryFlag.FILE_INHERIT, AclEntryFlag.DIRECTORY_INHERIT);
        }
        acl.setAcl(List.of(owner.build()));
    }

    private static void tryRestrict(Path path) {
        try {
            restrict(path);
        } catch (IOException | UnsupportedOperationException e) {
            // read-only media or another owner: opening must still work; the guide tells owners to check
        }
    }
}
