package org.inkgate.client.sitting.submit;

import java.io.IOException;
import java.nio.file.Path;

/**
 * The file-system operations a delivery needs, behind an interface so that tests can stand in a
 * full or read-only disk where the machine cannot make one (see {@link LocalFolders} for the real one).
 */
public interface FolderAccess {

    /** Whether {@code folder} exists and is a folder. */
    boolean isFolder(Path folder);

    /** Bytes the folder's store can still take, or -1 when unknown. */
    long usableSpace(Path folder) throws IOException;

    /** Writes {@code bytes} to {@code target} completely or not at all (temporary file, fsync, rename). */
    void writeAtomically(Path target, byte[] bytes) throws IOException;
}
