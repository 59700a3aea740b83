package org.inkgate.packs.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** The progress counter: drawn in place on a terminal, nothing at all otherwise. */
class ProgressReporterTest {

    @Test
    void notATerminal_printsNothing() {
        StringWriter err = new StringWriter();
        try (ProgressReporter p = new ProgressReporter(new PrintWriter(err), false, "collect", "packages", 3)) {
            p.step();
            p.clear();
            p.step();
            p.stepTo(3, "last");
        }
        assertEquals("", err.toString());
    }

    @Test
    void terminal_redrawsOneLineAndEndsAtTheTotal_closeLeavesABlankLine() {
        StringWriter err = new StringWriter();
        ProgressReporter p = new ProgressReporter(new PrintWriter(err), true, "collect", "packages", 4);
        for (int i = 0; i < 4; i++) {
            p.step();
        }
        String drawn = err.toString();
        assertTrue(drawn.startsWith("\rcollect: 1/4 packages (25 %)"), drawn);
        assertTrue(drawn.endsWith("\rcollect: 4/4 packages (100 %)"), drawn);
        assertFalse(drawn.contains("\n"), "never a new line: " + drawn);
        p.close();
        assertTrue(err.toString().endsWith("\r" + " ".repeat("collect: 4/4 packages (100 %)".length()) + "\r"),
                err.toString());
    }

    @Test
    void unknownTotal_isAPlainCounter_withTheNote() {
        StringWriter err = new StringWriter();
        ProgressReporter p = new ProgressReporter(new PrintWriter(err), true, "pack build", "dictionary entries", 0);
        p.stepTo(1, "");
        assertEquals("pack build: 1 dictionary entries", p.line());
        p.total(6);
        p.stepTo(3, "analysing");
        assertEquals("pack build: 3/6 dictionary entries (50 %) analysing", p.line());
    }

    @Test
    void aNewStageNote_isDrawnAtOnce_evenWithinTheRedrawInterval() {
        StringWriter err = new StringWriter();
        ProgressReporter p = new ProgressReporter(new PrintWriter(err), true, "pack build", "stages", 2);
        p.stepTo(0, "reading");
        p.stepTo(1, "indexing");
        assertEquals("\rpack build: 0/2 stages (0 %) reading\rpack build: 1/2 stages (50 %) indexing", err.toString());
    }

    @Test
    void controlCharactersInTheNote_neverReachTheTerminal_onlyTheCountersOwnCarriageReturn() {
        StringWriter err = new StringWriter();
        ProgressReporter p = new ProgressReporter(new PrintWriter(err), true, "export", "parts", 3);
        p.stepTo(1, "forged\rREFUSED \u001b[2J\n");
        assertEquals("\rexport: 1/3 parts (33 %) forged?REFUSED ?[2J?", err.toString());
    }

    @Test
    void aGuardedWriter_handsTheCounterTheWriterItGuards() {
        StringWriter raw = new StringWriter();
        class Guarded extends PrintWriter implements ProgressReporter.GuardedWriter {
            Guarded() {
                super(new StringWriter());
            }

            @Override
            public PrintWriter unguarded() {
                return new PrintWriter(raw, true);
            }
        }
        String before = System.getProperty(ProgressReporter.OVERRIDE_PROPERTY);
        System.setProperty(ProgressReporter.OVERRIDE_PROPERTY, "always");
        try {
            ProgressReporter.onStandardError(new Guarded(), "collect", "packages", 1).step();
        } finally {
            restore(before);
        }
        assertEquals("\rcollect: 1/1 packages (100 %)", raw.toString());
    }

    private static void restore(String before) {
        if (before == null) {
            System.clearProperty(ProgressReporter.OVERRIDE_PROPERTY);
        } else {
            System.setProperty(ProgressReporter.OVERRIDE_PROPERTY, before);
        }
    }

    @Test
    void overrideProperty_decidesInsteadOfTheTerminalCheck() {
        String before = System.getProperty(ProgressReporter.OVERRIDE_PROPERTY);
        try {
            System.setProperty(ProgressReporter.OVERRIDE_PROPERTY, "always");
            assertTrue(ProgressReporter.standardErrorIsTerminal());
            System.setProperty(ProgressReporter.OVERRIDE_PROPERTY, "never");
            assertFalse(ProgressReporter.standardErrorIsTerminal());
            System.clearProperty(ProgressReporter.OVERRIDE_PROPERTY);
            // surefire's forked JVM writes standard error into a pipe: not a terminal
            assertFalse(ProgressReporter.standardErrorIsTerminal());
        } finally {
            restore(before);
        }
    }
}
