package org.inkgate.client.sitting.store;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.Set;
import java.util.TreeSet;
import org.inkgate.client.sitting.EventTypes;

/** The event types of {@link EventTypes}, read from its constants so the two never drift apart. */
public final class EventVocabulary {

    private static final Set<String> ALL = read();

    private EventVocabulary() {
    }

    /** Every type the log accepts, sorted. */
    public static Set<String> all() {
        return ALL;
    }

    /** Whether {@code type} is one of the fixed types. */
    public static boolean isKnown(String type) {
        return ALL.contains(type);
    }

    private static Set<String> read() {
        Set<String> types = new TreeSet<>();
        for (Field f : EventTypes.class.getDeclaredFields()) {
            int m = f.getModifiers();
            if (Modifier.isPublic(m) && Modifier.isStatic(m) && f.getType() == String.class) {
                try {
                    types.add((String) f.get(null));
                } catch (IllegalAccessException e) {
                    throw new IllegalStateException("EventTypes." + f.getName() + " is not readable", e);
                }
            }
        }
        return java.util.Collections.unmodifiableSet(types);
    }
}
