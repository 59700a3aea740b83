package org.inkgate.client.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hex;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoBundleBuildTest {

    @TempDir
    Path temp;

    @Test
    void build_demoSource_writesPracticeBundleSignedByTheDemoKey() throws Exception {
        Path bundle = DemoBundles.buildInto(temp);
        byte[] seed = Hex.parse(Files.readString(
                DemoBundles.SOURCE.resolve("keys").resolve(DemoKeys.SIGNING_FILE)).strip());
        String demoFingerprint = Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(Ed25519.privateFromSeed(seed))));

        try (OpenedBundle opened = new BundleReader(TrustPolicy.trusting(java.util.Set.of(demoFingerprint))).open(bundle)) {
            BundleManifest m = opened.manifest();
            assertTrue(m.practice());
            assertTrue(m.roster().isEmpty());
            assertEquals(List.of("A", "B"), m.forms().stream().map(f -> f.id()).toList());
            assertEquals(demoFingerprint, opened.signerFingerprint());
            assertTrue(opened.readText("prompts/task-1-neighbour-note.md").contains("Sam"));
        }
    }

    @Test
    void build_demoSource_formsSwapWhichTaskHasResources() throws Exception {
        try (OpenedBundle opened = new BundleReader(TrustPolicy.anySigner()).open(DemoBundles.buildInto(temp))) {
            List<FormSlot> a = opened.manifest().form("A").orElseThrow().slots();
            List<FormSlot> b = opened.manifest().form("B").orElseThrow().slots();
            assertEquals(List.of("neighbour-note", "mill-street-shop"), a.stream().map(FormSlot::taskId).toList());
            assertEquals(List.of("mill-street-shop", "neighbour-note"), b.stream().map(FormSlot::taskId).toList());
            assertEquals(List.of("with-resources", "without-resources"), a.stream().map(FormSlot::conditionId).toList());
            assertEquals(List.of("with-resources", "without-resources"), b.stream().map(FormSlot::conditionId).toList());
            assertEquals(SpellingMode.SUGGESTIONS, a.getFirst().policy().spelling());
            assertTrue(a.getFirst().policy().showWordCount());
            assertEquals(ResourcePolicy.noTools(), a.getLast().policy());
        }
    }

    @Test
    void build_twice_givesIdenticalBytes() throws Exception {
        Path first = DemoBundles.buildInto(Files.createDirectory(temp.resolve("one")));
        Path second = DemoBundles.buildInto(Files.createDirectory(temp.resolve("two")));
        assertArrayEquals(Files.readAllBytes(first), Files.readAllBytes(second));
    }

    @Test
    void build_unknownFieldInExamJson_isRefusedNamingFileAndField() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Path exam = source.resolve("exam.json");
        Files.writeString(exam, Files.readString(exam).replace("\"language\"", "\"langauge\""));

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains("exam.json, at langauge: Unrecognized field"), e.getMessage());
        assertFalse(Files.exists(temp.resolve("out.inkexam")));
    }

    @Test
    void build_misspelledSpellingMode_isRefusedWithThePathToTheValue() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Path exam = source.resolve("exam.json");
        Files.writeString(exam, Files.readString(exam).replaceFirst("\"spelling\": \"off\"", "\"spelling\": \"of\""));

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains("exam.json, at forms[0].slots[1].policy.spelling: "), e.getMessage());
    }

    @Test
    void build_brokenJsonSyntax_isRefusedWithLineAndColumn() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Path exam = source.resolve("exam.json");
        Files.writeString(exam, Files.readString(exam).replace("\"language\": \"en-GB\",", "\"language\": \"en-GB\""));

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains("exam.json, line 7, column"), e.getMessage());
    }

    @Test
    void build_missingPromptFile_isRefusedNamingTheFile() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Files.delete(source.resolve("prompts/task-2-mill-street-shop.md"));

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains("\"prompts/task-2-mill-street-shop.md\""), e.getMessage());
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
    }

    @Test
    void build_keyFileNotHex_isRefusedNamingTheKeyFile() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Files.writeString(source.resolve("keys").resolve(DemoKeys.SIGNING_FILE), "not a key", StandardCharsets.US_ASCII);

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains(DemoKeys.SIGNING_FILE), e.getMessage());
        assertTrue(e.getMessage().contains("64 hex digits"), e.getMessage());
    }

    @Test
    void build_formNamingUnknownCondition_isRefusedWithTheWritersReason() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Path exam = source.resolve("exam.json");
        Files.writeString(exam, Files.readString(exam).replaceFirst("\"conditionId\": \"with-resources\"",
                "\"conditionId\": \"with-dictionary\""));

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains("condition \"with-dictionary\" is not defined"), e.getMessage());
    }

    @Test
    void build_ownerKeysInExamJson_isRefusedBecauseTheBuildDerivesThem() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Path exam = source.resolve("exam.json");
        Files.writeString(exam, Files.readString(exam).replace("\"practice\": true",
                "\"practice\": true, \"ownerKeys\": {\"signing\": \"x\", \"encryption\": \"y\"}"));

        DemoSourceException e = assertThrows(DemoSourceException.class,
                () -> DemoBundleBuild.build(source, temp.resolve("out.inkexam")));
        assertTrue(e.getMessage().contains("leave \"ownerKeys\" out"), e.getMessage());
    }

    @Test
    void main_wrongNumberOfArguments_failsWithUsage() {
        DemoSourceException e = assertThrows(DemoSourceException.class, () -> DemoBundleBuild.main(new String[] {"x"}));
        assertTrue(e.getMessage().contains("usage: DemoBundleBuild"), e.getMessage());
    }
}
