package barfit.catalogs.yaml;

import barfit.catalogs.InputError;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads YAML into a tree of {@link YNode}s that remember line and column, using Jackson's streaming
 * YAML parser. Duplicate keys and syntax errors become one-line {@link InputError}s.
 */
public final class YamlReader {
    private static final YAMLFactory FACTORY = new YAMLFactory();

    private YamlReader() {
    }

    public static YNode read(Path path) {
        String name = path.toString();
        String text;
        try {
            text = Files.readString(path, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new InputError(Location.ofFile(name), "no such file; expected a YAML file");
        } catch (IOException e) {
            throw new InputError(Location.ofFile(name), "cannot be read (" + e.getClass().getSimpleName()
                    + "); expected a readable UTF-8 YAML file");
        }
        return read(text, name);
    }

    public static YNode read(String text, String fileName) {
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new InputError(new Location(fileName, 1, 1), "the file is empty; expected a YAML map");
            }
            YNode root = readValue(p, fileName);
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation loc = e.getLocation();
            Location where = loc == null ? Location.ofFile(fileName)
                    : new Location(fileName, Math.max(loc.getLineNr(), 1), Math.max(loc.getColumnNr(), 0));
            throw new InputError(where, "YAML syntax error: " + firstSentence(e.getOriginalMessage())
                    + "; expected valid YAML (check indentation, colons and quotes)");
        } catch (IOException e) {
            throw new InputError(Location.ofFile(fileName), "cannot be read: " + e.getMessage());
        }
    }

    private static YNode readValue(JsonParser p, String file) throws IOException {
        Location here = locationOf(p, file);
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT: {
                Map<String, YMap.Entry> entries = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    Location keyLoc = locationOf(p, file);
                    if (entries.containsKey(key)) {
                        throw new InputError(keyLoc, "key '" + key + "' is given twice (first at line "
                                + entries.get(key).keyLocation().line() + "); expected each key once");
                    }
                    p.nextToken();
                    entries.put(key, new YMap.Entry(key, keyLoc, readValue(p, file)));
                }
                return new YMap(entries, here);
            }
            case START_ARRAY: {
                List<YNode> items = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(readValue(p, file));
                }
                return new YList(items, here);
            }
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return new YScalar(p.getText(), true, false, false, here);
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new YScalar(p.getText(), false, true, false, here);
            case VALUE_NULL:
                return new YScalar("", false, false, true, here);
            case VALUE_STRING:
                return new YScalar(p.getText(), false, false, false, here);
            default:
                throw new InputError(here, "unexpected YAML content (" + t + "); expected a map, list or value");
        }
    }

    private static Location locationOf(JsonParser p, String file) {
        JsonLocation loc = p.currentTokenLocation();
        return new Location(file, Math.max(loc.getLineNr(), 1), Math.max(loc.getColumnNr(), 0));
    }

    private static String firstSentence(String message) {
        if (message == null || message.isBlank()) {
            return "the text is not valid YAML";
        }
        String oneLine = message.strip().replaceAll("\\s+", " ");
        int cut = oneLine.indexOf(" in 'reader'");
        if (cut > 0) {
            oneLine = oneLine.substring(0, cut);
        }
        cut = oneLine.indexOf(" in 'string'");
        if (cut > 0) {
            oneLine = oneLine.substring(0, cut);
        }
        return oneLine.length() > 160 ? oneLine.substring(0, 160) + "..." : oneLine;
    }
}
