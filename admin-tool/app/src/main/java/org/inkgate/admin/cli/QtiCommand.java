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
import org.inkgate.admin.core.qti.PackageFiles;
import org.inkgate.admin.core.qti.QtiExamExport;
import org.inkgate.admin.core.qti.QtiExamImport;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
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
                + " package, import QTI 3.0 packages or QTI 2.2 items as a new exam source.",
        subcommands = {QtiCommand.ExportExam.class, QtiCommand.Import.class, CommandLine.HelpCommand.class})
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
}
