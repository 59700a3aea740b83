package org.inkgate.client.practice;

import java.util.Objects;

/** The outcome of opening a bundle for practice: the whole exam, or only the reason it was refused. */
public sealed interface PracticeLoad {

    /** The bundle passed every check and was read whole. */
    record Opened(PracticeExam exam) implements PracticeLoad {
        public Opened {
            Objects.requireNonNull(exam, "exam");
        }
    }

    /** The bundle was refused; nothing of it is kept, only the message saying why and what to do. */
    record Refused(String message) implements PracticeLoad {
        public Refused {
            Objects.requireNonNull(message, "message");
        }
    }
}
