package org.inkgate.client.sitting.tools;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.spelling.EnglishVariant;

/** The live sitting's tools: the broker over the bundle's packs (kept for every candidate at the seat), one shelf per candidate. */
public final class BundleToolSupply implements ToolSupply {

    private final OpenedBundle bundle;
    private BundlePacks packs;
    private ToolShelf shelf;

    public BundleToolSupply(OpenedBundle bundle) {
        this.bundle = Objects.requireNonNull(bundle, "bundle");
    }

    @Override
    public synchronized CompletableFuture<Void> prepare(FormSpec form) throws IOException {
        if (shelf != null) {
            return shelf.allReady();
        }
        if (packs == null) {
            packs = new BundlePacks(bundle); // the bundle's packs serve every candidate at this seat
        }
        List<ToolShelf.Order> orders = new ArrayList<>();
        for (FormSlot slot : form.slots()) {
            TaskSpec task = bundle.manifest().task(slot.taskId()).orElseThrow();
            orders.add(new ToolShelf.Order(task.id(), slot.policy(), ExamWords.of(bundle.readText(task.promptFile()))));
        }
        shelf = new ToolShelf(packs.broker(), variant(), orders);
        return shelf.allReady();
    }

    private EnglishVariant variant() {
        try {
            return EnglishVariant.fromTag(bundle.manifest().language());
        } catch (IllegalArgumentException e) {
            // the checker is only built for tasks that allow it; a non-English exam offering it fails there, visibly
            return EnglishVariant.EN_GB;
        }
    }

    @Override
    public synchronized boolean started() {
        return shelf != null;
    }

    @Override
    public synchronized CompletableFuture<TaskTools> take(String taskId) {
        if (shelf == null) {
            throw new IllegalStateException("no tools were prepared yet (task \"" + taskId + "\")");
        }
        return shelf.take(taskId);
    }

    @Override
    public synchronized void clear() {
        if (shelf != null) {
            shelf.close();
            shelf = null;
        }
    }

    @Override
    public synchronized void close() {
        clear();
        try {
            if (packs != null) {
                packs.close();
            }
        } catch (IOException ignored) {
            // temporary folders only
        }
        packs = null;
    }
}
