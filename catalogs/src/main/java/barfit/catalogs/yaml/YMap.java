package barfit.catalogs.yaml;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

/** A YAML mapping in the order written; each key keeps where it was written. */
public final class YMap implements YNode {
    /** A key with its value and where the key itself stands. */
    public record Entry(String key, Location keyLocation, YNode value) {}

    private final Map<String, Entry> entries;
    private final Location location;

    public YMap(Map<String, Entry> entries, Location location) {
        this.entries = Collections.unmodifiableMap(new LinkedHashMap<>(entries));
        this.location = location;
    }

    @Override
    public Location location() {
        return location;
    }

    @Override
    public String kind() {
        return "a map";
    }

    public Set<String> keys() {
        return entries.keySet();
    }

    public Entry entry(String key) {
        return entries.get(key);
    }

    public YNode get(String key) {
        Entry e = entries.get(key);
        return e == null ? null : e.value();
    }

    public boolean has(String key) {
        return entries.containsKey(key);
    }

    public Iterable<Entry> entries() {
        return entries.values();
    }
}
