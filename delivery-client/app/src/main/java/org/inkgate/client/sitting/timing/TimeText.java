package org.inkgate.client.sitting.timing;

/** Time left as the candidate reads it on screen and hears it from a screen reader. */
public final class TimeText {

    private TimeText() {
    }

    /** "12:05" (minutes:seconds), or "1:02:05" past an hour; rounded up, so 0:00 means the time is over. */
    public static String clock(long millis) {
        long seconds = (Math.max(0, millis) + 999) / 1000;
        long h = seconds / 3600;
        long m = (seconds % 3600) / 60;
        long s = seconds % 60;
        return h > 0 ? String.format(java.util.Locale.ROOT, "%d:%02d:%02d", h, m, s) : String.format(java.util.Locale.ROOT, "%d:%02d", m, s);
    }

    /** "12 minutes left", "1 minute left", "less than a minute left": whole minutes, for speech. */
    public static String spoken(long millis) {
        long minutes = Math.max(0, millis) / 60_000;
        if (minutes == 0) {
            return millis > 0 ? "Less than a minute left" : "No time left";
        }
        return minutes + (minutes == 1 ? " minute left" : " minutes left");
    }

    /** "1 hour 5 minutes", "3 minutes", "40 seconds": a duration for the invigilator. */
    public static String duration(long millis) {
        long seconds = Math.max(0, millis) / 1000;
        if (seconds < 60) {
            return seconds + (seconds == 1 ? " second" : " seconds");
        }
        long minutes = seconds / 60;
        long hours = minutes / 60;
        minutes %= 60;
        String m = minutes + (minutes == 1 ? " minute" : " minutes");
        return hours == 0 ? m : hours + (hours == 1 ? " hour " : " hours ") + m;
    }
}
