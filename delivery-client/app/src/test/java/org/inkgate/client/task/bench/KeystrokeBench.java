package org.inkgate.client.task.bench;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.application.Platform;
import javafx.event.Event;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.stage.Stage;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.client.task.DisplaySettings;
import org.inkgate.client.task.TaskContext;
import org.inkgate.client.task.TaskWorkspace;
import org.inkgate.client.task.TaskWorkspaces;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.broker.PackCatalogue;
import org.inkgate.packs.broker.PackToolFactory;
import org.inkgate.packs.broker.ResourceBroker;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.EnglishVariant;

/**
 * Bench command (not a test): types an invented 600-word answer into a workspace with spelling
 * and grammar on (real LanguageTool, real packs), paced at 80 words per minute (5 characters a
 * word, the usual typing-speed convention: 400 characters a minute, one every 150 ms), under
 * Monocle headless. For each keystroke it measures, on the JavaFX thread:
 * <ul>
 * <li>handling: the KEY_PRESSED, KEY_TYPED and KEY_RELEASED events through the workspace
 * (editor, change log, word count, flag re-mapping);</li>
 * <li>latency: from the moment the key was due to the end of its handling, which includes any
 * wait behind other UI-thread work (applying check results, restyling underlines);</li>
 * <li>with layout: latency plus the next pulse's CSS and layout (Monocle's software renderer
 * is not a real screen, so painting is left out).</li>
 * </ul>
 * Before measuring, a warm-up paragraph is typed unpaced and deleted (so the JIT has compiled the
 * editor's paths, as any benchmark harness would), then the checker is given a second to settle.
 * Arguments: [words=600] [wpm=80] [mode=spelling-and-grammar|off]. Prints medians and p99 in ms.
 */
public final class KeystrokeBench {

    private static final String[] SENTENCES = {
        "The morning ferry leaves the harbour at seven and most of the village is on it.",
        "My neighbour runs the bakery by the quay and she depends on the early crossing.",
        "When the wind turns, the timetable changes and nobody knows when the boat will sail.",
        "I think the council should keep the old vessel for one more winter and repair the ramp.",
        "A bridge would be expensive, and the strait is deep, so I doubt it will ever be built.",
        "Last year the crossing was cancelled on twelve days, which is to many for the clinic.",
        "Children who go to school on the mainland need a relaible boat more than anyone else.",
        "The new timetable should be printed in large type and posted at the harbour office.",
        "If the fares rise again, families like mine will have to choose which trips they make.",
        "Please listen to the people who use the ferry every day before you decide anything.",
    };

    private KeystrokeBench() {
    }

    public static void main(String[] args) throws Exception {
        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        System.setProperty("java.awt.headless", "true");
        int words = args.length > 0 ? Integer.parseInt(args[0]) : 600;
        int wpm = args.length > 1 ? Integer.parseInt(args[1]) : 80;
        boolean checking = args.length < 3 || !args[2].equals("off");
        PrintStream out = System.out;

        String text = answer(words);
        long gapNanos = TimeUnit.MINUTES.toNanos(1) / (wpm * 5L);
        Path packs = Path.of(System.getProperty("inkgate.packs.dir", "../../resource-packs/target/packs"));
        Path work = Path.of(System.getProperty("inkgate.tmpdir", System.getProperty("java.io.tmpdir")));
        ResourcePolicy policy = new ResourcePolicy(checking ? SpellingMode.SPELLING_AND_GRAMMAR : SpellingMode.OFF, "demo-ferry-en-es", "wordnet-3.1-en", true, true,
                PastePolicy.WITHIN_RESPONSE);
        TaskTools tools = new ResourceBroker(new PackToolFactory(PackCatalogue.of(Map.of(
                "demo-ferry-en-es", packs.resolve("demo-ferry-en-es.inkpack"),
                "wordnet-3.1-en", packs.resolve("wordnet-3.1-en.inkpack"))), work, Clock.systemUTC()))
                .toolsFor(policy, EnglishVariant.EN_GB, List.of());
        long warm = System.nanoTime();
        if (checking) {
            tools.spelling().orElseThrow().warmUp().get(300, TimeUnit.SECONDS);
            out.printf(Locale.ROOT, "LanguageTool warm-up: %.1f s%n", (System.nanoTime() - warm) / 1e9);
        }

        CountDownLatch started = new CountDownLatch(1);
        Platform.startup(started::countDown);
        started.await();
        AtomicReference<TaskWorkspace> made = new AtomicReference<>();
        AtomicReference<Node> editor = new AtomicReference<>();
        AtomicReference<Scene> sceneRef = new AtomicReference<>();
        runAndWait(() -> {
            TaskSpec task = new TaskSpec("bench", "An invented task", "bench.md", 0, List.of(), new WordGuidance(500, 700));
            TaskWorkspace w = TaskWorkspaces.open(new TaskContext(task, "Write about the ferry (invented).", tools, ProcessLog.discarding(),
                    "", 0, DisplaySettings.standard()));
            Stage stage = new Stage();
            Scene scene = new Scene(w.view(), 1280, 800);
            stage.setScene(scene);
            stage.show();
            w.focusEditor();
            made.set(w);
            sceneRef.set(scene);
            editor.set(scene.getFocusOwner());
        });

        // JIT warm-up: a paragraph typed unpaced, then deleted
        String warmUp = answer(120);
        for (int k = 0; k < warmUp.length(); k++) {
            char c = warmUp.charAt(k);
            runAndWait(() -> type(editor.get(), c));
        }
        runAndWait(() -> {
            org.fxmisc.richtext.GenericStyledArea<?, ?, ?> area = (org.fxmisc.richtext.GenericStyledArea<?, ?, ?>) editor.get();
            area.replaceText(0, area.getLength(), "");
        });
        Thread.sleep(1000);

        int n = text.length();
        long[] handling = new long[n];
        long[] latency = new long[n];
        long[] withLayout = new long[n];
        long[] pending = new long[1];
        int[] current = {-1};
        Scene scene = sceneRef.get();
        runAndWait(() -> scene.addPostLayoutPulseListener(() -> {
            int k = current[0];
            if (k >= 0 && withLayout[k] == 0 && latency[k] != 0) {
                withLayout[k] = System.nanoTime() - pending[0];
            }
        }));

        long start = System.nanoTime();
        for (int k = 0; k < n; k++) {
            long due = start + k * gapNanos;
            long wait = due - System.nanoTime();
            if (wait > 0) {
                TimeUnit.NANOSECONDS.sleep(wait);
            }
            final int i = k;
            char c = text.charAt(k);
            Platform.runLater(() -> {
                current[0] = i;
                pending[0] = due;
                long t0 = System.nanoTime();
                type(editor.get(), c);
                long t1 = System.nanoTime();
                handling[i] = t1 - t0;
                latency[i] = t1 - due;
            });
        }
        runAndWait(() -> { });
        Thread.sleep(500);
        String typed = callAndWait(() -> made.get().text());
        if (!typed.equals(text)) {
            throw new IllegalStateException("the workspace holds " + typed.length() + " characters, " + n + " were typed");
        }
        long layoutMissing = Arrays.stream(withLayout).filter(v -> v == 0).count();
        out.printf(Locale.ROOT, "typed %d words (%d characters) at %d wpm, one key every %.0f ms, %s%n",
                words, n, wpm, gapNanos / 1e6, checking ? "spelling and grammar on" : "no checker (spelling off)");
        report(out, "handling", handling);
        report(out, "latency (due -> handled)", latency);
        report(out, "latency + CSS/layout pulse", Arrays.stream(withLayout).filter(v -> v > 0).toArray());
        out.printf(Locale.ROOT, "keys whose pulse was shared with the next key (no own layout figure): %d%n", layoutMissing);
        reportHeap(out);
        runAndWait(() -> made.get().close());
        Platform.exit();
    }

    /**
     * The heap figure for a sitting with all tools: the largest heap the JVM may take (the
     * profile sets -Xmx), the peak the heap pools reached while typing, and what is still live
     * after a full collection with every tool open.
     */
    private static void reportHeap(PrintStream out) {
        long peak = 0;
        for (java.lang.management.MemoryPoolMXBean pool : java.lang.management.ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == java.lang.management.MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        for (int i = 0; i < 3; i++) {
            System.gc();
        }
        Runtime rt = Runtime.getRuntime();
        long live = rt.totalMemory() - rt.freeMemory();
        out.printf(Locale.ROOT, "heap: max %d MiB, peak of the heap pools %d MiB, live after full GC %d MiB (all tools open)%n",
                rt.maxMemory() >> 20, peak >> 20, live >> 20);
    }

    private static void type(Node target, char c) {
        if (c == '\n') {
            Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_PRESSED, "", "", KeyCode.ENTER, false, false, false, false));
            Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_RELEASED, "", "", KeyCode.ENTER, false, false, false, false));
            return;
        }
        KeyCode code = c == ' ' ? KeyCode.SPACE : KeyCode.UNDEFINED;
        String s = String.valueOf(c);
        Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_PRESSED, "", "", code, false, false, false, false));
        Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_TYPED, s, "", KeyCode.UNDEFINED, false, false, false, false));
        Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_RELEASED, "", "", code, false, false, false, false));
    }

    static String answer(int words) {
        StringBuilder b = new StringBuilder();
        int count = 0;
        for (int s = 0; count < words; s++) {
            String sentence = SENTENCES[s % SENTENCES.length];
            for (String w : sentence.split(" ")) {
                if (count == words) {
                    break;
                }
                if (!b.isEmpty()) {
                    b.append(s % 4 == 0 && sentence.startsWith(w) && count > 0 ? "\n" : " ");
                }
                b.append(w);
                count++;
            }
        }
        return b.toString();
    }

    private static void report(PrintStream out, String what, long[] nanos) {
        long[] sorted = nanos.clone();
        Arrays.sort(sorted);
        out.printf(Locale.ROOT, "%-30s median %.3f ms   p99 %.3f ms   max %.3f ms   (n=%d)%n", what,
                at(sorted, 0.50) / 1e6, at(sorted, 0.99) / 1e6, sorted[sorted.length - 1] / 1e6, sorted.length);
    }

    /** Nearest-rank percentile. */
    private static long at(long[] sorted, double q) {
        int rank = (int) Math.ceil(q * sorted.length);
        return sorted[Math.max(0, rank - 1)];
    }

    private static void runAndWait(Runnable r) throws InterruptedException {
        callAndWait(() -> {
            r.run();
            return null;
        });
    }

    private static <T> T callAndWait(java.util.concurrent.Callable<T> c) throws InterruptedException {
        CountDownLatch done = new CountDownLatch(1);
        AtomicReference<T> value = new AtomicReference<>();
        AtomicReference<Exception> failed = new AtomicReference<>();
        Platform.runLater(() -> {
            try {
                value.set(c.call());
            } catch (Exception e) {
                failed.set(e);
            } finally {
                done.countDown();
            }
        });
        done.await();
        if (failed.get() != null) {
            throw new IllegalStateException(failed.get());
        }
        return value.get();
    }
}
