package org.inkgate.client.sitting.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import javafx.application.Application;
import javafx.stage.Stage;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;

/**
 * The live sitting as a JavaFX application. Started by {@link org.inkgate.client.Launcher}
 * (never as a main class itself) with the named parameters of {@link #arguments}.
 */
public final class SittingApp extends Application {

    static final String BUNDLE = "bundle";
    static final String OWNER_KEYS = "owner-keys";
    static final String DATA = "data";
    static final String DEMO = "demo";

    private SittingLoad load;
    private SittingFlow flow;

    /**
     * The application's parameters for a bundle, the trusted owner keys, a data folder (or null) and,
     * for the demo sitting only, its published note (PIN, candidate numbers) to show at set-up.
     */
    public static List<String> arguments(Path bundle, Set<String> ownerKeys, Path dataFolder, String demoNote) {
        List<String> args = new ArrayList<>();
        args.add("--" + BUNDLE + "=" + bundle);
        args.add("--" + OWNER_KEYS + "=" + String.join(",", ownerKeys));
        if (dataFolder != null) {
            args.add("--" + DATA + "=" + dataFolder);
        }
        if (demoNote != null) {
            args.add("--" + DEMO + "=" + demoNote);
        }
        return args;
    }

    /** Opens and verifies the bundle on the launcher thread, before any window exists. */
    @Override
    public void init() {
        Map<String, String> named = getParameters().getNamed();
        String bundle = named.get(BUNDLE);
        Set<String> keys = Arrays.stream(named.getOrDefault(OWNER_KEYS, "").split(","))
                .map(String::strip).filter(s -> !s.isEmpty()).collect(Collectors.toSet());
        if (bundle == null || keys.isEmpty()) {
            load = new SittingLoad.Refused("No exam bundle or owner key was named. Start the sitting through the"
                    + " Inkgate launcher: --sitting FILE.inkexam --owner-key FINGERPRINT.");
        } else {
            load = new SittingBundleOpener(keys).open(Path.of(bundle));
        }
        if (load instanceof SittingLoad.Refused refused) {
            System.err.println("Inkgate sitting: bundle not opened: " + refused.message());
        }
    }

    @Override
    public void start(Stage stage) {
        Map<String, String> named = getParameters().getNamed();
        String data = named.get(DATA);
        String demo = named.get(DEMO);
        String bundle = named.get(BUNDLE);
        flow = new SittingFlow(stage, new SittingFlow.Setup(load, bundle == null ? null : Path.of(bundle),
                data == null ? null : Path.of(data), Workspaces.standard(), SittingClock.system(), demo, true, null));
        flow.start();
    }

    @Override
    public void stop() {
        if (flow != null) {
            flow.closeQuietly();
        }
    }
}
