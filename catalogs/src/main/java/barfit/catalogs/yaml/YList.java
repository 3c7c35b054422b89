package barfit.catalogs.yaml;

import java.util.List;

public record YList(List<YNode> items, Location location) implements YNode {
    public YList {
        items = List.copyOf(items);
    }

    @Override
    public String kind() {
        return "a list";
    }

    public int size() {
        return items.size();
    }

    public YNode get(int i) {
        return items.get(i);
    }
}
