package org.inkgate.client;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.nio.charset.StandardCharsets;
import java.util.Set;
import java.time.Instant;
import javafx.application.Application;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.EnrolmentExport;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.practice.ui.PracticeApp;
import org.inkgate.client.sitting.ui.SittingApp;

/**
 * The client's entry point. A plain class on purpose: a main class that extends Application
 * fails on a plain classpath ("JavaFX runtime components are missing"), so this one parses the
 * arguments and then launches the JavaFX application class.
 */
public final class Launcher {

    /** Where the build puts the demo practice bundle (invented content, signed with published demo keys). */
    static final String DEMO_BUNDLE = "/org/inkgate/client/demo/demo.inkexam";
    /** Where the build puts the demo's live-sitting bundle (same invented exam, demo PIN and roster). */
    static final String DEMO_SITTING_BUNDLE = "/org/inkgate/client/demo/demo-sitting.inkexam";
    /** The demo sitting's console note (PIN, candidate numbers), written by the build beside the bundle. */
    static final String DEMO_SITTING_NOTE = DEMO_SITTING_BUNDLE + ".note.txt";
    /**
     * Fingerprint of the published demo owner key (src/demo/keys, DEMO ONLY, NOT SECRET); the demo
     * sitting trusts it and nothing else. docs/formats.md quotes the same value.
     */
    static final String DEMO_OWNER_KEY = "ea65-29d8-0e73-07ce-4539-0272-4901-ddde";

    private static final int USAGE_ERROR = 2;

    private Launcher() {
    }

    public static void main(String[] args) {
        org.inkgate.packs.cli.QuietJdkLogging.install();
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
                case LaunchCommand.ShowVersion version -> {
                    for (String line : org.inkgate.packs.cli.ReleaseVersion.lines("inkgate-client")) {
                        System.out.println(line);
                    }
                }
                case LaunchCommand.PracticeDemo demo -> practise(demoBundleCopy());
                case LaunchCommand.PracticeFile file -> practise(file.bundle());
                case LaunchCommand.DemoSitting demo -> {
                    String note = demoNote();
                    System.out.println(note);
                    sit(copyResource(DEMO_SITTING_BUNDLE, "demo-sitting.inkexam"), Set.of(DEMO_OWNER_KEY),
                            demo.dataFolder(), note);
                }
                case LaunchCommand.ShowInstallation show -> showInstallation(show);
                case LaunchCommand.Sitting sitting -> sit(sitting.bundle(), sitting.ownerKeys(), sitting.dataFolder(), null);
            }
        } catch (CannotStart e) {
            System.err.println("inkgate-client: " + e.getMessage());
            System.exit(1);
        }
    }

    /**
     * Prints the fingerprint and writes the enrolment file; opens no window, so an invigilator can
     * run it on each machine before the exam day.
     */
    static void showInstallation(LaunchCommand.ShowInstallation show) throws CannotStart {
        ClientDataFolder data = show.dataFolder() == null ? ClientDataFolder.standard()
                : new ClientDataFolder(show.dataFolder().toAbsolutePath());
        InstallationKey key;
        try {
            key = InstallationKey.loadOrCreate(data);
        } catch (IOException | RuntimeException e) {
            throw new CannotStart("the installation key in " + data.root() + " cannot be read or made ("
                    + e.getMessage() + "). Use --data FOLDER on a writable disk, the same folder the sittings use.");
        }
        Path file;
        try {
            file = EnrolmentExport.write(key, show.seat(), show.outputFolder().toAbsolutePath(), Instant.now());
        } catch (IllegalArgumentException e) {
            throw new CannotStart("--seat: " + e.getMessage());
        } catch (IOException e) {
            throw new CannotStart("the enrolment file cannot be written to " + show.outputFolder().toAbsolutePath()
                    + " (" + e.getMessage() + "). Choose a writable folder with --out FOLDER.");
        }
        System.out.println("Installation fingerprint: " + key.fingerprint());
        System.out.println("Data folder: " + data.root());
        System.out.println("Enrolment file written: " + file);
        System.out.println("Hand this file to the test owner, who enrols it with  inkgate-admin installations enrol;"
                + " packages from this machine are then trusted when they are collected.");
    }

    private static void practise(Path bundle) {
        Application.launch(PracticeApp.class, "--" + PracticeApp.BUNDLE_PARAMETER + "=" + bundle.toAbsolutePath());
    }

    private static void sit(Path bundle, Set<String> ownerKeys, Path dataFolder, String demoNote) {
        Application.launch(SittingApp.class, SittingApp.arguments(bundle.toAbsolutePath(), ownerKeys,
                dataFolder == null ? null : dataFolder.toAbsolutePath(), demoNote).toArray(String[]::new));
    }

    /** The demo sitting's PIN and candidate numbers, as the build wrote them (DEMO ONLY, NOT SECRET). */
    static String demoNote() throws CannotStart {
        try (InputStream in = Launcher.class.getResourceAsStream(DEMO_SITTING_NOTE)) {
            if (in == null) {
                throw new CannotStart("the demo sitting is not in this build (" + DEMO_SITTING_NOTE
                        + "). Build the client with Maven, which writes it from delivery-client/app/src/demo.");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).strip();
        } catch (IOException e) {
            throw new CannotStart("could not read the demo sitting's note (" + e.getMessage() + ")");
        }
    }

    /**
     * Copies the embedded demo bundle to a private temporary file, because the bundle reader
     * reads files, not class path resources. The copy is deleted when the client exits.
     */
    static Path demoBundleCopy() throws CannotStart {
        return copyResource(DEMO_BUNDLE, "demo.inkexam");
    }

    private static Path copyResource(String resource, String fileName) throws CannotStart {
        try (InputStream in = Launcher.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new CannotStart("the demo bundle is not in this build (" + resource
                        + "). Build the client with Maven, which writes it from delivery-client/app/src/demo.");
            }
            Path folder = Files.createTempDirectory("inkgate-demo-");
            folder.toFile().deleteOnExit();
            Path copy = folder.resolve(fileName);
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
