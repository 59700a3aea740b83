package org.inkgate.admin.core.bundling;

import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.Problem;

/**
 * The one place where a pack file named by an exam source is checked before it is embedded.
 *
 * <p>Today a pack is embedded as an opaque file: its id, kind and version come from the exam
 * source's declaration and its SHA-256 is computed from the bytes. The pack format (with its own
 * manifest) is being built in resource-packs; <b>once it lands, this method must open the pack,
 * verify it, and compare the pack's own id, kind and version with the declaration</b>, adding a
 * problem for each difference. Until then a wrong declaration is not caught here.
 */
public final class PackCheck {

    private PackCheck() {
    }

    /** Adds a problem for each way the pack file disagrees with its declaration (not yet: see class comment). */
    public static void check(ExamSource.Pack declared, byte[] packFile, List<Problem> problems) {
        if (packFile.length == 0) {
            problems.add(new Problem(declared.file(), 0, 0, "", "the pack file is empty; build the pack again"));
        }
        // CROSS-CHECK PENDING: compare the pack's own manifest (id, kind, version) with `declared`
        // once the resource-packs pack reader is available on this branch.
    }
}
