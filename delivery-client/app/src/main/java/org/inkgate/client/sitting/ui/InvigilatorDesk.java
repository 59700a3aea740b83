package org.inkgate.client.sitting.ui;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.ui.overlay.InvigilatorPanel;
import org.inkgate.client.sitting.ui.overlay.PausedCover;
import org.inkgate.client.sitting.ui.overlay.PinPrompt;

/**
 * The invigilator's side of the sitting window: the PIN prompt, the invigilator screen with its
 * actions, the pause cover over the candidate's screen, the list of focus losses and, apart from
 * it, the other things the invigilator must see (pauses, added time, downtime, saving trouble). What the actions do to the sitting is the flow's ({@link Host}).
 */
final class InvigilatorDesk {

    /** What the desk asks of the sitting flow. */
    interface Host {
        /** Checks the PIN (slow: PBKDF2); called off the JavaFX thread. */
        boolean pinMatches(char[] pin);

        /** One paragraph: candidate, form, task, time left, paused or running, or where the package went. */
        String stateLine();

        boolean paused();

        /** Where the sitting is, for the actions the screen offers. */
        InvigilatorPanel.Moment moment();

        void setPaused(boolean paused);

        void addMinutes(int minutes);

        void endTask();

        /** After the hand-in: a new sitting on this seat for the next candidate. */
        void nextCandidate();

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
    private final List<String> focusLines = new ArrayList<>();
    private final List<String> eventLines = new ArrayList<>();
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
            public void nextCandidate() {
                shell.uncover(panel);
                host.nextCandidate();
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
        focusLines.forEach(panel::focusEvent);
        eventLines.forEach(panel::sittingEvent);
        refresh();
        shell.cover(panel);
        panel.focus();
    }

    /** Brings the invigilator screen's state line and buttons up to date, when it is shown. */
    void refresh() {
        if (panel != null) {
            panel.update(host.stateLine(), host.moment(), host.paused());
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

    /** Adds a timed line to the focus list: the candidate's window lost or regained focus. */
    void focusNote(String what) {
        String line = timed(what);
        focusLines.add(line);
        if (panel != null) {
            panel.focusEvent(line);
        }
    }

    /** Adds a timed line to the sitting's other events (pause, added time, downtime, saving and hand-in trouble). */
    void eventNote(String what) {
        String line = timed(what);
        eventLines.add(line);
        if (panel != null) {
            panel.sittingEvent(line);
        }
    }

    private String timed(String what) {
        return CLOCK.format(clock.now()) + "  " + what;
    }

    /** Empties both lists: the next candidate's sitting starts with its own. */
    void clear() {
        focusLines.clear();
        eventLines.clear();
    }

    /** The focus list so far, oldest first. */
    List<String> focusLines() {
        return List.copyOf(focusLines);
    }

    /** The other events so far, oldest first. */
    List<String> eventLines() {
        return List.copyOf(eventLines);
    }

    /** True while the PIN prompt or the invigilator screen is up. */
    boolean showing() {
        return (pinPrompt != null && shell.covered(pinPrompt)) || (panel != null && shell.covered(panel));
    }
}
