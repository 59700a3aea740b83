package org.inkgate.admin.core.bundling;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;

/**
 * The one place where a pack file named by an exam source is checked before it is embedded: the
 * pack is verified as a whole (manifest, every file's size and SHA-256, through the resource-packs
 * reader) and its own id, kind and version must equal the exam source's declaration, so a bundle
 * never names data it does not carry.
 */
public final class PackCheck {

    private PackCheck() {
    }

    /** Adds a problem for the pack file if it is refused or disagrees with its declaration. */
    public static void check(ExamSource.Pack declared, Path packFile, List<Problem> problems) {
        PackManifest own;
        try {
            own = PackFiles.verify(packFile);
        } catch (PackRefusal refusal) {
            problems.add(new Problem(declared.file(), 0, 0, "", "the pack was refused: " + refusal.getMessage()
                    + "; build the pack again with `inkgate-admin pack build` and check it with `pack verify`"));
            return;
        }
        compare(declared, "id", declared.id(), own.id(), problems);
        compare(declared, "kind", declared.kind(), own.kind().name().toLowerCase(Locale.ROOT), problems);
        compare(declared, "version", declared.version(), own.version(), problems);
    }

    private static void compare(ExamSource.Pack declared, String field, String inExam, String inPack,
            List<Problem> problems) {
        if (!inPack.equals(inExam)) {
            problems.add(new Problem("exam.yaml", 0, 0, "packs." + declared.id() + "." + field,
                    "exam.yaml declares " + field + " \"" + inExam + "\" for " + declared.file()
                            + " but the pack itself says \"" + inPack + "\"; correct exam.yaml or name the right pack file"));
        }
    }
}
