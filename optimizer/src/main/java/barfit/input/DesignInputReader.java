package barfit.input;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YMap;
import barfit.catalogs.yaml.YNode;
import barfit.catalogs.yaml.YamlReader;
import barfit.design.SearchSpace;
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
import java.util.List;
import java.util.Map;

/**
 * Reads a {@code design} file: settings, search, costs and beams. A beam gives either {@code Mu} (one
 * section, with {@code Vu} and {@code Tu} if it carries them) or {@code moments} (a whole span with its
 * supports).
 */
public final class DesignInputReader {
    static final String[] BEAM_KEYS = {
        "id",
        "Mu",
        "Vu",
        "Tu",
        "torsion",
        "max_depth",
        "width",
        "flange",
        "span",
        "ends",
        "moments",
        "shear",
        "service",
        "deflection_limits",
        "bottom_anchored_at_supports",
        "group"
    };

    private DesignInputReader() {}

    public static DesignInput read(Path file) {
        return read(file, true);
    }

    /** The file's top-level map, for the readers of its other parts ({@code lines:}). */
    public static YFields document(Path file) {
        return SettingsReader.root(YamlReader.read(file));
    }

    /** Reads a file whose {@code beams:} may be left out when {@code beamsRequired} is false (they come from elsewhere). */
    public static DesignInput read(Path file, boolean beamsRequired) {
        return read(YamlReader.read(file), file, beamsRequired);
    }

    /**
     * Reads a document already parsed ({@code root}); {@code file} names it in messages and is where a
     * catalog file named by a relative path is looked for.
     */
    public static DesignInput read(YNode root, Path file, boolean beamsRequired) {
        YFields doc = SettingsReader.root(root);
        Settings settings = SettingsReader.read(doc, file);
        SearchSpace space = SearchReader.read(doc, settings);
        SearchReader.Costs costs = SearchReader.costs(doc, settings);
        int maxSizes = SearchReader.maxBarSizesPerBeam(doc);
        int barsPerTwoLegs = SearchReader.barsPerTwoLegs(doc);
        SectionReader sr = new SectionReader(settings);
        UnitSystem u = settings.units();
        List<YFields> beams = beamsRequired || doc.has("beams") ? doc.listOfMaps("beams", "beams") : List.of();
        if (beams.isEmpty() && beamsRequired) {
            throw doc.error("beams", "expected at least one beam");
        }
        List<DesignBeam> out = new ArrayList<>();
        Map<String, Integer> ids = new HashMap<>();
        for (YFields b : beams) {
            b.allowOnly(BEAM_KEYS);
            String id = SettingsReader.id(b);
            Integer first = ids.putIfAbsent(id, b.location().line());
            if (first != null) {
                throw b.error(
                        "id",
                        "beam id \"" + Echo.cut(id) + "\" is used twice (first at line " + first
                                + "); expected unique ids");
            }
            String group = b.has("group") ? b.text("group", "the group of beams that may share a section size") : null;
            Double cap = sr.optLength(b, "max_depth", "the headroom cap on the total height", InputLimits.HEIGHT)
                    .orElse(null);
            Double width = sr.optLength(b, "width", "the fixed web width", InputLimits.WEB_WIDTH)
                    .orElse(null);
            Span span = sr.span(b); // the flange's effective width depends on it
            Flange flange = null;
            if (b.has("flange")) {
                YFields ff = b.map("flange", "the flange: {width, thickness}");
                double minWeb = width != null
                        ? width
                        : space.widths().get(space.widths().size() - 1);
                flange = sr.flange(ff, minWeb, span);
            }
            boolean whole = b.has("moments");
            if (whole && b.has("Mu")) {
                throw b.error("Mu", "give either Mu (one section) or moments (a whole span), not both");
            }
            if (!whole) {
                for (String k : new String[] {"shear", "service", "deflection_limits", "bottom_anchored_at_supports"}) {
                    if (b.has(k)) {
                        throw b.error(
                                k, "'" + k + "' belongs to a whole span; expected moments: {left, mid, right} with it");
                    }
                }
                if (!b.has("Mu")) {
                    throw new InputError(
                            b.location(),
                            b.path() + ": missing key 'Mu'; expected the factored moment, " + u.unit(Dim.MOMENT)
                                    + " (one section), or moments: {left, mid, right} (a whole span)");
                }
                double mu = u.toSI(
                        InputLimits.require(
                                b,
                                "Mu",
                                InputLimits.MOMENT,
                                u,
                                b.number(
                                        "Mu",
                                        "the factored moment, " + u.unit(Dim.MOMENT) + " (+ sagging, − hogging)")),
                        Dim.MOMENT);
                Double vu = b.has("Vu")
                        ? u.toSI(
                                InputLimits.require(
                                        b,
                                        "Vu",
                                        InputLimits.SHEAR,
                                        u,
                                        b.nonNegative("Vu", "the factored shear, " + u.unit(Dim.FORCE))),
                                Dim.FORCE)
                        : null;
                Double tu = CheckInputReader.torsion(b, u);
                boolean compatibility = CheckInputReader.compatibilityTorsion(b, tu != null);
                out.add(new DesignBeam(
                        id, b.location(), mu, vu, cap, width, flange, span, null, group, false, tu, compatibility));
                continue;
            }
            if (b.has("Tu")) {
                throw b.error(
                        "Tu", "a whole span gives its torsion as torsion: {left, right} (at d from the faces), not Tu");
            }
            if (b.has("Vu")) {
                throw b.error("Vu", "a whole span gives its shears as shear: {left, right}, not Vu");
            }
            if (span == null || span.ends() == null) {
                throw new InputError(
                        b.location(),
                        b.path() + ": a whole span needs span: <clear span, " + u.unit(Dim.SPAN)
                                + "> and ends: simple | one-end-continuous | both-ends-continuous | cantilever");
            }
            out.add(new DesignBeam(
                    id, b.location(), 0, null, cap, width, flange, span, whole(b, span.ends(), u), group));
        }
        return new DesignInput(
                settings,
                space,
                costs.rates(),
                costs.currency(),
                out,
                maxSizes,
                barsPerTwoLegs,
                costs,
                CarbonReader.read(doc, settings));
    }

    private static DesignBeam.WholeSpan whole(YFields b, EndCondition ends, UnitSystem u) {
        YFields m = b.map("moments", "the factored moments {left, mid, right}").allowOnly("left", "mid", "right");
        String unit = u.unit(Dim.MOMENT);
        Double left = m.optNumber("left", "the factored moment at the left support, " + unit)
                .map(v -> u.toSI(InputLimits.require(m, "left", InputLimits.MOMENT, u, v), Dim.MOMENT))
                .orElse(null);
        Double mid = m.optNumber("mid", "the factored moment at mid-span, " + unit)
                .map(v -> u.toSI(InputLimits.require(m, "mid", InputLimits.MOMENT, u, v), Dim.MOMENT))
                .orElse(null);
        Double right = m.optNumber("right", "the factored moment at the right support, " + unit)
                .map(v -> u.toSI(InputLimits.require(m, "right", InputLimits.MOMENT, u, v), Dim.MOMENT))
                .orElse(null);
        switch (ends) {
            case SIMPLE -> {
                need(m, mid, "mid", "a simple span needs moments: {mid}");
                forbid(m, left, "left", "a simple span has no support moment; give only mid");
                forbid(m, right, "right", "a simple span has no support moment; give only mid");
            }
            case ONE_END_CONTINUOUS -> {
                need(m, mid, "mid", "a span continuous at one end needs moments: {mid} and left or right");
                if ((left == null) == (right == null)) {
                    throw m.error(
                            left == null ? "left" : "right",
                            "one-end-continuous: expected exactly one support "
                                    + "moment, left or right (the continuous end)");
                }
            }
            case BOTH_ENDS_CONTINUOUS -> {
                need(m, left, "left", "a span continuous at both ends needs moments: {left, mid, right}");
                need(m, mid, "mid", "a span continuous at both ends needs moments: {left, mid, right}");
                need(m, right, "right", "a span continuous at both ends needs moments: {left, mid, right}");
            }
            case CANTILEVER -> {
                need(m, left, "left", "a cantilever is fixed at its left end: give moments: {left}");
                forbid(m, mid, "mid", "a cantilever is designed at its fixed end: give only moments: {left}");
                forbid(m, right, "right", "a cantilever is fixed at its left end: give only moments: {left}");
            }
        }
        if (left != null && left > 0) {
            throw m.error("left", "a support moment is hogging: expected a negative value (top in tension)");
        }
        if (right != null && right > 0) {
            throw m.error("right", "a support moment is hogging: expected a negative value (top in tension)");
        }
        if (mid != null && mid < 0) {
            throw m.error("mid", "the mid-span moment is sagging: expected a positive value (bottom in tension)");
        }
        if (left != null && left == 0) {
            left = null; // a zero support moment is a simple support
        }
        if (right != null && right == 0) {
            right = null;
        }
        Double vl = null;
        Double vr = null;
        if (b.has("shear")) {
            YFields v = b.map("shear", "the factored shears at d from the faces {left, right}")
                    .allowOnly("left", "right");
            vl = v.has("left")
                    ? u.toSI(
                            InputLimits.require(
                                    v,
                                    "left",
                                    InputLimits.SHEAR,
                                    u,
                                    v.nonNegative("left", "the factored shear at the left end, " + u.unit(Dim.FORCE))),
                            Dim.FORCE)
                    : null;
            vr = v.has("right")
                    ? u.toSI(
                            InputLimits.require(
                                    v,
                                    "right",
                                    InputLimits.SHEAR,
                                    u,
                                    v.nonNegative(
                                            "right", "the factored shear at the right end, " + u.unit(Dim.FORCE))),
                            Dim.FORCE)
                    : null;
            if (ends == EndCondition.CANTILEVER && vr != null) {
                throw v.error("right", "a cantilever has its shear at the fixed (left) end only");
            }
        }
        SpanChecks.ServiceLoads service = null;
        if (b.has("service")) {
            YFields s = b.map("service", "service loads {dead, live}").allowOnly("dead", "live", "sustained_live");
            double dead = u.toSI(
                    InputLimits.require(
                            s,
                            "dead",
                            InputLimits.LINE_LOAD,
                            u,
                            s.positive("dead", "service dead load, " + u.unit(Dim.LINE_LOAD))),
                    Dim.LINE_LOAD);
            double live = u.toSI(
                    InputLimits.require(
                            s,
                            "live",
                            InputLimits.LINE_LOAD,
                            u,
                            s.nonNegative("live", "service live load, " + u.unit(Dim.LINE_LOAD))),
                    Dim.LINE_LOAD);
            double sus = s.optNumber("sustained_live", "the sustained part of the live load, 0 to 1")
                    .orElse(0.0);
            if (sus < 0 || sus > 1) {
                throw s.error(
                        "sustained_live",
                        "expected the sustained part of the live load from 0 to 1, got " + SettingsReader.fmt(sus));
            }
            service = new SpanChecks.ServiceLoads(dead, live, sus);
        }
        SpanChecks.Limits limits = SpanChecks.Limits.DEFAULT;
        if (b.has("deflection_limits")) {
            YFields d = b.map("deflection_limits", "deflection limits as span divisors {live, total}")
                    .allowOnly("live", "total");
            limits = new SpanChecks.Limits(
                    d.optPositive("live", "span divisor for live-load deflection, e.g. 360")
                            .map(x -> InputLimits.require(d, "live", InputLimits.SPAN_DIVISOR, u, x))
                            .orElse(360.0),
                    d.optPositive("total", "span divisor for long-term deflection, e.g. 240")
                            .map(x -> InputLimits.require(d, "total", InputLimits.SPAN_DIVISOR, u, x))
                            .orElse(240.0));
        }
        boolean anchored = b.optBool("bottom_anchored_at_supports").orElse(false);
        SpanTorsion torsion = b.has("torsion") ? torsion(b, ends, u) : null;
        return new DesignBeam.WholeSpan(left, mid, right, vl, vr, service, limits, anchored, torsion);
    }

    /**
     * A whole span's factored torsion: {@code torsion: {left, right, mid, kind}} (at d from the faces and at
     * mid-span, 0 where not given; {@code kind: compatibility | equilibrium}, equilibrium by default).
     */
    private static SpanTorsion torsion(YFields b, EndCondition ends, UnitSystem u) {
        if (!(b.node("torsion") instanceof YMap)) {
            throw b.error(
                    "torsion",
                    "a whole span gives its torsion as torsion: {left, right, mid, kind} (factored, "
                            + u.unit(Dim.MOMENT) + "); the form torsion: compatibility goes beside Tu on one section");
        }
        YFields t = b.map("torsion", "the factored torsion {left, right, mid, kind}")
                .allowOnly("left", "right", "mid", "kind");
        if (ends == EndCondition.CANTILEVER) {
            throw b.error(
                    "torsion",
                    "torsion on a cantilever is not designed as a whole span; check its fixed-end section "
                            + "under Tu with barfit check");
        }
        if (!t.has("left") && !t.has("right")) {
            throw new InputError(
                    t.location(),
                    t.path() + ": expected the factored torsion at the critical sections, left and/or right, "
                            + u.unit(Dim.MOMENT));
        }
        String unit = u.unit(Dim.MOMENT);
        double left = torsionAt(t, "left", "the factored torsion at d from the left face, " + unit, u);
        double right = torsionAt(t, "right", "the factored torsion at d from the right face, " + unit, u);
        double mid = torsionAt(t, "mid", "the factored torsion at mid-span, " + unit + " (0 by default)", u);
        boolean compatibility = false;
        if (t.has("kind")) {
            String kind = t.text("kind", "compatibility or equilibrium");
            compatibility = switch (kind) {
                case "compatibility" -> true;
                case "equilibrium" -> false;
                default ->
                    throw t.error("kind", "expected compatibility or equilibrium, got \"" + Echo.cut(kind) + "\"");
            };
        }
        return new SpanTorsion(left, mid, right, compatibility);
    }

    private static double torsionAt(YFields t, String key, String expected, UnitSystem u) {
        if (!t.has(key)) {
            return 0;
        }
        return u.toSI(InputLimits.require(t, key, InputLimits.TORSION, u, t.nonNegative(key, expected)), Dim.MOMENT);
    }

    private static void need(YFields m, Double v, String key, String message) {
        if (v == null) {
            throw new InputError(m.location(), m.path() + ": missing " + key + "; " + message);
        }
    }

    private static void forbid(YFields m, Double v, String key, String message) {
        if (v != null) {
            throw m.error(key, message);
        }
    }
}
