package org.inkgate.format.response;

import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Arrays;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;

/**
 * An event's data as {@link EventLineReader} reads it: keys in ascending order with their values
 * in two arrays, read-only. It is equal to, hashes like and prints like the sorted, unmodifiable
 * map {@link ProcessEvent} otherwise makes of its data (the {@link AbstractMap} contracts), so
 * nothing that reads an event can tell the two apart. Why: building a tree map per event and
 * copying it into another was about an eighth of a collect's reading time (docs/benchmarks.md,
 * issue 16); this is made once, in the order the line gives, and kept as it is.
 */
final class EventData extends AbstractMap<String, Object> {

    private static final EventData EMPTY = new EventData(new String[0], new Object[0]);

    private final String[] keys;
    private final Object[] values;

    private EventData(String[] keys, Object[] values) {
        this.keys = keys;
        this.values = values;
    }

    /**
     * The data of {@code size} entries whose keys are in strictly ascending order (as the writer
     * writes them); null if they are not, and the caller builds a sorted map instead. The arrays are
     * copied, so the caller may reuse them.
     */
    static EventData ofSorted(String[] keys, Object[] values, int size) {
        if (size == 0) {
            return EMPTY;
        }
        for (int i = 1; i < size; i++) {
            if (keys[i - 1].compareTo(keys[i]) >= 0) {
                return null;
            }
        }
        return new EventData(Arrays.copyOf(keys, size), Arrays.copyOf(values, size));
    }

    /**
     * The data of {@code size} entries whose keys are those of {@code sorted}, an array of an earlier event's data
     * ({@link #keyArray}), so known to be strictly ascending: it is shared, and the values are copied.
     */
    static EventData withKeysOf(EventData sorted, Object[] values, int size) {
        if (sorted.keys.length != size) {
            throw new IllegalArgumentException(size + " values for " + sorted.keys.length + " keys");
        }
        return new EventData(sorted.keys, Arrays.copyOf(values, size));
    }

    /** The keys in order, shared: for readers in this package that compare whole key sets, never to change. */
    String[] keyArray() {
        return keys;
    }

    @Override
    public int size() {
        return keys.length;
    }

    @Override
    public Object get(Object key) {
        int i = index(key);
        return i >= 0 ? values[i] : null;
    }

    @Override
    public boolean containsKey(Object key) {
        return index(key) >= 0;
    }

    private int index(Object key) {
        return key instanceof String s ? Arrays.binarySearch(keys, s) : -1;
    }

    @Override
    public Set<Map.Entry<String, Object>> entrySet() {
        return new AbstractSet<>() {
            @Override
            public Iterator<Map.Entry<String, Object>> iterator() {
                return new Iterator<>() {
                    private int next;

                    @Override
                    public boolean hasNext() {
                        return next < keys.length;
                    }

                    @Override
                    public Map.Entry<String, Object> next() {
                        if (next >= keys.length) {
                            throw new NoSuchElementException();
                        }
                        int i = next++;
                        return new AbstractMap.SimpleImmutableEntry<>(keys[i], values[i]);
                    }
                };
            }

            @Override
            public int size() {
                return keys.length;
            }
        };
    }
}
