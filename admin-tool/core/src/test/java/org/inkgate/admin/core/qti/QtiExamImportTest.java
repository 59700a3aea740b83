package org.inkgate.admin.core.qti;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.format.archive.HostileArchives;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * QTI in: Inkgate's own packages back to an equal exam source, QTI 2.2 and QTI 3.0 items written by
 * hand from the specifications' element lists (invented content), and the refusals (other interaction
 * types, zip slip, DOCTYPE).
 */
class QtiExamImportTest {

    @TempDir
    Path dir;

    /** The same source apart from where it lies on disk. */
    private static ExamSource moved(ExamSource s) {
        return new ExamSource(Path.of("."), s.examId(), s.title(), s.language(), s.instructionsFile(), s.practice(),
                s.tasks(), s.conditions(), s.design(), s.questionnaires(), s.packs(), s.rubric());
    }

    @Test
    void exportThenImport_givesAnEqualSource() throws Exception {
        Path sourceFolder = ExamFolders.withTasks(dir.resolve("source"), 3, 2, "latin-square", true);
        // a task-specific policy and a multi-block prompt make the round trip less trivial
        Path yaml = sourceFolder.resolve("exam.yaml");
        Files.writeString(yaml, Files.readString(yaml).replace("      spelling: \"off\"\n",
                "      spelling: \"off\"\n    perTask:\n      t2:\n        spelling: underline-only\n        paste: within-response\n"));
        Files.writeString(sourceFolder.resolve("prompts/t1.md"), "## Invented heading\n\nFirst paragraph,\nsecond line."
                + "\n\n- one point\n- another point\n\n1. first\n2. second\n");
        ExamSource original = ExamSourceReader.read(sourceFolder);
        Path zip = dir.resolve("exam.zip");
        QtiExamExport.write(original, zip);

        Path imported = dir.resolve("imported");
        QtiExamImport.Report report = QtiExamImport.run(PackageFiles.open(zip), imported);
        assertEquals(List.of(), report.problems(), "the imported folder passes exam check");
        assertEquals(3, report.tasks());
        ExamSource back = ExamSourceReader.read(imported);
        assertEquals(moved(original), moved(back));
        for (ExamSource.Task t : original.tasks()) {
            assertEquals(Files.readString(sourceFolder.resolve(t.promptFile())), Files.readString(imported.resolve(
                    back.task(t.id()).orElseThrow().promptFile())), "prompt of " + t.id());
        }
        assertEquals(Files.readString(sourceFolder.resolve("instructions.md")), Files.readString(imported.resolve(
                back.instructionsFile())));
        assertArrayEquals(Files.readAllBytes(sourceFolder.resolve("packs/test-glossary.inkpack")),
                Files.readAllBytes(imported.resolve("packs/test-glossary.inkpack")));
    }

    @Test
    void qti22Item_becomesATask_andWhatHasNoPlaceIsReported() throws Exception {
        // element and attribute names from QTI 2.2 (assessmentItem, itemBody, extendedTextInteraction, rubricBlock)
        Path item = dir.resolve("essay.xml");
        Files.writeString(item, """
                <?xml version="1.0" encoding="UTF-8"?>
                <assessmentItem xmlns="http://www.imsglobal.org/xsd/imsqti_v2p2" identifier="essay-1"
                    title="An invented letter" adaptive="false" timeDependent="false" xml:lang="en-GB">
                  <responseDeclaration identifier="RESPONSE" cardinality="single" baseType="string"/>
                  <outcomeDeclaration identifier="SCORE" cardinality="single" baseType="float"/>
                  <itemBody>
                    <rubricBlock view="scorer"><p>Give up to 5 points for content.</p></rubricBlock>
                    <p>Write a letter to an invented neighbour.</p>
                    <img src="picture.png" alt="an invented picture"/>
                    <extendedTextInteraction responseIdentifier="RESPONSE" expectedLength="600">
                      <prompt>Use about 100 words.</prompt>
                    </extendedTextInteraction>
                  </itemBody>
                  <responseProcessing/>
                </assessmentItem>
                """);
        Path out = dir.resolve("from-22");
        QtiExamImport.Report report = QtiExamImport.run(PackageFiles.open(item), out);
        assertEquals(List.of(), report.problems());
        ExamSource s = ExamSourceReader.read(out);
        assertEquals("essay-1", s.tasks().get(0).id());
        assertEquals("An invented letter", s.tasks().get(0).title());
        assertEquals("en-GB", s.language());
        assertEquals(100, s.tasks().get(0).words().max(), "600 characters at 6 a word");
        assertEquals("Write a letter to an invented neighbour.\n\nUse about 100 words.\n",
                Files.readString(out.resolve(s.tasks().get(0).promptFile())));
        String notes = String.join("\n", report.notes());
        assertTrue(notes.contains("img has no place"), notes);
        assertTrue(notes.contains("not in Inkgate's criterion layout"), notes);
        assertTrue(notes.contains("Give up to 5 points for content."), "the rubric text is shown: " + notes);
        assertTrue(notes.contains("responseProcessing left out"), notes);
        assertTrue(notes.contains("untimed"), notes);
    }

    @Test
    void otherInteractionTypes_areRefusedNamingTheItem() throws Exception {
        Path item = dir.resolve("choice.xml");
        Files.writeString(item, """
                <?xml version="1.0" encoding="UTF-8"?>
                <qti-assessment-item xmlns="http://www.imsglobal.org/xsd/imsqtiasi_v3p0" identifier="q7"
                    title="Invented choice" adaptive="false" time-dependent="false">
                  <qti-response-declaration identifier="RESPONSE" cardinality="single" base-type="identifier"/>
                  <qti-item-body>
                    <qti-choice-interaction response-identifier="RESPONSE" max-choices="1">
                      <qti-simple-choice identifier="A">Invented</qti-simple-choice>
                    </qti-choice-interaction>
                  </qti-item-body>
                </qti-assessment-item>
                """);
        QtiExamImport.ImportRefusal e = assertThrows(QtiExamImport.ImportRefusal.class,
                () -> QtiExamImport.run(PackageFiles.open(item), dir.resolve("out")));
        assertTrue(e.getMessage().contains("choice.xml (item q7): qti-choice-interaction is not an extended-text"
                + " interaction"), e.getMessage());
        assertFalse(Files.exists(dir.resolve("out/exam.yaml")), "nothing written");
    }

    @Test
    void doctype_isRefused_soNoEntityIsEverExpanded() throws Exception {
        Path item = dir.resolve("xxe.xml");
        Files.writeString(item, "<?xml version=\"1.0\"?>\n<!DOCTYPE x [<!ENTITY e SYSTEM \"file:///etc/passwd\">]>\n"
                + "<assessmentItem xmlns=\"http://www.imsglobal.org/xsd/imsqti_v2p2\" identifier=\"x\" title=\"&e;\"/>\n");
        QtiExamImport.ImportRefusal e = assertThrows(QtiExamImport.ImportRefusal.class,
                () -> QtiExamImport.run(PackageFiles.open(item), dir.resolve("out")));
        assertTrue(e.getMessage().contains("DOCTYPE"), e.getMessage());
    }

    @Test
    @SuppressWarnings("unchecked")
    void zipSlip_isRefusedBeforeAnythingIsRead() throws Exception {
        Path zip = dir.resolve("slip.zip");
        HostileArchives.writeRaw(zip, Map.entry("imsmanifest.xml", "<manifest/>".getBytes(StandardCharsets.UTF_8)),
                Map.entry("../evil.xml", "<x/>".getBytes(StandardCharsets.UTF_8)));
        PackageFiles.PackageRefusal e = assertThrows(PackageFiles.PackageRefusal.class, () -> PackageFiles.open(zip));
        assertTrue(e.getMessage().contains("cannot be read safely"), e.getMessage());
        assertEquals(java.util.Optional.empty(), PackageFiles.resolve("items/a.xml", "../../evil.xml"));
        assertEquals(java.util.Optional.of("evil.xml"), PackageFiles.resolve("items/a.xml", "../evil.xml"));
    }
}
