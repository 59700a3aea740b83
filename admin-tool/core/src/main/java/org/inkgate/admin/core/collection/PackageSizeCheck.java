package org.inkgate.admin.core.collection;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.format.response.ResponsePackageReader;

/**
 * Looks at a file's size before anything reads it: a file over the package reader's limit (a
 * stray disk image or video in the collection folder, say) is refused by itself instead of
 * exhausting memory and ending the whole collection. A file of 2 GiB or more cannot even be
 * held in one Java array.
 */
final class PackageSizeCheck {

    /** The largest package the reader opens (docs/formats.md, "Limits"). */
    static final long MAX_BYTES = ResponsePackageReader.defaultLimits().maxArchiveBytes();

    private PackageSizeCheck() {
    }

    /** Why {@code file} is refused unread, or null when its size is within the limit. */
    static String tooLarge(Path file) throws IOException {
        long size = Files.size(file);
        if (size <= MAX_BYTES) {
            return null;
        }
        return file + ": " + size + " bytes, over the limit of " + MAX_BYTES + " bytes for a response package (a"
                + " sitting's package is a few megabytes at most), so it was not read. Nothing of it was imported;"
                + " if it is not a response package, move it out of the collection folder";
    }
}
