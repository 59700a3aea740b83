package org.inkgate.packs.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.testutil.BuiltPacks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The pack command line as a test owner runs it, through picocli with captured output. */
class PackCommandTest {
    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        CommandLine cl = PackCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    private Path csv(String text) throws Exception {
        Path p = dir.resolve("terms.csv");
        Files.writeString(p, text);
        return p;
    }

    private Run buildGlossary(Path source, Path out) {
        return run("build", "glossary", "--source", source.toString(), "--out", out.toString(), "--id", "cli-test",
                "--pack-version", "2", "--title", "CLI test", "--licence", "CC-BY-4.0", "--attribution", "Test author",
                "--built-at", "2026-02-01T10:00:00Z");
    }

    @Test
    void buildInspectVerifySearch_glossary_worksEndToEnd() throws Exception {
        Path out = dir.resolve("g.inkpack");
        Run built = buildGlossary(csv("entry_id,language,term\nt1,en,tide table\nt1,es,tabla de mareas\n"), out);
        assertEquals(ExitCodes.OK, built.code(), built.err());
        assertTrue(built.out().contains("1 entries"), built.out());

        Run inspect = run("inspect", "--files", out.toString());
        assertEquals(0, inspect.code());
        assertTrue(inspect.out().contains("cli-test") && inspect.out().contains("CC-BY-4.0") && inspect.out().contains("2026-02-01T10:00:00Z"));
        assertTrue(inspect.out().contains(PackFiles.readManifest(out).contentSha256()));

        assertEquals(0, run("verify", out.toString()).code());
        Run search = run("search", out.toString(), "tide");
        assertEquals(0, search.code());
        assertTrue(search.out().contains("prefix   tide table [en]") && search.out().contains("tabla de mareas [es]"), search.out());
    }

    @Test
    void build_badSource_exits4WithRowAndWritesNothing() throws Exception {
        Path out = dir.resolve("never.inkpack");
        Run r = buildGlossary(csv("language,term\nen,ok\nen,\n"), out);
        assertEquals(ExitCodes.BAD_SOURCE, r.code());
        assertTrue(r.err().contains("row 3, column term"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void verify_alteredPack_exits3() throws Exception {
        Path copy = dir.resolve("altered.inkpack");
        byte[] bytes = Files.readAllBytes(BuiltPacks.demoGlossary());
        bytes[bytes.length / 2] ^= 0x01;
        Files.write(copy, bytes);
        Run r = run("verify", BuiltPacks.demoGlossary().toString(), copy.toString());
        assertEquals(ExitCodes.REFUSED, r.code());
        assertTrue(r.out().contains("intact: " + BuiltPacks.demoGlossary()));
        assertTrue(r.err().contains("REFUSED"), r.err());
    }

    @Test
    void search_dictionaryPack_printsSensesOfTheBaseForm() {
        Run r = run("search", BuiltPacks.wordnet().toString(), "geese");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("goose (noun)"), r.out());
    }

    @Test
    void help_listsCommandsAndExitCodes() {
        Run r = run("--help");
        assertEquals(0, r.code());
        for (String s : new String[] {"build", "inspect", "verify", "search", "Exit codes", "3", "altered"}) {
            assertTrue(r.out().contains(s), s + " missing from help:\n" + r.out());
        }
    }

    @Test
    void unknownOption_exits2() {
        assertEquals(ExitCodes.USAGE, run("verify", "--frobnicate", "x").code());
    }
}
