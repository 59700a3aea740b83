package org.inkgate.client;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.application.Application;
import org.inkgate.client.practice.ui.PracticeApp;

/**
 * The client's entry point. A plain class on purpose: a main class that extends Application
 * fails on a plain classpath ("JavaFX runtime components are missing"), so this one parses the
 * arguments and then launches the JavaFX application class.
 */
public final class Launcher {

    /** Where the build puts the demo practice bundle (invented content, signed with published demo keys). */
    static final String DEMO_BUNDLE = "/org/inkgate/client/demo/demo.inkexam";

    private static final int USAGE_ERROR = 2;

    private Launcher() {
    }

    public static void main(String[] args) {
        LaunchCommand command;
        try {
            command = LaunchCommand.parse(List.of(args));
        } catch (IllegalArgumentException e) {
            System.err.println("inkgate-client: " + e.getMessage());
            System.err.println();
            System.err.println(LaunchCommand.USAGE);
            System.exit(USAGE_ERROR);
            return;
        }
        try {
            switch (command) {
                case LaunchCommand.ShowHelp help -> System.out.println(LaunchCommand.USAGE);
                case LaunchCommand.PracticeDemo demo -> practise(demoBundleCopy());
                case LaunchCommand.PracticeFile file -> practise(file.bundle());
            }
        } catch (CannotStart e) {
            System.err.println("inkgate-client: " + e.getMessage());
            System.exit(1);
        }
    }

    private static void practise(Path bundle) {
        Application.launch(PracticeApp.class, "--" + PracticeApp.BUNDLE_PARAMETER + "=" + bundle.toAbsolutePath());
    }

    /**
     * Copies the embedded demo bundle to a private temporary file, because the bundle reader
     * reads files, not class path resources. The copy is deleted when the client exits.
     */
    static Path demoBundleCopy() throws CannotStart {
        try (InputStream in = Launcher.class.getResourceAsStream(DEMO_BUNDLE)) {
            if (in == null) {
                throw new CannotStart("the demo bundle is not in this build (" + DEMO_BUNDLE
                        + "). Build the client with Maven, which writes it from delivery-client/app/src/demo.");
            }
            Path folder = Files.createTempDirectory("inkgate-demo-");
            folder.toFile().deleteOnExit();
            Path copy = folder.resolve("demo.inkexam");
            copy.toFile().deleteOnExit();
            Files.copy(in, copy);
            return copy;
        } catch (IOException e) {
            throw new CannotStart("could not copy the demo bundle to a temporary folder (" + e.getMessage()
                    + "). Check that the temporary folder is writable.");
        }
    }

    /** The client cannot start; the message says why and what to do. */
    static final class CannotStart extends Exception {

        private static final long serialVersionUID = 1L;

        CannotStart(String message) {
            super(message);
        }
    }
}
