package barfit.catalogs;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** A named, ordered list of bar sizes (smallest first). */
public record BarCatalog(String id, String title, String source, List<BarSize> bars) {
    public BarCatalog {
        bars = List.copyOf(bars);
    }

    /** Finds a size by its designation; "#8", "No. 8", "no.8" and "8" all name size "8". */
    public Optional<BarSize> find(String designation) {
        String key = normalise(designation);
        return bars.stream().filter(b -> normalise(b.designation()).equals(key)).findFirst();
    }

    public List<String> designations() {
        return bars.stream().map(BarSize::designation).toList();
    }

    static String normalise(String s) {
        String t = s.strip().toLowerCase(Locale.ROOT).replace(" ", "");
        if (t.startsWith("#")) {
            t = t.substring(1);
        } else if (t.startsWith("no.")) {
            t = t.substring(3);
        } else if (t.startsWith("no")) {
            t = t.substring(2);
        }
        if (t.endsWith("mm")) {
            t = t.substring(0, t.length() - 2);
        }
        return t;
    }
}
