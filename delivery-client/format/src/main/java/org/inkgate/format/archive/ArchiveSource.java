package org.inkgate.format.archive;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.inkgate.format.refusal.FormatRefusal;

/** Positional reads from a file or from memory, for both archive readers. */
sealed interface ArchiveSource extends AutoCloseable {

    static ArchiveSource open(Path file) throws IOException {
        return new FileSource(FileChannel.open(file, StandardOpenOption.READ));
    }

    /** An archive held in memory (e.g. just decrypted), so its content never touches the disk. */
    static ArchiveSource of(byte[] bytes) {
        return new BytesSource(bytes);
    }

    long size() throws IOException;

    int read(ByteBuffer into, long position) throws IOException;

    @Override
    void close() throws IOException;

    /** Reads a whole header, little-endian, refusing one that points outside the file. */
    default ByteBuffer header(long position, long length, String file, EntryData.Wording wording)
            throws FormatRefusal, IOException {
        if (position < 0 || length < 0 || position + length > size() || length > Integer.MAX_VALUE) {
            throw wording.malformed(file, "a header points outside the file");
        }
        ByteBuffer buffer = ByteBuffer.allocate((int) length).order(ByteOrder.LITTLE_ENDIAN);
        while (buffer.hasRemaining()) {
            if (read(buffer, position + buffer.position()) < 0) {
                throw wording.malformed(file, "the file ended inside a header");
            }
        }
        return buffer.flip();
    }

    record FileSource(FileChannel channel) implements ArchiveSource {
        @Override
        public long size() throws IOException {
            return channel.size();
        }

        @Override
        public int read(ByteBuffer into, long position) throws IOException {
            return channel.read(into, position);
        }

        @Override
        public void close() throws IOException {
            channel.close();
        }
    }

    record BytesSource(byte[] bytes) implements ArchiveSource {
        @Override
        public long size() {
            return bytes.length;
        }

        @Override
        public int read(ByteBuffer into, long position) {
            if (position >= bytes.length) {
                return -1;
            }
            int n = (int) Math.min(into.remaining(), bytes.length - position);
            into.put(bytes, (int) position, n);
            return n;
        }

        @Override
        public void close() {
            // nothing held
        }
    }
}
