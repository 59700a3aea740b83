package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** The progress counter: drawn in place on a terminal, nothing at all otherwise. */
class ProgressTest {

    @Test
    void notATerminal_printsNothing() {
        StringWriter err = new StringWriter();
        Progress p = new Progress(new PrintWriter(err), false, "collect", 3);
        p.step();
        p.clear();
        p.step();
        p.step();
        assertEquals("", err.toString());
    }

    @Test
    void terminal_redrawsOneLineAndEndsAtTheTotal_clearLeavesABlankLine() {
        StringWriter err = new StringWriter();
        Progress p = new Progress(new PrintWriter(err), true, "collect", 4);
        for (int i = 0; i < 4; i++) {
            p.step();
        }
        String drawn = err.toString();
        assertTrue(drawn.startsWith("\rcollect: 1/4 (25 %)"), drawn);
        assertTrue(drawn.endsWith("\rcollect: 4/4 (100 %)"), drawn);
        assertTrue(!drawn.contains("\n"), "never a new line: " + drawn);
        p.clear();
        assertTrue(err.toString().endsWith("\r" + " ".repeat("collect: 4/4 (100 %)".length()) + "\r"), err.toString());
    }
}
