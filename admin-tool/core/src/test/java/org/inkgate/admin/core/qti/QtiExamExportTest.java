package org.inkgate.admin.core.qti;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.admin.core.testutil.QtiSchemas;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.SafeZipReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The exam as a QTI 3.0 content package, every document validated against the official 1EdTech
 * schemas (test resources standards/qti3): the manifest against the QTI 3.0 content-package profile,
 * the test and items against the Assessment, Section and Item profile (items together with
 * Inkgate's extension schema, as the profile's strict extension point requires).
 */
class QtiExamExportTest {

    @TempDir
    Path dir;

    static void unpack(Path zip, Path to) throws Exception {
        try (SafeZipReader r = SafeZipReader.open(zip, ArchiveLimits.defaults())) {
            for (var e : r.entries()) {
                Path file = to.resolve(e.name());
                Files.createDirectories(file.getParent());
                Files.write(file, r.read(e));
            }
        }
    }

    @Test
    void everyDocument_validatesAgainstTheOfficialSchemas() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withTasks(dir.resolve("source"), 3, 2, "latin-square", true));
        Path zip = dir.resolve("exam-qti.zip");
        QtiExamExport.Report report = QtiExamExport.write(exam, zip);
        assertEquals(3, report.items());
        Path out = dir.resolve("unpacked");
        unpack(zip, out);
        assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.MANIFEST, out.resolve("imsmanifest.xml")));
        assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.ITEMS, out.resolve("assessment-test.xml")));
        for (String task : List.of("t1", "t2", "t3")) {
            Path item = out.resolve("items/" + task + ".xml");
            assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.ITEMS_WITH_INKGATE, item));
            String xml = Files.readString(item);
            assertTrue(xml.contains("<qti-extended-text-interaction response-identifier=\"RESPONSE\" format=\"plain\""
                    + " expected-length=\"900\"/>"), "150 words x 6 characters: " + xml);
            assertTrue(xml.contains("<ink:resource-policy condition=\"c1\""), xml);
            assertTrue(xml.contains("view=\"scorer\""), xml);
        }
        assertTrue(Files.exists(out.resolve("inkgate/packs/test-glossary.inkpack")));
    }
}
