package org.inkgate.admin.core.qti;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormAssigner;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.admin.core.testutil.QtiSchemas;
import org.inkgate.format.bundle.FormSlot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Accommodations and tools as 1EdTech AfA 3.0 PNP documents (QTI 3.0 profile), validated against
 * the official schema {@code imsqtiv3p0_afa3p0pnp_v1p0.xsd}, and back into a roster.
 */
class QtiPnpTest {

    @TempDir
    Path dir;

    @Test
    void rosterOut_validates_carriesEachTasksTools_andComesBackIntoARoster() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.valid(dir.resolve("source")));
        Path rosterFile = dir.resolve("roster.csv");
        Files.writeString(rosterFile, """
                candidate_number,level,extra_time_percent,large_print,high_contrast,invented_name
                0007,B1,25,yes,yes,Invented One
                A2,B1,0,no,no,Invented Two
                B3,B2,50,no,no,Invented Three
                """);
        List<RosterCandidate> roster = RosterReader.read(rosterFile);
        Assignment assignment = FormAssigner.assign(roster.stream()
                .map(r -> new FormAssigner.Candidate(r.candidateNumber(), r.level())).toList(),
                FormDesigner.forms(exam), FormDesigner.blockSize(exam), 20261202L);
        Path out = dir.resolve("pnp");
        List<Path> files = QtiPnp.write(exam, roster, Optional.of(assignment), out);
        assertEquals(3, files.size());
        assertTrue(Files.exists(out.resolve("_0007.xml")), "candidate numbers as QTI identifiers: " + files);
        for (Path f : files) {
            assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.PNP, f), f.getFileName().toString());
        }
        String first = Files.readString(out.resolve("_0007.xml"));
        assertTrue(first.contains("<time-multiplier>1.25</time-multiplier>"), first);
        assertTrue(first.contains("<all-content zoom-amount=\"1.5\"/>"), first);
        assertTrue(first.contains("<high-contrast/>"), first);
        // the tools of each task the candidate sits, from the form's slots (ExamFolders: c1 offers suggestions and
        // the glossary, c2 nothing)
        String form = assignment.rows().stream().filter(r -> r.candidateNumber().equals("0007")).findFirst().orElseThrow()
                .formId();
        for (FormSlot slot : FormDesigner.forms(exam).stream().filter(f -> f.id().equals(form)).findFirst().orElseThrow()
                .slots()) {
            assertTrue(first.contains("<appointment-id>test-exam/" + slot.taskId() + "</appointment-id>"), first);
        }
        assertTrue(first.contains("<spell-checker-on-screen/>") && first.contains("<prohibit-set>"), first);

        // back: a roster without the accommodations gets them from the documents
        Path bare = dir.resolve("bare.csv");
        Files.writeString(bare, "candidate_number,level,invented_name\n0007,B1,Invented One\nA2,B1,Invented Two\n"
                + "B3,B2,Invented Three\n");
        QtiPnp.ImportReport read = QtiPnp.read(out);
        assertEquals(3, read.byCandidate().size());
        assertTrue(String.join("\n", read.notes()).contains("tool settings (activate-as-option-set, prohibit-set) have no place in a roster"), read.notes().toString());
        Path merged = dir.resolve("merged.csv");
        assertEquals(List.of(), QtiPnp.mergeIntoRoster(bare, read, merged));
        Map<String, RosterCandidate> back = new java.util.HashMap<>();
        RosterReader.read(merged).forEach(c -> back.put(c.candidateNumber(), c));
        for (RosterCandidate c : roster) {
            RosterCandidate b = back.get(c.candidateNumber());
            assertEquals(c.extraTimePercent(), b.extraTimePercent(), c.candidateNumber());
            assertEquals(c.largePrint(), b.largePrint(), c.candidateNumber());
            assertEquals(c.highContrast(), b.highContrast(), c.candidateNumber());
            assertEquals(c.personal(), b.personal(), "other columns kept");
        }
    }

    @Test
    void foreignPreferences_withNoPlaceInARoster_areReported() throws Exception {
        Path f = dir.resolve("foreign.xml");
        Files.writeString(f, """
                <access-for-all-pnp-records xmlns="http://www.imsglobal.org/xsd/qti/qtiv3p0/imsafa3p0pnp_v1p0">
                  <access-for-all-pnp-record>
                    <person-sourced-id source-system="invented">Z9</person-sourced-id>
                    <access-for-all-pnp>
                      <additional-testing-time><fixed-minutes>15</fixed-minutes></additional-testing-time>
                      <text-appearance><font-size>18</font-size></text-appearance>
                      <line-reader/>
                    </access-for-all-pnp>
                  </access-for-all-pnp-record>
                </access-for-all-pnp-records>
                """);
        assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.PNP, f), "the invented foreign document is valid");
        QtiPnp.ImportReport read = QtiPnp.read(f);
        QtiPnp.Preferences p = read.byCandidate().get("Z9");
        assertEquals(new QtiPnp.Preferences("Z9", 0, true, false), p, "font-size above the default 12 reads as large print");
        String notes = String.join("\n", read.notes());
        assertTrue(notes.contains("15 fixed extra minutes have no place"), notes);
        assertTrue(notes.contains("line-reader has no place"), notes);
    }
}
