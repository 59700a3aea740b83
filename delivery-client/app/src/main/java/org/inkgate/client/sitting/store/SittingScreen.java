package org.inkgate.client.sitting.store;

import java.util.Arrays;

/**
 * The screens of a sitting that its log and database record ({@code nav.screen}, the
 * {@code sitting.screen} column), so recovery knows where the candidate was. A closed set: the
 * names written are these and no others. Defined in the store because the sitting core writes
 * them and recovery reads them back.
 */
public enum SittingScreen {
    /** Nothing shown yet since sign-in (the database's empty value). */
    START(""),
    INSTRUCTIONS("instructions"),
    QUESTIONNAIRE("questionnaire"),
    TASK("task"),
    REVIEW("review"),
    /** The invigilator exited without a hand-in: logged only, the sitting resumes where it was. */
    EXIT_BY_INVIGILATOR("exit-by-invigilator");

    private final String wireName;

    SittingScreen(String wireName) {
        this.wireName = wireName;
    }

    /** The name in the log's {@code nav.screen} events and the database. */
    public String wireName() {
        return wireName;
    }

    /** The screen a recorded name stands for; a name this build never writes reads as {@link #START}. */
    public static SittingScreen fromWire(String name) {
        return Arrays.stream(values()).filter(s -> s.wireName.equals(name)).findFirst().orElse(START);
    }
}
