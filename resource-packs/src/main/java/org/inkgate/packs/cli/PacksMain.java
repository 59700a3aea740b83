package org.inkgate.packs.cli;

/** Entry point of the stand-alone pack command line: the arguments are those of {@code pack}, e.g. {@code verify x.inkpack}. */
public final class PacksMain {
    private PacksMain() {
    }

    public static void main(String[] args) {
        QuietJdkLogging.install();
        System.exit(PackCommand.commandLine().execute(args));
    }
}
