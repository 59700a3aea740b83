package org.inkgate.client.sitting.ui.bench;

import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javafx.application.Platform;
import javafx.scene.Node;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.TextInputControl;
import javafx.stage.Stage;
import org.inkgate.client.demo.DemoSittingBuild;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.ui.SittingFlow;
import org.inkgate.client.sitting.ui.Workspaces;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hex;

/**
 * Bench command (not a test): how long the real sitting takes to become usable on the demo
 * sitting bundle, with the real task workspace and writing tools, under Monocle headless. Each
 * run is a fresh data folder and window in the same JVM; the first run is reported apart, since
 * it also pays for class loading (the cost a freshly started client pays). Measured per run:
 * <ul>
 * <li>open: verifying and unpacking the bundle (what the launcher does before the window);</li>
 * <li>window: from the flow's start to the set-up screen shown;</li>
 * <li>begin to typable: from "Begin the first task", pressed the moment the instructions appear
 * (the worst case: the spelling engine has had no time to warm up), to the answer editor
 * focused and editable.</li>
 * </ul>
 * Human steps (typing the PIN, the candidate number) are not timed; PBKDF2 for the PIN check is
 * measured in docs/benchmarks.md's format section. Arguments: [runs=5]. Run from the module folder.
 */
public final class SittingStartBench {

    private SittingStartBench() {
    }

    public static void main(String[] args) throws Exception {
        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        System.setProperty("java.awt.headless", "true");
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        PrintStream out = System.out;
        Path work = Files.createTempDirectory("inkgate-start-bench-");
        Path source = Path.of("src", "demo");
        Path bundle = work.resolve("demo-sitting.inkexam");
        DemoSittingBuild.build(source, bundle);
        String pin = DemoSittingBuild.readSitting(source).invigilatorPin();
        String ownerKey = Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(Ed25519.privateFromSeed(Hex.parse(
                Files.readString(source.resolve("keys/demo-only-not-secret-owner-signing.ed25519-seed.hex")).strip())))));
        CompletableFuture<Void> started = new CompletableFuture<>();
        Platform.startup(() -> started.complete(null));
        started.get(30, TimeUnit.SECONDS);
        Platform.setImplicitExit(false);

        List<double[]> results = new ArrayList<>();
        for (int run = 0; run < runs; run++) {
            results.add(once(bundle, ownerKey, pin, work.resolve("data-" + run), work.resolve("out-" + run)));
            double[] r = results.getLast();
            out.printf(Locale.ROOT, "run %d: open %.0f ms, window %.0f ms, begin to typable %.0f ms%n", run + 1, r[0], r[1], r[2]);
        }
        out.printf(Locale.ROOT, "first run: open %.0f ms, window %.0f ms, begin to typable %.0f ms%n",
                results.getFirst()[0], results.getFirst()[1], results.getFirst()[2]);
        if (runs > 1) {
            List<double[]> later = results.subList(1, results.size());
            out.printf(Locale.ROOT, "median of runs 2-%d: open %.0f ms, window %.0f ms, begin to typable %.0f ms%n", runs,
                    median(later, 0), median(later, 1), median(later, 2));
        }
        Platform.exit();
        System.exit(0);
    }

    static {
        // a failed run must end the process, not leave the JavaFX thread holding it open
        Thread.setDefaultUncaughtExceptionHandler((t, e) -> {
            e.printStackTrace();
            System.exit(1);
        });
    }

    private static double[] once(Path bundle, String ownerKey, String pin, Path data, Path output) throws Exception {
        long t0 = System.nanoTime();
        SittingLoad load = new SittingBundleOpener(Set.of(ownerKey)).open(bundle);
        long t1 = System.nanoTime();
        if (load instanceof SittingLoad.Refused refused) {
            throw new IllegalStateException(refused.message());
        }
        Stage stage = fx(Stage::new);
        watched = stage;
        SittingFlow flow = fx(() -> {
            SittingFlow f = new SittingFlow(stage, new SittingFlow.Setup(load, bundle, data, Workspaces.standard(),
                    SittingClock.system(), null, false, () -> { }));
            f.start();
            return f;
        });
        long windowStart = t1;
        await(stage, "setupPin");
        long t2 = System.nanoTime();
        set(stage, "setupPin", pin);
        set(stage, "setupOutput", output.toString());
        press(stage, "setupContinue");
        await(stage, "candidateNumber");
        set(stage, "candidateNumber", "D1001");
        press(stage, "signInButton");
        await(stage, "startButton");
        long t3 = System.nanoTime();
        press(stage, "startButton");
        waitFor(() -> fxQuiet(() -> {
            // the focus owner, not isFocused(): a headless window may never be the focused window
            Node answer = stage.getScene().lookup("#answer");
            return answer != null && stage.getScene().getFocusOwner() == answer && !answer.isDisabled();
        }));
        long t4 = System.nanoTime();
        fx(() -> {
            flow.closeQuietly();
            stage.close();
            return null;
        });
        return new double[] {(t1 - t0) / 1e6, (t2 - windowStart) / 1e6, (t4 - t3) / 1e6};
    }

    private static void await(Stage stage, String id) throws Exception {
        waitFor(() -> fxQuiet(() -> stage.getScene() != null && stage.getScene().lookup("#" + id) != null
                && stage.getScene().lookup("#" + id).isVisible()));
    }

    private static void set(Stage stage, String id, String text) throws Exception {
        fx(() -> {
            ((TextInputControl) stage.getScene().lookup("#" + id)).setText(text);
            return null;
        });
    }

    private static void press(Stage stage, String id) throws Exception {
        fx(() -> {
            ((ButtonBase) stage.getScene().lookup("#" + id)).fire();
            return null;
        });
    }

    private static Stage watched;

    private static void waitFor(BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > deadline) {
                String owner = fxQuietText(() -> String.valueOf(watched.getScene().getFocusOwner()));
                throw new IllegalStateException("the sitting did not reach the expected screen within 120 s; focus is on "
                        + owner);
            }
            Thread.sleep(2);
        }
    }

    private static String fxQuietText(Callable<String> text) {
        try {
            return fx(text);
        } catch (Exception e) {
            return "(unknown: " + e + ")";
        }
    }

    private static boolean fxQuiet(Callable<Boolean> check) {
        try {
            return fx(check);
        } catch (Exception e) {
            return false;
        }
    }

    private static <T> T fx(Callable<T> job) throws Exception {
        CompletableFuture<T> result = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                result.complete(job.call());
            } catch (Throwable t) {
                result.completeExceptionally(t);
            }
        });
        return result.get(60, TimeUnit.SECONDS);
    }

    private static double median(List<double[]> rows, int column) {
        double[] values = rows.stream().mapToDouble(r -> r[column]).sorted().toArray();
        int n = values.length;
        return n % 2 == 1 ? values[n / 2] : (values[n / 2 - 1] + values[n / 2]) / 2;
    }
}
