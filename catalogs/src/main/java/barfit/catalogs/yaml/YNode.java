package barfit.catalogs.yaml;

/** A YAML value that remembers where it was written, so every complaint can point at it. */
public sealed interface YNode permits YMap, YList, YScalar {
    Location location();

    /** What the node is, in words for an error message: "a map", "a list", "a number"... */
    String kind();
}
