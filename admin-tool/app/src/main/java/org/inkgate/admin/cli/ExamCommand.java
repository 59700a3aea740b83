package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.Problem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code exam check}: checks a whole exam source folder and lists every problem. */
@Command(name = "exam", description = "Work with exam source folders.", subcommands = ExamCommand.Check.class)
final class ExamCommand {

    @Command(name = "check", description = "Check an exam source folder; every problem is listed with file, line and field.")
    static final class Check implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(paramLabel = "EXAM_DIR", description = "the exam source folder (holding exam.yaml)")
        Path folder;

        @Override
        public Integer call() {
            List<Problem> problems = new ArrayList<>();
            Optional<ExamSource> exam = ExamSourceReader.check(folder, problems);
            PrintWriter out = spec.commandLine().getOut();
            if (!problems.isEmpty()) {
                PrintWriter err = spec.commandLine().getErr();
                err.println(folder + ": " + problems.size() + " problem" + (problems.size() == 1 ? "" : "s")
                        + " (paths are relative to the folder):");
                problems.forEach(p -> err.println("  " + p));
                return InkgateAdmin.PROBLEMS;
            }
            ExamSource e = exam.orElseThrow();
            out.println(folder + ": no problems found.");
            out.println("  exam " + e.examId() + " \"" + e.title() + "\" (" + e.language() + ")"
                    + (e.practice() ? ", practice" : ""));
            out.println("  " + e.tasks().size() + " tasks, " + e.conditions().size() + " conditions, "
                    + FormDesigner.forms(e).size() + " forms (" + e.design().kind().word() + "), "
                    + e.packs().size() + " packs, " + (e.rubric() == null ? "no rubric" : e.rubric().criteria().size()
                    + " rubric criteria"));
            return InkgateAdmin.OK;
        }
    }
}
