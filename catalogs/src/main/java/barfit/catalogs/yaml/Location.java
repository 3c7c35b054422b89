package barfit.catalogs.yaml;

/** Where a value sits in a file: 1-based line and column; 0 when not known. */
public record Location(String file, int line, int column) {

    public static Location ofFile(String file) {
        return new Location(file, 0, 0);
    }

    @Override
    public String toString() {
        if (line <= 0) {
            return file;
        }
        return column > 0 ? file + ":" + line + ":" + column : file + ":" + line;
    }
}
