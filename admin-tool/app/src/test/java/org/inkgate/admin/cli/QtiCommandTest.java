package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.QtiSchemas;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.SafeZipReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code qti export-exam} and {@code qti import} through the real command line over the invented demo
 * exam source: every written document validated against the official 1EdTech QTI 3.0 schemas (the
 * admin core's test resources), then the package imported back into an equal source.
 */
class QtiCommandTest {

    private static final Path DEMO = Path.of("src/demo/exam-source");

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
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
    void demoExam_outToQtiAndBack_validatesAndComesBackEqual() throws Exception {
        Path zip = dir.resolve("demo-qti.zip");
        Run export = admin("qti", "export-exam", DEMO.toString(), "--out", zip.toString());
        assertEquals(0, export.code(), export.out() + export.err());
        assertTrue(export.out().contains("2 items"), export.out());

        Path unpacked = dir.resolve("unpacked");
        try (SafeZipReader r = SafeZipReader.open(zip, ArchiveLimits.defaults())) {
            for (var e : r.entries()) {
                Path f = unpacked.resolve(e.name());
                Files.createDirectories(f.getParent());
                Files.write(f, r.read(e));
            }
        }
        assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.MANIFEST, unpacked.resolve("imsmanifest.xml")));
        assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.ITEMS, unpacked.resolve("assessment-test.xml")));
        for (String task : List.of("ferry-complaint", "market-square")) {
            assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.ITEMS_WITH_INKGATE, unpacked.resolve("items/" + task + ".xml")));
        }

        Path back = dir.resolve("imported");
        Run imported = admin("qti", "import", zip.toString(), "--out", back.toString());
        assertEquals(0, imported.code(), imported.out() + imported.err());
        assertTrue(imported.out().contains("passes exam check"), imported.out());
        ExamSource a = ExamSourceReader.read(DEMO);
        ExamSource b = ExamSourceReader.read(back);
        assertEquals(moved(a), moved(b));
        for (ExamSource.Task t : a.tasks()) {
            assertEquals(Files.readString(DEMO.resolve(t.promptFile())), Files.readString(back.resolve(t.promptFile())));
        }
        assertEquals(Files.readString(DEMO.resolve("instructions.md")), Files.readString(back.resolve("instructions.md")));
        assertEquals(0, admin("exam", "check", back.toString()).code());

        // the unpacked folder imports too (packages written by other programs are read that way)
        Run fromFolder = admin("qti", "import", unpacked.toString(), "--out", dir.resolve("from-folder").toString());
        assertEquals(0, fromFolder.code(), fromFolder.out() + fromFolder.err());
    }

    @Test
    void badInput_isRefusedWithWhatAndHowToFix_andNothingIsWritten() throws Exception {
        Run notZip = admin("qti", "export-exam", DEMO.toString(), "--out", dir.resolve("x.txt").toString());
        assertEquals(InkgateAdmin.PROBLEMS, notZip.code());
        assertTrue(notZip.err().contains("must end in .zip"), notZip.err());

        Path choice = dir.resolve("choice.xml");
        Files.writeString(choice, "<qti-assessment-item xmlns=\"http://www.imsglobal.org/xsd/imsqtiasi_v3p0\""
                + " identifier=\"q1\" title=\"Invented\" adaptive=\"false\" time-dependent=\"false\"><qti-item-body>"
                + "<qti-order-interaction response-identifier=\"R\"/></qti-item-body></qti-assessment-item>");
        Run refused = admin("qti", "import", choice.toString(), "--out", dir.resolve("never").toString());
        assertEquals(InkgateAdmin.PROBLEMS, refused.code());
        assertTrue(refused.err().contains("qti-order-interaction is not an extended-text interaction"), refused.err());
        assertFalse(Files.exists(dir.resolve("never/exam.yaml")));

        Run missing = admin("qti", "import", dir.resolve("nothing.zip").toString(), "--out", dir.resolve("n").toString());
        assertEquals(InkgateAdmin.PROBLEMS, missing.code());
        assertTrue(missing.err().contains("does not exist"), missing.err());

        Run help = admin("qti", "import", "--help");
        assertEquals(0, help.code());
        assertTrue(help.out().contains("--out"), help.out());
    }

    @Test
    void demoRoster_pnpOutAndBack_validatesAndRestoresTheAccommodations() throws Exception {
        Path assignment = dir.resolve("assignment.csv");
        assertEquals(0, admin("forms", DEMO.toString(), "--roster", "src/demo/roster.csv", "--seed", "20261202", "--out",
                assignment.toString()).code());
        Path pnp = dir.resolve("pnp");
        Run export = admin("qti", "export-pnp", DEMO.toString(), "--roster", "src/demo/roster.csv", "--assignment",
                assignment.toString(), "--out", pnp.toString());
        assertEquals(0, export.code(), export.out() + export.err());
        List<Path> files;
        try (var s = Files.list(pnp)) {
            files = s.sorted().toList();
        }
        assertEquals(12, files.size(), "one per candidate on the demo roster");
        for (Path f : files) {
            assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.PNP, f), f.getFileName().toString());
        }
        // back into the roster with the accommodation columns emptied
        List<String> lines = Files.readAllLines(Path.of("src/demo/roster.csv"));
        StringBuilder bare = new StringBuilder(lines.get(0)).append('\n');
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",", -1);
            f[3] = "0";
            f[4] = "no";
            f[5] = "no";
            bare.append(String.join(",", f)).append('\n');
        }
        Path bareRoster = dir.resolve("bare.csv");
        Files.writeString(bareRoster, bare);
        Path merged = dir.resolve("merged.csv");
        Run imported = admin("qti", "import-pnp", pnp.toString(), "--roster", bareRoster.toString(), "--out",
                merged.toString());
        assertEquals(InkgateAdmin.ATTENTION, imported.code(), "tools in the documents are listed: " + imported.out());
        assertEquals(org.inkgate.admin.core.roster.RosterReader.read(Path.of("src/demo/roster.csv")),
                org.inkgate.admin.core.roster.RosterReader.read(merged));
        Run again = admin("qti", "import-pnp", pnp.toString(), "--roster", bareRoster.toString(), "--out",
                merged.toString());
        assertEquals(InkgateAdmin.PROBLEMS, again.code());
        assertTrue(again.err().contains("nothing is overwritten"), again.err());
    }

    private static ExamSource moved(ExamSource s) {
        return new ExamSource(Path.of("."), s.examId(), s.title(), s.language(), s.instructionsFile(), s.practice(),
                s.tasks(), s.conditions(), s.design(), s.questionnaires(), s.packs(), s.rubric());
    }
}
