package barfit.input;

import barfit.catalogs.Decimal;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.InputFiles;
import barfit.catalogs.yaml.Location;
import barfit.design.span.SpanTorsion;
import barfit.section.EndCondition;
import barfit.section.Flange;
import barfit.section.Span;
import barfit.section.SpanChecks;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads a schedule's beams from CSV: a header row naming the columns (any order), then one row per
 * whole span, in the units of the settings file. Blank lines and lines starting with {@code #} are
 * skipped; a cell may be quoted. The file is read as it streams in, at most
 * {@link InputFiles#CSV_MAX_BYTES}; every cell is checked, against {@link InputLimits} too, and the
 * first bad one is reported with its line and column.
 *
 * <pre>
 * id,span,ends,m_left,m_mid,m_right,v_left,v_right,max_depth,group,flange_width,flange_thickness,dead,live
 * (optional, the torsion: t_left,t_right,t_mid,torsion_kind)
 * </pre>
 * {@code vu} may stand for both end shears. Optional: {@code line} (the row is a span of that line: the
 * line's spans keep one b × h, one set of forms, in place of a {@code group}), {@code width} (fixes b),
 * {@code flange_type} (T or L),
 * {@code flange_clear_to_next_web} (sw of Table 6.3.2.1), {@code sustained_live}, the factored torsion at d
 * from the faces {@code t_left}, {@code t_right} (and at mid-span {@code t_mid}, 0 by default) with
 * {@code torsion_kind} (compatibility or equilibrium, the default).
 */
public final class CsvBeamsReader {
    static final List<String> REQUIRED = List.of("id", "span", "ends");
    static final List<String> KNOWN = List.of(
            "id",
            "span",
            "ends",
            "m_left",
            "m_mid",
            "m_right",
            "vu",
            "v_left",
            "v_right",
            "max_depth",
            "group",
            "line",
            "flange_width",
            "flange_thickness",
            "flange_type",
            "flange_clear_to_next_web",
            "dead",
            "live",
            "sustained_live",
            "width",
            "t_left",
            "t_right",
            "t_mid",
            "torsion_kind");

    private final Path file;
    private final Settings settings;
    private final UnitSystem u;
    private final double widestWeb;

    private CsvBeamsReader(Path file, Settings settings, double widestWeb) {
        this.file = file;
        this.settings = settings;
        this.u = settings.units();
        this.widestWeb = widestWeb;
    }

    /** One cell: its text and where it starts. */
    private record Cell(String text, int line, int column) {}

    /** One data row by column name. */
    private record Row(int line, Map<String, Cell> cells) {}

    public static List<DesignBeam> read(Path file, Settings settings, double widestWeb) {
        return new CsvBeamsReader(file, settings, widestWeb).read();
    }

    /** What to do with a CSV over {@link InputFiles#CSV_MAX_BYTES}. */
    static final String TOO_LARGE_ADVICE =
            "expected a smaller file: split the beams into several schedules " + "(by level or by beam line)";

    /**
     * Reads and checks the file row by row as it streams in: the first bad cell stops the reading, so a
     * bad last row of a large file is found without holding the file in memory.
     */
    private List<DesignBeam> read() {
        List<String> header = null;
        int headerLine = 0;
        List<DesignBeam> out = new ArrayList<>();
        Map<String, Integer> ids = new HashMap<>();
        try (InputFiles.Lines lines =
                InputFiles.lines(file, "a CSV file", InputFiles.CSV_MAX_BYTES, TOO_LARGE_ADVICE)) {
            String line;
            while ((line = lines.next()) != null) {
                int no = lines.lineNumber();
                if (no == 1 && line.startsWith("\uFEFF")) {
                    line = line.substring(1); // a byte-order mark, as some spreadsheets write
                }
                if (line.isBlank() || line.stripLeading().startsWith("#")) {
                    continue;
                }
                List<Cell> cells = split(line, no);
                if (header == null) {
                    header = header(cells, no);
                    headerLine = no;
                    continue;
                }
                if (cells.size() != header.size()) {
                    Cell at = cells.size() > header.size() ? cells.get(header.size()) : cells.get(cells.size() - 1);
                    throw error(
                            at,
                            "this row has " + cells.size() + " cells but the header (line " + headerLine
                                    + ") has " + header.size()
                                    + (separatorHint(line).isEmpty()
                                            ? "; expected one cell per "
                                                    + "column (leave a cell empty when it does not apply)"
                                            : separatorHint(line)));
                }
                Map<String, Cell> byName = new LinkedHashMap<>();
                for (int c = 0; c < cells.size(); c++) {
                    byName.put(header.get(c), cells.get(c));
                }
                Row r = new Row(no, byName);
                DesignBeam b = beam(r);
                Integer first = ids.putIfAbsent(b.id(), r.line());
                if (first != null) {
                    throw error(
                            r.cells().get("id"),
                            "beam id \"" + Echo.cut(b.id()) + "\" is used twice (first at line " + first
                                    + "); expected unique ids");
                }
                out.add(b);
            }
        }
        if (header == null) {
            throw new InputError(
                    new Location(file.toString(), 1, 1), "empty; expected a header row and one row per beam");
        }
        if (out.isEmpty()) {
            throw new InputError(
                    new Location(file.toString(), headerLine, 1),
                    "no beams after the header; expected one " + "row per beam");
        }
        return out;
    }

    /** The header's column names, checked. */
    private List<String> header(List<Cell> cells, int no) {
        List<String> header = new ArrayList<>();
        for (Cell c : cells) {
            String name = c.text().strip().toLowerCase(Locale.ROOT);
            if (!KNOWN.contains(name)) {
                String separator = separatorHint(c.text());
                throw error(
                        c,
                        "unknown column '" + Echo.cut(c.text().strip()) + "'"
                                + (separator.isEmpty()
                                        ? "; expected columns from: " + String.join(", ", KNOWN)
                                        : separator));
            }
            if (header.contains(name)) {
                throw error(c, "column '" + Echo.cut(name) + "' appears twice");
            }
            header.add(name);
        }
        for (String r : REQUIRED) {
            if (!header.contains(r)) {
                throw new InputError(
                        new Location(file.toString(), no, 1),
                        "the header has no '" + r + "' column; expected at least: " + String.join(", ", REQUIRED));
            }
        }
        if (header.contains("vu") && (header.contains("v_left") || header.contains("v_right"))) {
            throw error(cells.get(header.indexOf("vu")), "give either vu (both ends) or v_left and v_right, not both");
        }
        return header;
    }

    /** A hint when the cells seem separated by semicolons or tabs, as some spreadsheets save "CSV". */
    private static String separatorHint(String text) {
        for (String[] sep : new String[][] {{";", "semicolons"}, {"\t", "tabs"}}) {
            if (text.contains(sep[0])) {
                return "; the cells seem to be separated by " + sep[1] + ": expected commas (save the CSV with ',' "
                        + "as the separator)";
            }
        }
        return "";
    }

    /** Splits a line at commas outside double quotes ("" inside quotes is one quote). */
    private List<Cell> split(String line, int no) {
        List<Cell> out = new ArrayList<>();
        int i = 0;
        int n = line.length();
        while (true) {
            int start = i;
            StringBuilder sb = new StringBuilder();
            int j = i;
            while (j < n && line.charAt(j) == ' ') {
                j++;
            }
            if (j < n && line.charAt(j) == '"') {
                j++;
                boolean closed = false;
                while (j < n) {
                    char ch = line.charAt(j);
                    if (ch == '"') {
                        if (j + 1 < n && line.charAt(j + 1) == '"') {
                            sb.append('"');
                            j += 2;
                            continue;
                        }
                        closed = true;
                        j++;
                        break;
                    }
                    sb.append(ch);
                    j++;
                }
                if (!closed) {
                    throw new InputError(
                            new Location(file.toString(), no, start + 1),
                            "a quoted cell is not closed; " + "expected a closing \"");
                }
                while (j < n && line.charAt(j) == ' ') {
                    j++;
                }
                if (j < n && line.charAt(j) != ',') {
                    throw new InputError(
                            new Location(file.toString(), no, j + 1),
                            "text after a quoted cell; expected " + "a comma");
                }
            } else {
                while (j < n && line.charAt(j) != ',') {
                    sb.append(line.charAt(j));
                    j++;
                }
            }
            out.add(new Cell(sb.toString().strip(), no, start + 1));
            if (j >= n) {
                break;
            }
            i = j + 1;
        }
        return out;
    }

    private InputError error(Cell c, String message) {
        return new InputError(new Location(file.toString(), c.line(), c.column()), message);
    }

    private static boolean empty(Cell c) {
        return c == null || c.text().isEmpty();
    }

    private Double number(Row r, String column, String what) {
        Cell c = r.cells().get(column);
        if (empty(c)) {
            return null;
        }
        // plain decimal numbers only (Java's own syntax would let "6.0f" or "0x1p3" through), read in one pass
        double v = Decimal.parse(c.text());
        if (Double.isNaN(v)) {
            throw error(c, column + ": expected a number (" + what + "), got \"" + Echo.cut(c.text()) + "\"");
        }
        if (Double.isInfinite(v)) {
            throw error(
                    c,
                    column + ": expected a number (" + what + "), got \"" + Echo.cut(c.text())
                            + "\", too large a number");
        }
        return v;
    }

    /** The value of {@code column} (in the file's units), refused outside {@code range}. */
    private Double inRange(Row r, String column, Double v, InputLimits.Range range) {
        if (v != null) {
            String problem = range.problem(u, v);
            if (problem != null) {
                throw error(r.cells().get(column), column + ": " + problem);
            }
        }
        return v;
    }

    private Double positive(Row r, String column, String what, Dim dim, InputLimits.Range range) {
        Double v = number(r, column, what);
        if (v != null && v <= 0) {
            throw error(
                    r.cells().get(column),
                    column + ": expected a positive number (" + what + "), got " + SettingsReader.fmt(v));
        }
        inRange(r, column, v, range);
        return v == null ? null : u.toSI(v, dim);
    }

    private Double nonNegative(Row r, String column, String what, Dim dim, InputLimits.Range range) {
        Double v = number(r, column, what);
        if (v != null && v < 0) {
            throw error(
                    r.cells().get(column),
                    column + ": expected zero or more (" + what + "), got " + SettingsReader.fmt(v));
        }
        inRange(r, column, v, range);
        return v == null ? null : u.toSI(v, dim);
    }

    private DesignBeam beam(Row r) {
        Cell idCell = r.cells().get("id");
        if (empty(idCell)) {
            throw error(idCell, "id: expected the beam's mark, e.g. B2-07");
        }
        String id = idCell.text();
        Location where = new Location(file.toString(), r.line(), 1);
        Cell spanCell = r.cells().get("span");
        if (empty(spanCell)) {
            throw error(spanCell, "span: expected the clear span, " + u.unit(Dim.SPAN));
        }
        double span = positive(r, "span", "the clear span, " + u.unit(Dim.SPAN), Dim.SPAN, InputLimits.SPAN);
        Cell endsCell = r.cells().get("ends");
        EndCondition ends = empty(endsCell) ? null : EndCondition.byKey(endsCell.text());
        if (ends == null) {
            throw error(
                    endsCell,
                    "ends: expected simple, one-end-continuous, both-ends-continuous or cantilever, got \""
                            + endsCell.text() + "\"");
        }
        String moment = "factored moment, " + u.unit(Dim.MOMENT);
        Double ml = siOrNull(inRange(r, "m_left", number(r, "m_left", moment), InputLimits.MOMENT), Dim.MOMENT);
        Double mm = siOrNull(inRange(r, "m_mid", number(r, "m_mid", moment), InputLimits.MOMENT), Dim.MOMENT);
        Double mr = siOrNull(inRange(r, "m_right", number(r, "m_right", moment), InputLimits.MOMENT), Dim.MOMENT);
        switch (ends) {
            case SIMPLE -> {
                need(r, "m_mid", mm, "a simple span needs m_mid");
                forbid(r, "m_left", ml, "a simple span has no support moment; leave m_left empty");
                forbid(r, "m_right", mr, "a simple span has no support moment; leave m_right empty");
            }
            case ONE_END_CONTINUOUS -> {
                need(r, "m_mid", mm, "a span continuous at one end needs m_mid and m_left or m_right");
                if ((ml == null) == (mr == null)) {
                    Cell at = r.cells().get(ml == null ? "m_left" : "m_right");
                    throw error(
                            at == null ? endsCell : at,
                            "one-end-continuous: expected exactly one support moment, "
                                    + "m_left or m_right (the continuous end)");
                }
            }
            case BOTH_ENDS_CONTINUOUS -> {
                need(r, "m_left", ml, "a span continuous at both ends needs m_left, m_mid and m_right");
                need(r, "m_mid", mm, "a span continuous at both ends needs m_left, m_mid and m_right");
                need(r, "m_right", mr, "a span continuous at both ends needs m_left, m_mid and m_right");
            }
            case CANTILEVER -> {
                need(r, "m_left", ml, "a cantilever is fixed at its left end: give m_left");
                forbid(r, "m_mid", mm, "a cantilever is designed at its fixed end: leave m_mid empty");
                forbid(r, "m_right", mr, "a cantilever is fixed at its left end: leave m_right empty");
            }
        }
        if (ml != null && ml > 0) {
            throw error(
                    r.cells().get("m_left"),
                    "m_left: a support moment is hogging; expected a negative value " + "(top in tension)");
        }
        if (mr != null && mr > 0) {
            throw error(
                    r.cells().get("m_right"),
                    "m_right: a support moment is hogging; expected a negative value " + "(top in tension)");
        }
        if (mm != null && mm < 0) {
            throw error(r.cells().get("m_mid"), "m_mid: the mid-span moment is sagging; expected a positive value");
        }
        if (ml != null && ml == 0) {
            ml = null;
        }
        if (mr != null && mr == 0) {
            mr = null;
        }
        String shear = "factored shear at d from the face, " + u.unit(Dim.FORCE);
        Double vl;
        Double vr;
        if (r.cells().containsKey("vu")) {
            vl = nonNegative(r, "vu", shear, Dim.FORCE, InputLimits.SHEAR);
            vr = ends == EndCondition.CANTILEVER ? null : vl;
        } else {
            vl = nonNegative(r, "v_left", shear, Dim.FORCE, InputLimits.SHEAR);
            vr = nonNegative(r, "v_right", shear, Dim.FORCE, InputLimits.SHEAR);
            if (ends == EndCondition.CANTILEVER && vr != null) {
                throw error(
                        r.cells().get("v_right"),
                        "v_right: a cantilever has its shear at the fixed (left) end " + "only; leave v_right empty");
            }
        }
        Double cap = positive(
                r,
                "max_depth",
                "the headroom cap on the total height, " + u.unit(Dim.LENGTH),
                Dim.LENGTH,
                InputLimits.HEIGHT);
        Double width =
                positive(r, "width", "the fixed web width, " + u.unit(Dim.LENGTH), Dim.LENGTH, InputLimits.WEB_WIDTH);
        Cell groupCell = r.cells().get("group");
        String group = empty(groupCell) ? null : groupCell.text();
        Cell lineCell = r.cells().get("line");
        boolean ofLine = !empty(lineCell);
        if (ofLine) {
            if (group != null) {
                throw error(
                        lineCell,
                        "line: a span of a line is grouped with the line's other spans; expected line or group, "
                                + "not both");
            }
            group = "line " + lineCell.text();
        }
        Double bf = positive(
                r, "flange_width", "the flange width, " + u.unit(Dim.LENGTH), Dim.LENGTH, InputLimits.FLANGE_WIDTH);
        Double hf = positive(
                r,
                "flange_thickness",
                "the slab thickness, " + u.unit(Dim.LENGTH),
                Dim.LENGTH,
                InputLimits.FLANGE_THICKNESS);
        Double sw = positive(
                r,
                "flange_clear_to_next_web",
                "the clear distance from the web to the next web, " + u.unit(Dim.LENGTH),
                Dim.LENGTH,
                InputLimits.WEB_GAP);
        Flange flange = null;
        if ((bf == null) != (hf == null)) {
            String missing = bf == null ? "flange_width" : "flange_thickness";
            Cell at = r.cells().get(missing);
            throw error(
                    at == null ? r.cells().get(bf == null ? "flange_thickness" : "flange_width") : at,
                    missing + ": a flange needs both flange_width and flange_thickness");
        }
        if (bf != null) {
            // a cantilever's flange is in tension (hogging): the section model leaves it out of strength and
            // the report says what 24.3.4 asks of the top bars, as for a support of any span
            double web = width != null ? width : widestWeb;
            if (bf < web) {
                throw error(
                        r.cells().get("flange_width"),
                        "flange_width: the flange (" + u.compact(bf, Dim.LENGTH)
                                + " " + u.unit(Dim.LENGTH) + ") is narrower than the web (" + u.compact(web, Dim.LENGTH)
                                + " "
                                + u.unit(Dim.LENGTH) + "); expected flange width >= web width");
            }
            Cell type = r.cells().get("flange_type");
            boolean oneSided = false;
            if (!empty(type)) {
                if (type.text().equals("L")) {
                    oneSided = true;
                } else if (!type.text().equals("T")) {
                    throw error(
                            type,
                            "flange_type: expected T (slab on both sides) or L (one side), got \"" + type.text()
                                    + "\"");
                }
            }
            flange = Flange.given(bf, hf, oneSided, sw, span);
        } else if (!empty(r.cells().get("flange_type"))) {
            throw error(r.cells().get("flange_type"), "flange_type: given without flange_width and flange_thickness");
        } else if (sw != null) {
            throw error(
                    r.cells().get("flange_clear_to_next_web"),
                    "flange_clear_to_next_web: given without flange_width and flange_thickness");
        }
        String load = "service load, " + u.unit(Dim.LINE_LOAD);
        Double dead = positive(
                r, "dead", "the service dead load, " + u.unit(Dim.LINE_LOAD), Dim.LINE_LOAD, InputLimits.LINE_LOAD);
        Double live = nonNegative(
                r, "live", "the service live load, " + u.unit(Dim.LINE_LOAD), Dim.LINE_LOAD, InputLimits.LINE_LOAD);
        Double sustained = number(r, "sustained_live", "the sustained part of the live load, 0 to 1");
        SpanChecks.ServiceLoads service = null;
        if (dead != null || live != null) {
            if (dead == null || live == null) {
                String missing = dead == null ? "dead" : "live";
                Cell at = r.cells().get(missing);
                throw error(
                        at == null ? r.cells().get(dead == null ? "live" : "dead") : at,
                        missing + ": service loads need both dead and live (" + load + ")");
            }
            if (sustained != null && (sustained < 0 || sustained > 1)) {
                throw error(
                        r.cells().get("sustained_live"),
                        "sustained_live: expected the sustained part of the live " + "load from 0 to 1, got "
                                + SettingsReader.fmt(sustained));
            }
            service = new SpanChecks.ServiceLoads(dead, live, sustained == null ? 0 : sustained);
        } else if (sustained != null) {
            throw error(r.cells().get("sustained_live"), "sustained_live: given without dead and live loads");
        }
        DesignBeam.WholeSpan whole = new DesignBeam.WholeSpan(
                ml, mm, mr, vl, vr, service, SpanChecks.Limits.DEFAULT, false, torsion(r, ends));
        return new DesignBeam(id, where, 0, null, cap, width, flange, new Span(span, ends), whole, group, ofLine);
    }

    /** The row's factored torsion (t_left, t_right, t_mid, torsion_kind), or null where it gives none. */
    private SpanTorsion torsion(Row r, EndCondition ends) {
        String what = "factored torsion, " + u.unit(Dim.MOMENT);
        Double left = nonNegative(r, "t_left", what + " at d from the left face", Dim.MOMENT, InputLimits.TORSION);
        Double right = nonNegative(r, "t_right", what + " at d from the right face", Dim.MOMENT, InputLimits.TORSION);
        Double mid = nonNegative(r, "t_mid", what + " at mid-span", Dim.MOMENT, InputLimits.TORSION);
        Cell kind = r.cells().get("torsion_kind");
        if (left == null && right == null) {
            for (String c : new String[] {"t_mid", "torsion_kind"}) {
                if (!empty(r.cells().get(c))) {
                    throw error(r.cells().get(c), c + ": given without t_left or t_right");
                }
            }
            return null;
        }
        String given = left != null ? "t_left" : "t_right";
        if (ends == EndCondition.CANTILEVER) {
            throw error(
                    r.cells().get(given),
                    given + ": torsion on a cantilever is not designed as a whole span; check its fixed-end "
                            + "section under Tu with barfit check");
        }
        boolean compatibility = false;
        if (!empty(kind)) {
            compatibility = switch (kind.text()) {
                case "compatibility" -> true;
                case "equilibrium" -> false;
                default ->
                    throw error(
                            kind, "torsion_kind: expected compatibility or equilibrium, got \"" + kind.text() + "\"");
            };
        }
        return new SpanTorsion(
                left == null ? 0 : left, mid == null ? 0 : mid, right == null ? 0 : right, compatibility);
    }

    private Double siOrNull(Double v, Dim dim) {
        return v == null ? null : u.toSI(v, dim);
    }

    private void need(Row r, String column, Double v, String message) {
        if (v == null) {
            Cell at = r.cells().get(column);
            if (at == null) {
                throw new InputError(
                        new Location(file.toString(), r.line(), 1), "missing column '" + column + "'; " + message);
            }
            throw error(at, column + ": empty; " + message);
        }
    }

    private void forbid(Row r, String column, Double v, String message) {
        if (v != null) {
            throw error(r.cells().get(column), column + ": " + message);
        }
    }
}
