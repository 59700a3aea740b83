package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.ForeignZipReader;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.refusal.MalformedArchive;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A QTI package from {@code qti export-exam}, zipped again by the programs item banks and authors
 * use (the JDK's ZipOutputStream here; Info-ZIP zip and Python's zipfile by the committed script
 * src/test/resources/qti/rezip-with-other-tools.sh when they are installed), imported through the
 * real {@code qti import} command: each gives the demo exam source back.
 */
class QtiForeignZipImportTest {

    private static final Path DEMO = Path.of("src/demo/exam-source");
    private static final Path SCRIPT = Path.of("src/test/resources/qti/rezip-with-other-tools.sh");

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run admin(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        var cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void packageRezippedByOtherPrograms_importsToTheSameExamSource() throws Exception {
        Path unpacked = exportAndUnpack();
        Path zips = Files.createDirectories(dir.resolve("zips"));
        List<Path> foreign = new ArrayList<>();
        foreign.add(jdkZip(unpacked, zips.resolve("jdk.zip")));

        Process p = new ProcessBuilder("sh", SCRIPT.toAbsolutePath().toString(), unpacked.toString(),
                zips.toAbsolutePath().toString()).redirectErrorStream(true).start();
        String log = new String(p.getInputStream().readAllBytes());
        assertEquals(0, p.waitFor(), log);
        if (installed("zip")) {
            foreign.add(zips.resolve("info-zip.zip"));
            foreign.add(zips.resolve("info-zip-streamed.zip"));
        }
        if (installed("python3")) {
            foreign.add(zips.resolve("python-zipfile.zip"));
        }

        ExamSource demo = ExamSourceReader.read(DEMO);
        for (Path zip : foreign) {
            String tool = zip.getFileName().toString();
            // these really are ZIPs the strict reader refuses: they hold directory entries
            assertThrows(MalformedArchive.class, () -> SafeZipReader.open(zip, ArchiveLimits.defaults()).close(), tool);
            try (ForeignZipReader r = ForeignZipReader.open(zip, ArchiveLimits.defaults())) {
                assertTrue(r.directoryEntries() >= 2, tool + " holds directory entries");
            }
            Path back = dir.resolve("back-" + tool);
            Run imported = admin("qti", "import", zip.toString(), "--out", back.toString());
            assertEquals(0, imported.code(), tool + ": " + imported.out() + imported.err());
            assertTrue(imported.out().contains("passes exam check"), imported.out());
            assertEquals(moved(demo), moved(ExamSourceReader.read(back)), tool);
            for (ExamSource.Task t : demo.tasks()) {
                assertEquals(Files.readString(DEMO.resolve(t.promptFile())), Files.readString(back.resolve(t.promptFile())), tool);
            }
            assertEquals(Files.readString(DEMO.resolve("instructions.md")), Files.readString(back.resolve("instructions.md")), tool);
        }
    }

    @Test
    void hostileForeignZip_isRefusedByTheCommandWithWhatAndWhy_andNothingIsWritten() throws Exception {
        Path unpacked = exportAndUnpack();
        Path slip = dir.resolve("slip.zip");
        try (ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(slip))) {
            zip.putNextEntry(new ZipEntry("imsmanifest.xml"));
            zip.write(Files.readAllBytes(unpacked.resolve("imsmanifest.xml")));
            zip.putNextEntry(new ZipEntry("items/../../outside.xml"));
            zip.write("<x/>".getBytes());
            zip.closeEntry();
        }
        Run refused = admin("qti", "import", slip.toString(), "--out", dir.resolve("never").toString());
        assertEquals(InkgateAdmin.PROBLEMS, refused.code());
        assertTrue(refused.err().contains("entry name \"items/../../outside.xml\" is not a safe relative path"), refused.err());
        assertFalse(Files.exists(dir.resolve("never/exam.yaml")));
        assertFalse(Files.exists(dir.resolve("outside.xml")));
    }

    private Path exportAndUnpack() throws Exception {
        Path zip = dir.resolve("demo-qti.zip");
        Run export = admin("qti", "export-exam", DEMO.toString(), "--out", zip.toString());
        assertEquals(0, export.code(), export.out() + export.err());
        Path unpacked = dir.resolve("unpacked");
        try (SafeZipReader r = SafeZipReader.open(zip, ArchiveLimits.defaults())) {
            for (var e : r.entries()) {
                Path f = unpacked.resolve(e.name());
                Files.createDirectories(f.getParent());
                Files.write(f, r.read(e));
            }
        }
        return unpacked;
    }

    /**
     * As the JDK writes ZIPs: a directory entry per folder, deflated entries with data descriptors,
     * modification times as extended-timestamp extra fields, an entry comment and an archive comment.
     */
    private static Path jdkZip(Path folder, Path out) throws Exception {
        try (OutputStream stream = Files.newOutputStream(out); ZipOutputStream zip = new ZipOutputStream(stream);
                Stream<Path> walk = Files.walk(folder)) {
            zip.setComment("an invented archive comment");
            for (Path p : walk.sorted().toList()) {
                if (p.equals(folder)) {
                    continue;
                }
                String name = folder.relativize(p).toString().replace(p.getFileSystem().getSeparator(), "/");
                ZipEntry entry = new ZipEntry(Files.isDirectory(p) ? name + "/" : name);
                entry.setLastModifiedTime(FileTime.fromMillis(1_764_633_600_000L));
                entry.setComment("re-zipped");
                zip.putNextEntry(entry);
                if (!Files.isDirectory(p)) {
                    zip.write(Files.readAllBytes(p));
                }
                zip.closeEntry();
            }
        }
        return out;
    }

    private static boolean installed(String tool) throws Exception {
        return new ProcessBuilder("sh", "-c", "command -v " + tool).start().waitFor() == 0;
    }

    private static ExamSource moved(ExamSource s) {
        return new ExamSource(Path.of("."), s.examId(), s.title(), s.language(), s.instructionsFile(), s.practice(),
                s.tasks(), s.conditions(), s.design(), s.questionnaires(), s.packs(), s.rubric());
    }
}
