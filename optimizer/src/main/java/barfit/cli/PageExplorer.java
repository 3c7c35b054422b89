package barfit.cli;

import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YNode;
import barfit.catalogs.yaml.YamlReader;
import barfit.design.SolverOptions;
import barfit.design.line.LineCapacity;
import barfit.design.span.SpanProblem;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.input.SearchReader;
import barfit.input.SettingsReader;
import barfit.report.DesignItem;
import barfit.report.DesignJson;
import barfit.report.ElevationSvg;
import barfit.report.EnvelopePlot;
import barfit.report.StudyJson;
import barfit.report.StudySay;
import barfit.report.SweepPlot;
import barfit.report.html.SectionDrawing;
import barfit.section.CheckReport;
import barfit.section.trail.Dim;
import barfit.serve.ControlError;
import barfit.serve.Controls;
import barfit.serve.Explorer;
import barfit.study.Compare;
import barfit.study.Say;
import barfit.study.Sweep;
import barfit.study.Target;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The page's answers for one design file. A request is applied to a copy of the file's YAML (the beam or line
 * asked about, its cap, the search's widths and bar sizes, f'c, the rates), and the copy goes through the same
 * reader and the same design as {@code design}: a value the page sends is checked exactly as the file's own.
 */
final class PageExplorer implements Explorer {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final ObjectMapper YAML = new ObjectMapper(YAMLFactory.builder()
            .disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
            .disable(YAMLGenerator.Feature.SPLIT_LINES)
            .build());

    /** The most depth caps the page's cost–depth curve is drawn through. */
    static final int MOST_CAPS = 40;

    /** The same for a line. */
    static final int MOST_LINE_CAPS = 9;

    /** How many next-cheapest designs the page lists. */
    static final int ALTERNATIVES = 3;

    private final Path file;
    private final ObjectNode doc;
    private final DesignInput input;
    private final List<LineInput> lines;
    private final SolverOptions options;
    private final Path out;

    /** Reads the file (bad input throws the reader's located error, as every command does). */
    PageExplorer(Path file, SolverOptions options, Path out) {
        this.file = file;
        this.options = options;
        this.out = out;
        this.input = Studies.input(file);
        this.lines = LinesReader.read(DesignInputReader.document(file), input.settings());
        try {
            this.doc = (ObjectNode) YAML.readTree(Files.readString(file, StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public String fileName() {
        return file.toString();
    }

    @Override
    public String caution() {
        return String.join(" ", barfit.report.Caution.LINES);
    }

    @Override
    public ObjectNode items() {
        UnitSystem u = input.settings().units();
        ObjectNode o = JSON.createObjectNode();
        o.put("file", file.toString());
        o.put("units", u.name());
        o.put("length", u.unit(Dim.LENGTH));
        o.put("stress", u.unit(Dim.STRESS));
        o.put("currency", input.currency());
        ArrayNode bars = o.putArray("bar_choices");
        input.settings().catalog().designations().forEach(bars::add);
        ArrayNode keys = o.putArray("cost_keys");
        SearchReader.rateKeys(u).forEach(keys::add);
        var depths = input.space().depths();
        o.put("depth_min", u.json(depths.get(0), Dim.LENGTH));
        o.put("depth_max", u.json(depths.get(depths.size() - 1), Dim.LENGTH));
        ObjectNode controls = o.putObject("controls");
        ArrayNode widths = controls.putArray("widths");
        input.space().widths().forEach(w -> widths.add(u.json(w, Dim.LENGTH)));
        controls.put("fc", u.json(input.settings().materials().fc(), Dim.STRESS));
        ArrayNode sizes = controls.putArray("bar_sizes");
        input.space().barSizes().forEach(b -> sizes.add(b.designation()));
        ObjectNode costs = controls.putObject("costs");
        JsonNode given = doc.get("costs");
        for (String k : SearchReader.rateKeys(u)) {
            if (given != null && given.get(k) != null && given.get(k).isNumber()) {
                costs.put(k, given.get(k).asDouble());
            }
        }
        ArrayNode items = o.putArray("items");
        for (DesignBeam b : input.beams()) {
            ObjectNode i = items.addObject();
            i.put("kind", "beam");
            i.put("id", b.id());
            i.put("whole", b.isWhole());
            if (b.maxDepth() != null) {
                i.put("max_depth", u.json(b.maxDepth(), Dim.LENGTH));
            } else {
                i.putNull("max_depth");
            }
        }
        for (LineInput l : lines) {
            ObjectNode i = items.addObject();
            i.put("kind", "line");
            i.put("id", l.id());
            i.put("whole", true);
            if (l.maxDepth() != null) {
                i.put("max_depth", u.json(l.maxDepth(), Dim.LENGTH));
            } else {
                i.putNull("max_depth");
            }
        }
        return o;
    }

    /** The file as changed by a request: its YAML text, and what the reader makes of it. */
    record Edited(String yaml, DesignInput input, List<LineInput> lines, String id) {}

    Edited edit(Controls c) {
        ObjectNode d = doc.deepCopy();
        String kind = c.beam() != null ? "beams" : "lines";
        JsonNode list = d.get(kind);
        ObjectNode item = null;
        if (list instanceof ArrayNode arr) {
            for (JsonNode n : arr) {
                if (n instanceof ObjectNode on
                        && on.get("id") != null
                        && c.id().equals(on.get("id").asText())) {
                    item = on;
                }
            }
        }
        if (item == null) {
            throw new ControlError(
                    "request", "no " + (c.beam() != null ? "beam" : "line") + " \"" + c.id() + "\" in " + file);
        }
        d.remove("beams");
        d.remove("lines");
        d.putArray(kind).add(item);
        if (c.capGiven()) {
            if (c.maxDepth() == null) {
                item.remove("max_depth");
            } else {
                item.set("max_depth", number(c.maxDepth()));
            }
        }
        if (c.widths() != null || c.barSizes() != null) {
            ObjectNode search = d.get("search") instanceof ObjectNode s ? s : d.putObject("search");
            if (c.widths() != null) {
                ArrayNode w = search.putArray("widths");
                c.widths().forEach(v -> w.add(number(v)));
            }
            if (c.barSizes() != null) {
                ArrayNode b = search.putArray("bar_sizes");
                c.barSizes().forEach(b::add);
            }
        }
        if (c.fc() != null) {
            ObjectNode concrete = d.get("concrete") instanceof ObjectNode s ? s : d.putObject("concrete");
            concrete.set("fc", number(c.fc()));
        }
        if (c.costs() != null) {
            ObjectNode costs = d.get("costs") instanceof ObjectNode s ? s : d.putObject("costs");
            for (Map.Entry<String, Double> e : c.costs().entrySet()) {
                costs.set(e.getKey(), number(e.getValue()));
            }
        }
        String yaml;
        try {
            yaml = YAML.writeValueAsString(d);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
        try {
            YNode root = YamlReader.read(yaml, file.toString());
            DesignInput in = DesignInputReader.read(root, file, false);
            List<LineInput> ls = LinesReader.read(SettingsReader.root(root), in.settings());
            return new Edited(yaml, in, ls, c.id());
        } catch (InputError e) {
            throw new ControlError(controlOf(e.getMessage()), e.getMessage());
        }
    }

    /** Which control a reader's message is about, from the key path it names. */
    static String controlOf(String message) {
        String m = message == null ? "" : message;
        if (m.contains("search.widths") || m.contains("web width")) {
            return "widths";
        }
        if (m.contains("bar_sizes") || m.contains("compression_sizes")) {
            return "bar_sizes";
        }
        if (m.contains("concrete.fc") || m.contains("f'c")) {
            return "fc";
        }
        if (m.contains("costs")) {
            return "costs";
        }
        if (m.contains("max_depth")) {
            return "max_depth";
        }
        return "request";
    }

    private static JsonNode number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e12
                ? JSON.getNodeFactory().numberNode((long) v)
                : JSON.getNodeFactory().numberNode(v);
    }

    private DesignRun.Result run(Edited e, int alternatives) {
        return DesignRun.run(
                e.input(), e.input().beams(), e.lines(), options, alternatives, false, barfit.design.Objective.COST);
    }

    @Override
    public String design(Controls c) {
        Edited e = edit(c);
        DesignRun.Result r = run(e, 0);
        return DesignJson.render(e.input().settings(), r.items(), e.input().currency(), false);
    }

    @Override
    public ObjectNode explore(Controls c) {
        Edited e = edit(c);
        DesignRun.Result r = run(e, ALTERNATIVES);
        UnitSystem u = e.input().settings().units();
        ObjectNode o = JSON.createObjectNode();
        try {
            o.set(
                    "design",
                    JSON.readTree(DesignJson.render(
                            e.input().settings(), r.items(), e.input().currency(), false)));
        } catch (JsonProcessingException ex) {
            throw new UncheckedIOException(ex);
        }
        ArrayNode drawings = o.putArray("drawings");
        for (DesignItem item : r.items()) {
            if (item.section() != null && item.section().feasible()) {
                var best = item.section().best();
                var f = best.report().flexure();
                ObjectNode dr = drawings.addObject();
                dr.put("title", item.section().problem().id());
                dr.put(
                        "svg",
                        SectionDrawing.svg(
                                SectionDrawing.ofSection(
                                        item.section().problem(),
                                        best.layout(),
                                        f.d(),
                                        item.section().problem().id() + ": "
                                                + u.compact(best.layout().width(), Dim.LENGTH) + " × "
                                                + u.compact(best.layout().height(), Dim.LENGTH),
                                        "Mu = "
                                                + u.withUnit(
                                                        Math.abs(item.section()
                                                                .problem()
                                                                .mu()),
                                                        Dim.MOMENT) + ", φMn = " + u.withUnit(f.phiMn(), Dim.MOMENT)),
                                SectionDrawing.scaleFor(best.layout().shape()),
                                u));
            } else if (item.whole() != null && item.whole().feasible() && item.line() == null) {
                var best = item.whole().best();
                SpanProblem p = item.whole().problem();
                for (Map.Entry<SpanProblem.Place, CheckReport> s :
                        best.report().sections().entrySet()) {
                    var f = s.getValue().flexure();
                    String where = s.getKey().name().toLowerCase(Locale.ROOT);
                    ObjectNode dr = drawings.addObject();
                    dr.put("title", p.id() + " " + where);
                    dr.put(
                            "svg",
                            SectionDrawing.svg(
                                    SectionDrawing.of(
                                            p,
                                            best.layout(),
                                            s.getKey(),
                                            f.d(),
                                            p.id() + " at " + where + " — "
                                                    + f.bending().word(),
                                            "Mu = "
                                                    + u.withUnit(
                                                            Math.abs(s.getValue()
                                                                    .demand()
                                                                    .mu()),
                                                            Dim.MOMENT) + ", φMn = "
                                                    + u.withUnit(f.phiMn(), Dim.MOMENT)),
                                    SectionDrawing.scaleFor(best.layout().shape()),
                                    u));
                }
            }
        }
        for (DesignRun.Line l : r.lines()) {
            var capacity = LineCapacity.of(l.result());
            if (capacity != null) {
                ObjectNode dr = drawings.addObject();
                dr.put("title", l.input().id() + ": moments and φMn");
                dr.put(
                        "svg",
                        EnvelopePlot.capacitySvg(
                                l.result().analysis(), capacity, l.input().id(), u));
            }
            if (l.detail() != null) {
                ObjectNode dr = drawings.addObject();
                dr.put("title", l.input().id() + ": bars as detailed");
                dr.put("svg", ElevationSvg.svg(l.detail(), l.result(), u));
            }
        }
        return o;
    }

    @Override
    public ObjectNode study(Controls c) {
        Edited e = edit(c);
        DesignInput in = e.input();
        UnitSystem u = in.settings().units();
        Say say = new StudySay(u);
        List<Target> targets = Studies.targets(in, e.id(), file, options, say, e.lines());
        List<Double> depths = in.space().depths();
        // a line is designed whole at each cap: fewer caps keep its curve to seconds
        int most = e.lines().isEmpty() ? MOST_CAPS : MOST_LINE_CAPS;
        int stride = Math.max(1, (depths.size() + most - 1) / most);
        List<Double> caps = new ArrayList<>();
        for (int i = 0; i < depths.size(); i += stride) {
            caps.add(depths.get(i));
        }
        if (!caps.get(caps.size() - 1).equals(depths.get(depths.size() - 1))) {
            caps.add(depths.get(depths.size() - 1));
        }
        List<Sweep.Result> sweeps = new ArrayList<>();
        List<Compare.Result> compares = new ArrayList<>();
        List<Boolean> perBeam = new ArrayList<>();
        List<Double> widths = in.space().widths();
        double widest = widths.get(widths.size() - 1);
        double step = Compare.widthStep(widths, u == UnitSystem.US ? 50.8 : 50);
        List<Double> fcs = new ArrayList<>();
        for (double g : u == UnitSystem.US ? new double[] {5000, 6000, 8000} : new double[] {35, 40, 50}) {
            double mpa = u.toSI(g, Dim.STRESS);
            // compare's grades above the file's f'c that the rates price
            if (mpa > in.settings().materials().fc() + 1e-6
                    && !Double.isNaN(in.costs().concreteAt(mpa))) {
                fcs.add(mpa);
            }
        }
        for (Target t : targets) {
            sweeps.add(Sweep.run(t, caps, Studies.cost(in)));
            Double cap = t.cap();
            Double capWithin = cap != null && cap >= depths.get(0) - 1e-6 && cap <= depths.get(depths.size() - 1) + 1e-6
                    ? cap
                    : null;
            compares.add(Compare.run(
                    t, capWithin, widest + 2 * step, step, fcs, Studies.cost(in), fc -> Studies.costAtFc(in, fc), say));
            perBeam.add(t.costPerBeam());
        }
        ObjectNode o = JSON.createObjectNode();
        try {
            o.set("sweep", JSON.readTree(StudyJson.sweep(in.settings(), sweeps, perBeam)));
            o.set("compare", JSON.readTree(StudyJson.compare(in.settings(), compares, perBeam)));
        } catch (JsonProcessingException ex) {
            throw new UncheckedIOException(ex);
        }
        ArrayNode plots = o.putArray("plots");
        for (int i = 0; i < sweeps.size(); i++) {
            ObjectNode p = plots.addObject();
            p.put("title", sweeps.get(i).id());
            p.put(
                    "svg",
                    SweepPlot.svg(
                            sweeps.get(i),
                            u,
                            in.currency(),
                            perBeam.get(i),
                            targets.get(i).cap()));
        }
        return o;
    }

    @Override
    public String keep(Controls c) {
        Edited e = edit(c);
        String yaml = e.yaml();
        try {
            JsonNode bars = doc.get("bars");
            Path base = file.toAbsolutePath().getParent();
            if (bars != null && bars.isTextual() && base != null && Files.isRegularFile(base.resolve(bars.asText()))) {
                // a catalog file named relative to the input: name it relative to where the copy is written
                ObjectNode d = (ObjectNode) YAML.readTree(yaml);
                Path catalog = base.resolve(bars.asText()).normalize();
                d.put(
                        "bars",
                        out.toAbsolutePath().normalize().relativize(catalog).toString());
                yaml = YAML.writeValueAsString(d);
            }
            Files.createDirectories(out);
            String head = "# " + e.id() + " as changed on barfit's page, from " + file.getFileName()
                    + "; barfit design reads it.\n"
                    + "# Results must be checked by a licensed engineer against the governing local code.\n";
            String name = e.id().replaceAll("[^A-Za-z0-9._-]", "_");
            for (int n = 1; n < 10_000; n++) {
                Path target = out.resolve(name + "-" + n + ".yaml");
                if (Files.exists(target)) {
                    continue;
                }
                try {
                    // CREATE_NEW: never over a file, even one written between the check and now
                    Files.writeString(target, head + yaml, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW);
                    return target.toString();
                } catch (FileAlreadyExistsException taken) {
                    // written meanwhile by another request: try the next number
                }
            }
            throw new ControlError("request", "the output folder " + out + " holds 9,999 copies of " + e.id());
        } catch (IOException ex) {
            throw new ControlError(
                    "request", "cannot write into " + out + " (" + ex.getClass().getSimpleName() + ")");
        }
    }
}
