package org.inkgate.admin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import javafx.application.Application;
import org.inkgate.admin.core.bundling.PreviewBundle;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.gui.preview.PreviewApp;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code preview}: builds a practice bundle of one task under one condition's policy in a private
 * temporary folder and opens the client's practice window on it, marked as a preview.
 */
@Command(name = "preview", description = "Open one task of an exam source in the client's practice window, under one"
        + " condition's resource policy. A preview for the test owner, not a locked sitting.")
final class PreviewCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "EXAM_DIR", description = "the exam source folder")
    Path folder;

    @Option(names = "--task", required = true, paramLabel = "T", description = "the task id to preview")
    String task;

    @Option(names = "--condition", paramLabel = "C", description = "the condition whose policy applies (default: the"
            + " first condition of exam.yaml)")
    String condition;

    @Option(names = "--write-only", paramLabel = "FILE", description = "write the preview bundle here and open no window")
    Path writeOnly;

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        ExamSource exam;
        Path temp = null;
        try {
            exam = ExamSourceReader.read(folder);
            Path out = writeOnly;
            if (out == null) {
                // createTempDirectory makes the folder readable by this user only (POSIX)
                temp = Files.createTempDirectory("inkgate-preview-");
                out = temp.resolve("preview.inkexam");
                // also when the program is stopped rather than the window closed (deleted in reverse order)
                temp.toFile().deleteOnExit();
                out.toFile().deleteOnExit();
            }
            PreviewBundle.Built built = PreviewBundle.build(exam, task, condition, out);
            w.println("Preview of task " + built.task().id() + " under condition " + built.condition().id()
                    + " (a practice bundle signed with a throw-away key; not a locked sitting).");
            if (writeOnly != null) {
                w.println("Preview bundle written: " + out + " (open it with the client's --practice FILE)");
                return InkgateAdmin.OK;
            }
            w.println("Opening the practice window; close it to finish.");
            w.flush();
            Application.launch(PreviewApp.class, "--bundle=" + out.toAbsolutePath(), "--task=" + built.task().id(),
                    "--condition=" + built.condition().id());
            return InkgateAdmin.OK;
        } catch (InvalidSourceException e) {
            spec.commandLine().getErr().println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        } finally {
            if (temp != null) {
                deleteQuietly(temp);
            }
        }
    }

    private static void deleteQuietly(Path folder) {
        try (Stream<Path> walk = Files.walk(folder)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // the folder is private and under the temporary folder; the system clears it in time
        }
    }
}
