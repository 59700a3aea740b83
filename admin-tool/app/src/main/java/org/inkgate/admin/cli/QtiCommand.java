package org.inkgate.admin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.qti.PackageFiles;
import org.inkgate.admin.core.qti.QtiExamExport;
import org.inkgate.admin.core.qti.QtiExamImport;
import org.inkgate.admin.core.qti.QtiPnp;
import org.inkgate.admin.core.qti.SafeXml;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code qti}: tasks out to and in from QTI 3.0 (docs/formats.md, "QTI 3.0 interchange"). Exit
 * codes: 0 done, 1 refused (nothing written), 2 usage error, 3 written but needs attention.
 */
@Command(name = "qti", mixinStandardHelpOptions = true,
        description = "Exchange tasks with item banks through 1EdTech QTI 3.0: export an exam source as a content"
                + " package, import QTI 3.0 packages or QTI 2.2 items as a new exam source; write and read the"
                + " candidates' accessibility preferences (PNP).",
        subcommands = {QtiCommand.ExportExam.class, QtiCommand.Import.class, QtiCommand.ExportPnp.class,
            QtiCommand.ImportPnp.class, CommandLine.HelpCommand.class})
final class QtiCommand extends GroupCommand {

    @Command(name = "export-exam", mixinStandardHelpOptions = true,
            description = "Write an exam source as a QTI 3.0 content package (.zip): one extended-text item per task"
                    + " with prompt, expected length and the rubric for scorers, a test with one section per task and"
                    + " its time limit, and Inkgate's settings (conditions, design, questionnaires, packs) in"
                    + " inkgate/exam-settings.yaml.")
    static final class ExportExam implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(paramLabel = "EXAM_DIR", description = "the exam source folder (holding exam.yaml)")
        Path folder;

        @Option(names = "--out", required = true, paramLabel = "FILE.zip", description = "the package to write")
        Path out;

        @Override
        public Integer call() throws IOException {
            PrintWriter err = spec.commandLine().getErr();
            if (!out.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".zip")) {
                err.println("inkgate-admin qti export-exam: --out " + out + " must end in .zip (a QTI content package)");
                return InkgateAdmin.PROBLEMS;
            }
            List<Problem> problems = new ArrayList<>();
            Optional<ExamSource> exam = ExamSourceReader.check(folder, problems);
            if (exam.isEmpty()) {
                err.println("inkgate-admin qti export-exam: " + folder + " has " + problems.size()
                        + " problem(s); fix them (inkgate-admin exam check " + folder + ") and export again:");
                problems.forEach(p -> err.println("  " + p));
                return InkgateAdmin.PROBLEMS;
            }
            Path parent = out.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            QtiExamExport.Report report = QtiExamExport.write(exam.get(), out);
            PrintWriter w = spec.commandLine().getOut();
            w.println("Wrote " + out + ": " + report.items() + " items, a test, imsmanifest.xml (QTI 3.0).");
            report.notes().forEach(n -> w.println("  note: " + n));
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "import", mixinStandardHelpOptions = true,
            description = "Make a new exam source folder from a QTI 3.0 content package (.zip or unpacked folder) or"
                    + " one QTI 3.0 or 2.2 item or test (.xml). Only extended-text items are taken; anything with no"
                    + " place in Inkgate is listed.")
    static final class Import implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(paramLabel = "PACKAGE", description = "a .zip, an unpacked package folder, or one .xml file")
        Path input;

        @Option(names = "--out", required = true, paramLabel = "EXAM_DIR",
                description = "the exam source folder to create (must not exist or be empty)")
        Path out;

        @Override
        public Integer call() throws IOException {
            PrintWriter err = spec.commandLine().getErr();
            QtiExamImport.Report report;
            try {
                report = QtiExamImport.run(PackageFiles.open(input), out);
            } catch (PackageFiles.PackageRefusal | QtiExamImport.ImportRefusal e) {
                err.println("inkgate-admin qti import: " + e.getMessage());
                err.println("Nothing was imported.");
                return InkgateAdmin.PROBLEMS;
            }
            PrintWriter w = spec.commandLine().getOut();
            w.println("Imported " + report.tasks() + " task(s) into " + out + " (exam " + report.examId() + ").");
            if (!report.notes().isEmpty()) {
                w.println("What had no place in Inkgate, or was filled in (check before use):");
                report.notes().forEach(n -> w.println("  - " + n));
            }
            if (!report.problems().isEmpty()) {
                w.println("The new folder does not pass exam check yet (" + report.problems().size() + " problem(s)):");
                report.problems().forEach(p -> w.println("  " + p));
                return InkgateAdmin.ATTENTION;
            }
            w.println("The folder passes exam check. Read the prompts and rubric before you build a bundle.");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "export-pnp", mixinStandardHelpOptions = true,
            description = "Write one QTI 3.0 Personal Needs and Preferences document per roster candidate: extra time,"
                    + " large print, high contrast, and (with --assignment) the writing tools of each task the"
                    + " candidate sits.")
    static final class ExportPnp implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(paramLabel = "EXAM_DIR", description = "the exam source folder (holding exam.yaml)")
        Path folder;

        @Option(names = "--roster", required = true, paramLabel = "ROSTER.csv", description = "the roster")
        Path roster;

        @Option(names = "--assignment", paramLabel = "ASSIGNMENT.csv",
                description = "the forms assignment (from inkgate-admin forms), for each task's tools")
        Path assignment;

        @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the documents")
        Path out;

        @Override
        public Integer call() throws IOException {
            PrintWriter err = spec.commandLine().getErr();
            List<Problem> problems = new ArrayList<>();
            Optional<ExamSource> exam = ExamSourceReader.check(folder, problems);
            if (exam.isEmpty()) {
                err.println("inkgate-admin qti export-pnp: " + folder + " has problems; run inkgate-admin exam check "
                        + folder);
                problems.forEach(p -> err.println("  " + p));
                return InkgateAdmin.PROBLEMS;
            }
            try {
                var candidates = RosterReader.read(roster);
                Optional<Assignment> forms = assignment == null ? Optional.empty()
                        : Optional.of(AssignmentTable.read(assignment));
                List<Path> files = QtiPnp.write(exam.get(), candidates, forms, out);
                PrintWriter w = spec.commandLine().getOut();
                w.println("Wrote " + files.size() + " PNP documents into " + out + (forms.isEmpty()
                        ? " (accommodations only: give --assignment for each task's tools)" : "") + ".");
                w.println("They hold candidate numbers and accommodations: handle them under your data-protection rules.");
                return InkgateAdmin.OK;
            } catch (InvalidSourceException e) {
                err.println("inkgate-admin qti export-pnp: " + e.getMessage());
                return InkgateAdmin.PROBLEMS;
            }
        }
    }

    @Command(name = "import-pnp", mixinStandardHelpOptions = true,
            description = "Set the roster's extra time, large print and high contrast from QTI 3.0 PNP documents and"
                    + " write the result as a new roster; what a roster cannot hold is listed.")
    static final class ImportPnp implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(paramLabel = "PNP", description = "a folder of PNP documents (.xml) or one document")
        Path input;

        @Option(names = "--roster", required = true, paramLabel = "ROSTER.csv", description = "the roster to start from")
        Path roster;

        @Option(names = "--out", required = true, paramLabel = "NEW_ROSTER.csv",
                description = "the roster to write (a new file; the input roster is left as it is)")
        Path out;

        @Override
        public Integer call() throws IOException {
            PrintWriter err = spec.commandLine().getErr();
            if (Files.exists(out)) {
                err.println("inkgate-admin qti import-pnp: " + out + " exists; give a new file name (nothing is"
                        + " overwritten)");
                return InkgateAdmin.PROBLEMS;
            }
            try {
                QtiPnp.ImportReport read = QtiPnp.read(input);
                List<String> notes = new ArrayList<>(read.notes());
                notes.addAll(QtiPnp.mergeIntoRoster(roster, read, out));
                PrintWriter w = spec.commandLine().getOut();
                w.println("Read preferences of " + read.byCandidate().size() + " candidate(s); wrote " + out + ".");
                notes.forEach(n -> w.println("  - " + n));
                return notes.isEmpty() ? InkgateAdmin.OK : InkgateAdmin.ATTENTION;
            } catch (SafeXml.XmlRefusal | InvalidSourceException e) {
                err.println("inkgate-admin qti import-pnp: " + e.getMessage());
                err.println("Nothing was written.");
                return InkgateAdmin.PROBLEMS;
            }
        }
    }
}
