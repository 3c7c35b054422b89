package barfit.catalogs.yaml;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.InputFiles;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;

/**
 * Reads YAML into a tree of {@link YNode}s that remember line and column, using Jackson's streaming
 * YAML parser. One document per file, at most {@link InputFiles#YAML_MAX_BYTES} long and
 * {@link #MAX_NESTING} levels deep. Duplicate keys and syntax errors become one-line {@link InputError}s
 * at the line and column where the problem is.
 */
public final class YamlReader {
    /** Maps and lists inside each other; a barfit input needs five levels. */
    public static final int MAX_NESTING = 50;
    /** YAML's own limit on an implicit key, in characters (YAML 1.1, 7.4.2 "simple keys"). */
    private static final int SIMPLE_KEY_MAX = 1024;

    static final String TOO_LARGE_ADVICE = "expected a smaller file: split the beams over several files, or give a "
            + "schedule's beams in a CSV file (--beams)";
    private static final YAMLFactory FACTORY;

    static {
        LoaderOptions options = new LoaderOptions();
        // the file's size is checked before parsing, with a message that says what to do
        options.setCodePointLimit((int) InputFiles.YAML_MAX_BYTES + 1);
        FACTORY = YAMLFactory.builder().loaderOptions(options).build();
    }

    private YamlReader() {}

    public static YNode read(Path path) {
        String text = InputFiles.readText(path, "a YAML file", InputFiles.YAML_MAX_BYTES, TOO_LARGE_ADVICE);
        return read(text, path.toString());
    }

    public static YNode read(String text, String fileName) {
        requirePrintable(text, fileName);
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new InputError(new Location(fileName, 1, 1), "the file is empty; expected a YAML map");
            }
            YNode root = readValue(p, fileName, 1);
            if (p.nextToken() != null) {
                Location next = locationOf(p, fileName);
                int marker = documentMarkerBefore(text, next.line());
                throw new InputError(
                        marker > 0 ? new Location(fileName, marker, 1) : next,
                        "a second YAML document "
                                + "after the first; expected one document per file (remove the '---' or '...' line and what "
                                + "follows, or merge it into the first)");
            }
            return root;
        } catch (StreamConstraintsException e) {
            throw new InputError(
                    Location.ofFile(fileName),
                    "the YAML is nested too deeply or holds too long a value "
                            + "for the reader; expected a barfit input (maps and lists at most " + MAX_NESTING
                            + " deep)");
        } catch (JsonProcessingException e) {
            throw syntaxError(e, text, fileName);
        } catch (IOException e) {
            throw new InputError(
                    Location.ofFile(fileName), "cannot be read: " + Echo.cut(String.valueOf(e.getMessage())));
        }
    }

    private static YNode readValue(JsonParser p, String file, int depth) throws IOException {
        Location here = locationOf(p, file);
        JsonToken t = p.currentToken();
        if ((t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) && depth > MAX_NESTING) {
            throw new InputError(
                    here,
                    "maps and lists nested more than " + MAX_NESTING + " deep; expected a barfit "
                            + "input (it needs five levels at most)");
        }
        switch (t) {
            case START_OBJECT: {
                Map<String, YMap.Entry> entries = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    Location keyLoc = locationOf(p, file);
                    if (entries.containsKey(key)) {
                        throw new InputError(
                                keyLoc,
                                "key '" + Echo.cut(key) + "' is given twice (first at line "
                                        + entries.get(key).keyLocation().line() + "); expected each key once");
                    }
                    p.nextToken();
                    entries.put(key, new YMap.Entry(key, keyLoc, readValue(p, file, depth + 1)));
                }
                return new YMap(entries, here);
            }
            case START_ARRAY: {
                List<YNode> items = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(readValue(p, file, depth + 1));
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

    /**
     * A syntax error at the place the YAML scanner found it (Jackson's own location is that of the last
     * token read, often the line before), in words for the common mistakes.
     */
    private static InputError syntaxError(JsonProcessingException e, String text, String file) {
        MarkedYAMLException marked = null;
        for (Throwable c = e; c != null; c = c.getCause()) {
            if (c instanceof MarkedYAMLException m) {
                marked = m;
                break;
            }
        }
        if (marked == null) {
            JsonLocation loc = e.getLocation();
            Location where = loc == null
                    ? Location.ofFile(file)
                    : new Location(file, Math.max(loc.getLineNr(), 1), Math.max(loc.getColumnNr(), 0));
            return new InputError(
                    where,
                    "YAML syntax error: " + firstSentence(e.getOriginalMessage())
                            + "; expected valid YAML (check indentation, colons and quotes)");
        }
        String problem = marked.getProblem() == null ? "" : marked.getProblem();
        String context = marked.getContext() == null ? "" : marked.getContext();
        Mark pm = marked.getProblemMark();
        Mark cm = marked.getContextMark();
        Location atProblem = pm != null ? at(file, pm) : cm != null ? at(file, cm) : Location.ofFile(file);
        if (problem.contains("(TAB)")) {
            return new InputError(
                    atProblem, "YAML syntax error: a tab character; expected spaces (YAML indents with spaces only)");
        }
        if (context.contains("simple key") && cm != null) {
            Location atKey = at(file, cm);
            if (keyRunsPastLimit(text, cm.getIndex())) {
                return new InputError(
                        atKey,
                        "YAML syntax error: a key longer than " + SIMPLE_KEY_MAX + " characters; expected a "
                                + "shorter key (YAML allows keys of at most " + SIMPLE_KEY_MAX + ")");
            }
            return new InputError(
                    atKey,
                    "YAML syntax error: a key without ':' after it; expected 'key: value' (a colon and a space "
                            + "after the key)");
        }
        boolean list = context.contains("flow sequence");
        if ((list || context.contains("flow mapping")) && cm != null && problem.startsWith("expected ','")) {
            String found = problem.contains("but got ")
                    ? problem.substring(problem.indexOf("but got ") + 8).strip()
                    : "";
            return new InputError(
                    at(file, cm),
                    "YAML syntax error: a " + (list ? "list opened with '['" : "map opened with '{'")
                            + " here is not closed"
                            + (pm == null
                                    ? ""
                                    : " before line " + (pm.getLine() + 1) + ", column " + (pm.getColumn() + 1)
                                            + (found.isEmpty() ? "" : ", found '" + Echo.cut(found) + "'"))
                            + "; expected "
                            + (list ? "']'" : "'}'") + " at its end and ',' between its items");
        }
        if (problem.contains("expected '<document start>'")) {
            return new InputError(
                    atProblem,
                    "YAML syntax error: text after the end of the YAML document ('...'); expected nothing "
                            + "after it (one document per file)");
        }
        String what = problem.isBlank() ? e.getOriginalMessage() : (context.isBlank() ? "" : context + ": ") + problem;
        return new InputError(
                atProblem,
                "YAML syntax error: " + firstSentence(what)
                        + "; expected valid YAML (check indentation, colons and quotes)");
    }

    private static Location at(String file, Mark m) {
        return new Location(file, m.getLine() + 1, m.getColumn() + 1);
    }

    /** Whether the text from {@code index} to the line's first ": " (or its end) is longer than YAML allows. */
    private static boolean keyRunsPastLimit(String text, int codePointIndex) {
        int i;
        try {
            i = text.offsetByCodePoints(0, codePointIndex);
        } catch (IndexOutOfBoundsException ex) {
            return false;
        }
        int end = i;
        while (end < text.length() && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
            end++;
        }
        int colon = text.indexOf(':', i);
        return colon >= 0 && colon < end && text.codePointCount(i, colon) > SIMPLE_KEY_MAX;
    }

    /** The line of the '---' or '...' marker at or before {@code line}, or 0. */
    private static int documentMarkerBefore(String text, int line) {
        String[] lines = text.split("\r\n|\n|\r", -1);
        for (int i = Math.min(line, lines.length) - 1; i >= 0; i--) {
            if (lines[i].startsWith("---") || lines[i].startsWith("...")) {
                return i + 1;
            }
        }
        return 0;
    }

    /**
     * YAML allows only printable characters (YAML 1.1, 5.1): tab, line breaks and the printable ranges.
     * The scanner refuses anything else but reports it at 1:1; this says where it is.
     */
    private static void requirePrintable(String text, String file) {
        int line = 1;
        int column = 1;
        for (int i = 0; i < text.length(); ) {
            int c = text.codePointAt(i);
            if (!printable(c)) {
                throw new InputError(
                        new Location(file, line, column),
                        String.format(
                                "a control character (U+%04X) "
                                        + "that YAML does not allow; expected printable text (tabs, line breaks and visible "
                                        + "characters)",
                                c));
            }
            i += Character.charCount(c);
            boolean crlf = c == '\r' && i < text.length() && text.charAt(i) == '\n';
            if (c == '\n' || (c == '\r' && !crlf) || c == 0x85 || c == 0x2028 || c == 0x2029) {
                line++;
                column = 1;
            } else if (!crlf) {
                column++;
            }
        }
    }

    private static boolean printable(int c) {
        return c == 0x9
                || c == 0xA
                || c == 0xD
                || (c >= 0x20 && c <= 0x7E)
                || c == 0x85
                || (c >= 0xA0 && c <= 0xD7FF)
                || (c >= 0xE000 && c <= 0xFFFD)
                || (c >= 0x10000 && c <= 0x10FFFF);
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
