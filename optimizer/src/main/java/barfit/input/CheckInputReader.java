package barfit.input;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YMap;
import barfit.catalogs.yaml.YamlReader;
import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.Demand;
import barfit.section.Face;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.Span;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads a {@code check} file: settings plus beams with their sections, bars and demands. */
public final class CheckInputReader {
    static final String[] BEAM_KEYS = {
        "id", "section", "bottom", "top", "Mu", "Vu", "Tu", "torsion", "stirrups", "skin", "span", "ends"
    };

    private CheckInputReader() {}

    public static CheckInput read(Path file) {
        YFields doc = SettingsReader.root(YamlReader.read(file));
        Settings settings = SettingsReader.read(doc, file);
        SectionReader common = new SectionReader(settings);
        UnitSystem u = settings.units();
        List<CheckLine> lines = new ArrayList<>();
        if (doc.has("lines")) {
            List<LineInput> given = LinesReader.read(doc, settings, "bars");
            List<YFields> entries = doc.listOfMaps("lines", "beam lines");
            LineBarsReader bars = new LineBarsReader(settings);
            for (int i = 0; i < given.size(); i++) {
                lines.add(new CheckLine(given.get(i), bars.read(entries.get(i), given.get(i))));
            }
        }
        if (!doc.has("beams") && !lines.isEmpty()) {
            return new CheckInput(settings, List.of(), lines);
        }
        List<YFields> beams = doc.listOfMaps("beams", "beams");
        if (beams.isEmpty()) {
            throw doc.error("beams", "expected at least one beam");
        }
        List<CheckBeam> out = new ArrayList<>();
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
            // a beam's own stirrup bar sets where its bars sit (cover + stirrup + db/2), so it is read first
            Stirrups stirrups =
                    b.has("stirrups") ? common.stirrups(b.map("stirrups", "stirrups: {bar, legs, spacing}")) : null;
            SectionReader sr = stirrups == null ? common : new SectionReader(settings.withStirrupBar(stirrups.bar()));
            Span span = sr.span(b); // the flange's effective width depends on it
            SectionShape shape = sr.shape(b.map("section", "the section: {width, height}"), span);
            if (!b.has("bottom") && !b.has("top")) {
                throw new InputError(
                        b.location(),
                        b.path() + ": beam " + id
                                + " has no bars; expected bottom: [{bar, count}] and/or top: [{bar, count}]");
            }
            List<BarLayer> bottom = b.has("bottom") ? sr.layers(b, "bottom", Face.BOTTOM, shape) : List.of();
            List<BarLayer> top = b.has("top") ? sr.layers(b, "top", Face.TOP, shape) : List.of();
            sr.requireNoOverlap(b, bottom, top, shape.height());
            List<BarLayer> layers = new ArrayList<>(bottom);
            layers.addAll(top);
            Double mu = b.optNumber("Mu", "the factored moment, " + u.unit(Dim.MOMENT) + " (+ sagging, − hogging)")
                    .map(v -> u.toSI(InputLimits.require(b, "Mu", InputLimits.MOMENT, u, v), Dim.MOMENT))
                    .orElse(null);
            Double vu = null;
            if (b.has("Vu")) {
                double v = b.nonNegative("Vu", "the factored shear, " + u.unit(Dim.FORCE));
                vu = u.toSI(InputLimits.require(b, "Vu", InputLimits.SHEAR, u, v), Dim.FORCE);
            }
            Double tu = torsion(b, u);
            boolean compatibility = compatibilityTorsion(b, tu != null);
            SkinBars skin = b.has("skin") ? sr.skin(b.map("skin", "skin bars: {bar, spacing}")) : null;
            BeamSection section = sr.section(shape, layers, stirrups, skin);
            out.add(new CheckBeam(id, b.location(), section, new Demand(mu, vu, tu, compatibility), span));
        }
        return new CheckInput(settings, out, lines);
    }

    /** The factored torsion {@code Tu} (N·mm), or null where none is given. */
    static Double torsion(YFields b, UnitSystem u) {
        if (!b.has("Tu")) {
            return null;
        }
        double v = b.nonNegative("Tu", "the factored torsion, " + u.unit(Dim.MOMENT));
        return u.toSI(InputLimits.require(b, "Tu", InputLimits.TORSION, u, v), Dim.MOMENT);
    }

    /**
     * {@code torsion: compatibility} marks Tu as compatibility torsion, which 22.7.3.2 lets be reduced to φTcr
     * in a statically indeterminate structure; {@code equilibrium} (the default) keeps it as given.
     */
    static boolean compatibilityTorsion(YFields b, boolean hasTu) {
        if (!b.has("torsion")) {
            return false;
        }
        if (b.node("torsion") instanceof YMap) {
            throw b.error(
                    "torsion",
                    "torsion: {left, right} belongs to a whole span (with moments:); one section gives Tu and, "
                            + "beside it, torsion: compatibility | equilibrium");
        }
        String kind = b.text("torsion", "compatibility or equilibrium");
        boolean compatibility = switch (kind) {
            case "compatibility" -> true;
            case "equilibrium" -> false;
            default ->
                throw b.error("torsion", "expected compatibility or equilibrium, got \"" + Echo.cut(kind) + "\"");
        };
        if (!hasTu) {
            throw b.error("torsion", "says what kind of torsion Tu is, but no Tu is given; expected Tu beside it");
        }
        return compatibility;
    }
}
