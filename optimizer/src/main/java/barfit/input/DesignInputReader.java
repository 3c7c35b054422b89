package barfit.input;

import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YamlReader;
import barfit.design.SearchSpace;
import barfit.section.Flange;
import barfit.section.Span;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads a {@code design} file: settings, search, costs and beams with their demands and limits. */
public final class DesignInputReader {
    static final String[] BEAM_KEYS = {"id", "Mu", "Vu", "max_depth", "width", "flange", "span", "ends"};

    private DesignInputReader() {
    }

    public static DesignInput read(Path file) {
        YFields doc = SettingsReader.root(YamlReader.read(file));
        Settings settings = SettingsReader.read(doc, file);
        SearchSpace space = SearchReader.read(doc, settings);
        SearchReader.Costs costs = SearchReader.costs(doc, settings);
        SectionReader sr = new SectionReader(settings);
        UnitSystem u = settings.units();
        List<YFields> beams = doc.listOfMaps("beams", "beams");
        if (beams.isEmpty()) {
            throw doc.error("beams", "expected at least one beam");
        }
        List<DesignBeam> out = new ArrayList<>();
        Map<String, Integer> ids = new HashMap<>();
        for (YFields b : beams) {
            b.allowOnly(BEAM_KEYS);
            String id = b.text("id", "the beam's mark, e.g. B1");
            Integer first = ids.putIfAbsent(id, b.location().line());
            if (first != null) {
                throw b.error("id", "beam id \"" + id + "\" is used twice (first at line " + first + "); expected unique ids");
            }
            double mu = u.toSI(b.number("Mu", "the factored moment, " + u.unit(Dim.MOMENT) + " (+ sagging, − hogging)"),
                    Dim.MOMENT);
            Double vu = b.has("Vu") ? u.toSI(b.nonNegative("Vu", "the factored shear, " + u.unit(Dim.FORCE)), Dim.FORCE)
                    : null;
            Double cap = sr.optLength(b, "max_depth", "the headroom cap on the total height").orElse(null);
            Double width = sr.optLength(b, "width", "the fixed web width").orElse(null);
            Flange flange = null;
            if (b.has("flange")) {
                YFields ff = b.map("flange", "the flange: {width, thickness}");
                double minWeb = width != null ? width : space.widths().get(space.widths().size() - 1);
                flange = sr.flange(ff, minWeb);
            }
            Span span = sr.span(b);
            out.add(new DesignBeam(id, b.location(), mu, vu, cap, width, flange, span));
        }
        return new DesignInput(settings, space, costs.rates(), costs.currency(), out);
    }
}
