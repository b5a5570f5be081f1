package dev.proofrun.stats;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * The last results of a computation that depends on its key alone (its random draws come from fixed seeds), so that
 * asking again costs nothing: past {@code limit} results the least recently used one is dropped, so a run of edits
 * keeps what it returns to. Safe to share between threads; two threads that miss the same key at once both compute
 * it and get equal results. A computation that throws keeps nothing.
 *
 * @param <K> the key: a value with {@code equals} and {@code hashCode} over everything the result depends on
 * @param <V> the result, never null; shared, so never changed once made
 */
public final class RecentResults<K, V> {

    private final Map<K, V> kept;

    /** Keeps at most {@code limit} results (at least 1). */
    public RecentResults(int limit) {
        if (limit < 1) {
            throw new IllegalArgumentException("keep at least one result: " + limit);
        }
        this.kept = Collections.synchronizedMap(new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<K, V> eldest) {
                return size() > limit;
            }
        });
    }

    /** The result kept for {@code key}, or the one {@code compute} makes now (and keeps). */
    public V get(K key, Function<? super K, ? extends V> compute) {
        V found = kept.get(key);
        if (found != null) {
            return found;
        }
        V made = compute.apply(key);
        if (made == null) {
            throw new IllegalStateException("no result for " + key);
        }
        kept.put(key, made);
        return made;
    }

    /** How many results are kept now. */
    public int size() {
        return kept.size();
    }
}
