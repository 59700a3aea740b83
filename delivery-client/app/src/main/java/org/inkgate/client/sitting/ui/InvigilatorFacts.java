package org.inkgate.client.sitting.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.course.FlowScreen;
import org.inkgate.client.sitting.course.HandedIn;
import org.inkgate.client.sitting.course.SittingCourse;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.SittingScreen;
import org.inkgate.client.sitting.timing.TimeText;
import org.inkgate.client.sitting.ui.overlay.InvigilatorPanel;
import org.inkgate.format.bundle.BundleManifest;

/**
 * What the invigilator's screens state about the sitting, read from the course: the state line and
 * the moment (which actions make sense) of the invigilator screen, and the facts of the recovery
 * screen. Words only, no controls, so they can be read and checked apart from the window.
 */
final class InvigilatorFacts {

    private InvigilatorFacts() {
    }

    /** Where the sitting is, as far as the invigilator's actions go. */
    static InvigilatorPanel.Moment moment(SittingCourse course) {
        if (course == null || course.plan().isEmpty()) {
            return InvigilatorPanel.Moment.NO_CANDIDATE;
        }
        return switch (course.screen()) {
            case TASK -> InvigilatorPanel.Moment.IN_TASK;
            case SUBMIT -> InvigilatorPanel.Moment.HANDING_IN;
            case FINISHED -> InvigilatorPanel.Moment.HANDED_IN;
            case NONE, REFUSED, RECOVERY, SETUP, SIGN_IN, INSTRUCTIONS, QUESTIONNAIRE, REVIEW ->
                InvigilatorPanel.Moment.AT_WORK;
        };
    }

    /** The invigilator screen's state line: who, where in the sitting, and whether it runs or is paused. */
    static String state(SittingCourse course) {
        Optional<SittingPlan> candidate = course == null ? Optional.empty() : course.plan();
        boolean paused = course != null && course.paused();
        if (candidate.isEmpty()) {
            return paused ? "No candidate has signed in yet. The exam is PAUSED." : "No candidate has signed in yet.";
        }
        SittingPlan plan = candidate.get();
        String who = "Candidate " + plan.candidateNumber() + ", form " + plan.formId();
        Optional<HandedIn> handedIn = course.handedIn();
        if (course.screen() == FlowScreen.FINISHED && handedIn.isPresent()) {
            return who + ": the answers were handed in at " + SittingCourse.CLOCK.format(handedIn.get().at())
                    + ". The response package is written to " + handedIn.get().delivered() + "; a copy is kept at "
                    + handedIn.get().localCopy() + ". This candidate's sitting is over.";
        }
        if (course.screen() == FlowScreen.SUBMIT) {
            return who + ": the answers are handed in and saved on this machine, but the response package is not yet"
                    + " written to the output folder " + course.outputFolder() + ". The candidate's screen says what is"
                    + " wrong and offers to try again.";
        }
        StringBuilder state = new StringBuilder(who);
        if (plan.extraTimePercent() > 0) {
            state.append(", ").append(plan.extraTimePercent()).append("% extra time (roster)");
        }
        state.append(". ");
        int index = course.taskIndex();
        if (index >= 0) {
            state.append("Task ").append(index + 1).append(" of ").append(plan.form().slots().size()).append(": ")
                    .append(course.currentTaskTitle()).append(", ")
                    .append(course.timeLeft().map(d -> TimeText.duration(d.toMillis()) + " left").orElse("untimed"))
                    .append(". ");
        } else {
            state.append("Screen: ").append(course.screen().name().toLowerCase(Locale.ROOT).replace('_', ' ')).append(". ");
        }
        state.append(paused ? "The exam is PAUSED." : "The exam is running.");
        return state.toString();
    }

    /** What the recovery screen states about an unfinished sitting found at start, down for {@code down}. */
    static List<String> recovery(UnfinishedSitting found, java.time.Duration down, BundleManifest manifest) {
        List<String> facts = new ArrayList<>();
        facts.add("Candidate: " + found.candidateNumber() + ", form " + found.formId());
        facts.add("On screen when it stopped: " + found.currentTask().flatMap(id -> manifest.task(id))
                .map(t -> "the task \"" + t.title() + "\"").orElse(found.screen() == SittingScreen.START ? "the start" : "the "
                        + found.screen().wireName() + " screen"));
        facts.add("Last saved: " + SittingCourse.CLOCK.format(found.lastActivity()) + ", "
                + TimeText.duration(down.toMillis()) + " ago (measured on the system clock, so a changed clock distorts it)");
        if (found.paused()) {
            facts.add("The exam was paused by the invigilator when it stopped; it continues paused.");
        }
        if (found.stage() == UnfinishedSitting.Stage.AWAITING_DELIVERY) {
            facts.add("The answers were handed in and saved on this machine, but not yet written to the output folder.");
        }
        return facts;
    }
}
