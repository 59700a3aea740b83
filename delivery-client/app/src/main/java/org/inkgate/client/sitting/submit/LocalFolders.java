package org.inkgate.client.sitting.submit;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * The real file system. Unlike a general atomic write, it never creates the target folder: a
 * missing output folder (an unplugged stick) must fail, not quietly become a new folder on the
 * local disk where nobody will look for it.
 */
public final class LocalFolders implements FolderAccess {

    @Override
    public boolean isFolder(Path folder) {
        return Files.isDirectory(folder);
    }

    @Override
    public long usableSpace(Path folder) throws IOException {
        return Files.getFileStore(folder).getUsableSpace();
    }

    @Override
    public void writeAtomically(Path target, byte[] bytes) throws IOException {
        Path folder = target.toAbsolutePath().getParent();
        Path temp = folder.resolve("." + target.getFileName() + ".part");
        try {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.CREATE, StandardOpenOption.TRUNCATE_EXISTING,
                    StandardOpenOption.WRITE)) {
                ByteBuffer buffer = ByteBuffer.wrap(bytes);
                while (buffer.hasRemaining()) {
                    ch.write(buffer);
                }
                ch.force(true);
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
                dir.force(true);
            } catch (IOException | UnsupportedOperationException e) {
                // folders cannot be flushed on this platform; the rename is left to the file system's journal
            }
        } finally {
            try {
                Files.deleteIfExists(temp);
            } catch (IOException e) {
                // a read-only or vanished folder: nothing was left behind that we could remove
            }
        }
    }
}
