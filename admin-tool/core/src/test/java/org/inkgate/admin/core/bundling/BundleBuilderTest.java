package org.inkgate.admin.core.bundling;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.inkgate.admin.core.forms.FormAssigner;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PackRef;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BundleBuilderTest {

    @TempDir
    Path dir;

    private final List<RosterCandidate> roster = List.of(
            new RosterCandidate("X1", "B1", "", 25, true, false, java.util.Map.of("name", "Invented One")),
            new RosterCandidate("X2", "B1", "", 0, false, true, java.util.Map.of("name", "Invented Two")));

    @Test
    void build_sealedWithPack_readerOpensItAndThePackIsEmbeddedWithItsDigest() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.valid(dir.resolve("src")));
        byte[] packBytes = java.nio.file.Files.readAllBytes(dir.resolve("src/packs/test-glossary.inkpack"));
        var assignment = FormAssigner.assign(roster.stream().map(r -> new FormAssigner.Candidate(r.candidateNumber(),
                r.level())).toList(), FormDesigner.forms(exam), FormDesigner.blockSize(exam), 5);
        Path out = dir.resolve("exam.inkexam");
        BundleBuilder.Built built = BundleBuilder.build(exam, roster, assignment, TestKeys.ownerKeys(),
                TestKeys.OWNER_SIGNING, "invented-pin-1357".toCharArray(), true, out);
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(out)) {
            assertTrue(b.sealed());
            b.unseal(built.releaseCode());
            PackRef pack = b.manifest().packs().get(0);
            // SHA-256 of the pack bytes by the JDK's MessageDigest, independent of our Sha256 helper
            String expected = java.util.HexFormat.of().formatHex(
                    java.security.MessageDigest.getInstance("SHA-256").digest(packBytes));
            assertEquals(new PackRef("test-glossary", "glossary", "0.1", "packs/test-glossary.inkpack", expected), pack);
            assertArrayEquals(packBytes, b.readBytes(pack.file()));
            assertEquals(2, b.manifest().roster().size());
            assertEquals(25, b.manifest().roster().get(0).extraTimePercent());
            assertTrue(new String(org.inkgate.format.json.Json.write(b.manifest())).indexOf("Invented One") < 0,
                    "personal fields never go into a bundle");
        }
    }

    @Test
    void build_threeConditionCrossover_readerOpensItWithTheDesignAndSixSequences() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withTasks(dir.resolve("src"), 3, 3, "crossover", true));
        var forms = FormDesigner.forms(exam);
        var assignment = org.inkgate.admin.core.forms.FormAssignment.assign(exam, forms, roster, 5).assignment();
        Path out = dir.resolve("three.inkexam");
        BundleBuilder.build(exam, roster, assignment, TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING,
                "invented-pin-1357".toCharArray(), false, out);
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(out)) {
            assertEquals(org.inkgate.format.bundle.StudyDesign.CROSSOVER, b.manifest().design());
            assertEquals(6, b.manifest().forms().size());
            assertEquals(3, b.manifest().conditions().size());
        }
    }

    @Test
    void build_liveExamWithoutPin_listsTheProblem() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.valid(dir.resolve("src")));
        var assignment = FormAssigner.assign(List.of(new FormAssigner.Candidate("X1", "B1")), FormDesigner.forms(exam), 2, 5);
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> BundleBuilder.build(exam, roster,
                assignment, TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING, null, false, dir.resolve("x.inkexam")));
        assertEquals(2, e.problems().size(), e.getMessage());
        assertTrue(e.getMessage().contains("candidate X2 has no form"));
        assertTrue(e.getMessage().contains("needs an invigilator PIN"));
    }

    @Test
    void build_packWhoseOwnVersionDiffersFromTheDeclaration_listsTheProblem() throws Exception {
        ExamFolders.valid(dir.resolve("src"));
        ExamFolders.writeGlossaryPack(dir.resolve("src/packs/test-glossary.inkpack"), "test-glossary", "0.2");
        ExamSource exam = ExamSourceReader.read(dir.resolve("src"));
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> buildPlain(exam));
        assertEquals(1, e.problems().size(), e.getMessage());
        assertTrue(e.getMessage().contains("declares version \"0.1\"") && e.getMessage().contains("says \"0.2\""),
                e.getMessage());
    }

    @Test
    void build_damagedPack_isRefusedAndNoBundleIsWritten() throws Exception {
        ExamFolders.valid(dir.resolve("src"));
        Path pack = dir.resolve("src/packs/test-glossary.inkpack");
        byte[] bytes = java.nio.file.Files.readAllBytes(pack);
        bytes[bytes.length / 2] ^= 0x55;
        java.nio.file.Files.write(pack, bytes);
        ExamSource exam = ExamSourceReader.read(dir.resolve("src"));
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> buildPlain(exam));
        assertTrue(e.getMessage().contains("the pack was refused"), e.getMessage());
        assertTrue(java.nio.file.Files.notExists(dir.resolve("plain.inkexam")), "nothing is written");
    }

    private void buildPlain(ExamSource exam) throws Exception {
        var assignment = FormAssigner.assign(roster.stream().map(r -> new FormAssigner.Candidate(r.candidateNumber(),
                r.level())).toList(), FormDesigner.forms(exam), FormDesigner.blockSize(exam), 5);
        BundleBuilder.build(exam, roster, assignment, TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING,
                "invented-pin-1357".toCharArray(), false, dir.resolve("plain.inkexam"));
    }
}
