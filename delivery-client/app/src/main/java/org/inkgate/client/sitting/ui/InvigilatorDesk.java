package org.inkgate.client.sitting.ui;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.inkgate.client.sitting.SittingClock;
import org.inkgate.client.sitting.ui.overlay.InvigilatorPanel;
import org.inkgate.client.sitting.ui.overlay.PausedCover;
import org.inkgate.client.sitting.ui.overlay.PinPrompt;

/**
 * The invigilator's side of the sitting window: the PIN prompt, the invigilator screen with its
 * actions, the pause cover over the candidate's screen, and the log of focus losses and other
 * things the invigilator must see. What the actions do to the sitting is the flow's ({@link Host}).
 */
final class InvigilatorDesk {

    /** What the desk asks of the sitting flow. */
    interface Host {
        /** Checks the PIN (slow: PBKDF2); called off the JavaFX thread. */
        boolean pinMatches(char[] pin);

        /** One paragraph: candidate, form, task, time left, paused or running. */
        String stateLine();

        boolean paused();

        boolean inTask();

        void setPaused(boolean paused);

        void addMinutes(int minutes);

        void endTask();

        void exit();

        /** Focus back to where the candidate was. */
        void backToCandidate();

        /** Runs slow work off the JavaFX thread and hands the result back on it. */
        <T> void work(Supplier<T> job, Consumer<T> then);
    }

    private static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm:ss").withZone(ZoneId.systemDefault());

    private final SittingShell shell;
    private final SittingClock clock;
    private final Host host;
    private final PausedCover pausedCover = new PausedCover();
    private final List<String> lines = new ArrayList<>();
    private PinPrompt pinPrompt;
    private InvigilatorPanel panel;

    InvigilatorDesk(SittingShell shell, SittingClock clock, Host host) {
        this.shell = Objects.requireNonNull(shell, "shell");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.host = Objects.requireNonNull(host, "host");
    }

    /** Shows the PIN prompt, unless it or the invigilator screen is already up. */
    void open() {
        if ((pinPrompt != null && shell.covered(pinPrompt)) || (panel != null && shell.covered(panel))) {
            return;
        }
        pinPrompt = new PinPrompt(this::checkPin, this::closePrompt);
        shell.cover(pinPrompt);
        pinPrompt.reset();
    }

    private void checkPin(char[] pin) {
        pinPrompt.busy();
        host.work(() -> host.pinMatches(pin), ok -> {
            if (!ok) {
                pinPrompt.wrong("That is not the invigilator PIN.");
                return;
            }
            shell.uncover(pinPrompt);
            showPanel();
        });
    }

    private void closePrompt() {
        shell.uncover(pinPrompt);
        host.backToCandidate();
    }

    private void showPanel() {
        panel = new InvigilatorPanel(new InvigilatorPanel.Actions() {
            @Override
            public void pauseOrResume() {
                host.setPaused(!host.paused());
                refresh();
            }

            @Override
            public void addMinutes(int minutes) {
                host.addMinutes(minutes);
                refresh();
            }

            @Override
            public void endTask() {
                shell.uncover(panel);
                host.endTask();
            }

            @Override
            public void exitSitting() {
                host.exit();
            }

            @Override
            public void close() {
                shell.uncover(panel);
                host.backToCandidate();
            }
        });
        lines.forEach(panel::focusEvent);
        refresh();
        shell.cover(panel);
        panel.focus();
    }

    /** Brings the invigilator screen's state line and buttons up to date, when it is shown. */
    void refresh() {
        if (panel != null) {
            panel.update(host.stateLine(), host.paused(), host.inTask());
        }
    }

    /** Covers or uncovers the candidate's screen with the pause notice, keeping the invigilator screen on top. */
    void coverPaused(boolean paused) {
        if (!paused) {
            shell.uncover(pausedCover);
            return;
        }
        shell.cover(pausedCover);
        if (panel != null && shell.covered(panel)) {
            shell.uncover(panel);
            shell.cover(panel);
        }
    }

    /** Adds a timed line to what the invigilator screen lists (focus changes, hand-in and saving trouble). */
    void note(String what) {
        String line = CLOCK.format(clock.now()) + "  " + what;
        lines.add(line);
        if (panel != null) {
            panel.focusEvent(line);
        }
    }

    /** The lines noted so far, oldest first. */
    List<String> lines() {
        return List.copyOf(lines);
    }

    /** True while the PIN prompt or the invigilator screen is up. */
    boolean showing() {
        return (pinPrompt != null && shell.covered(pinPrompt)) || (panel != null && shell.covered(panel));
    }
}
