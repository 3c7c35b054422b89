package barfit.catalogs;

import barfit.catalogs.yaml.Location;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YNode;
import barfit.catalogs.yaml.YamlReader;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Loads bar catalogs: the built-in ones by id, or a user's YAML file by path. Each entry is validated
 * against its own geometry (area within 2 % of pi d²/4, mass within 2 % of area x 7850 kg/m³), so a
 * typing error in a catalog cannot silently change every design.
 */
public final class BarCatalogs {
    public static final List<String> BUILT_IN = List.of("astm-a615m", "astm-a615", "metric-mm");

    /** Density of steel, kg/m³ (common practice, no source: the value used for bar unit masses). */
    public static final double STEEL_DENSITY = 7850.0;

    static final double TOLERANCE = 0.02;
    private static final double MM_PER_IN = 25.4;
    private static final double KG_PER_LB = 0.45359237;
    private static final double M_PER_FT = 0.3048;

    private static final Map<String, BarCatalog> CACHE = new ConcurrentHashMap<>();

    private BarCatalogs() {}

    /** A built-in catalog by id. */
    public static Optional<BarCatalog> builtIn(String id) {
        if (!BUILT_IN.contains(id)) {
            return Optional.empty();
        }
        return Optional.of(CACHE.computeIfAbsent(id, BarCatalogs::loadResource));
    }

    private static BarCatalog loadResource(String id) {
        String res = "/barfit/catalogs/bars/" + id + ".yaml";
        try (InputStream in = BarCatalogs.class.getResourceAsStream(res)) {
            if (in == null) {
                throw new IllegalStateException("built-in catalog missing from the build: " + res);
            }
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            return parse(YamlReader.read(text, id + ".yaml"));
        } catch (IOException e) {
            throw new IllegalStateException("cannot read built-in catalog " + res, e);
        }
    }

    /** A user's catalog file. */
    public static BarCatalog load(Path file) {
        return parse(YamlReader.read(file));
    }

    /** Parses and validates a catalog document. */
    public static BarCatalog parse(YNode root) {
        YFields doc =
                YFields.of(root, "", "a bar catalog").allowOnly("id", "title", "source", "units", "label", "bars");
        String id = doc.text("id", "the catalog's id");
        String title = doc.optText("title", "a title").orElse(id);
        String source = doc.optText("source", "where the data come from").orElse("");
        String units = doc.text("units", "SI (mm, mm2, kg/m) or US (in, in2, lb/ft)");
        boolean us;
        if (units.equals("SI")) {
            us = false;
        } else if (units.equals("US")) {
            us = true;
        } else {
            throw doc.error(
                    "units", "expected SI (mm, mm2, kg/m) or US (in, in2, lb/ft), got \"" + Echo.cut(units) + "\"");
        }
        String labelPattern =
                doc.optText("label", "a label pattern such as \"#{size}\"").orElse("{size}");
        if (!labelPattern.contains("{size}")) {
            throw doc.error("label", "expected a pattern containing {size}, such as \"#{size}\"");
        }
        List<BarSize> bars = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        List<YFields> entries = doc.listOfMaps("bars", "bar entries");
        if (entries.isEmpty()) {
            throw doc.error("bars", "expected at least one bar entry");
        }
        for (YFields e : entries) {
            e.allowOnly("size", "diameter", "area", "mass");
            String size = e.text("size", "the bar's designation, e.g. \"29\"");
            if (!seen.add(BarCatalog.normalise(size))) {
                throw e.error("size", "bar size \"" + Echo.cut(size) + "\" appears twice; expected each size once");
            }
            String dUnit = us ? "in" : "mm";
            double d = e.positive("diameter", "nominal diameter, " + dUnit);
            double dMm = us ? d * MM_PER_IN : d;
            double areaFromD = Math.PI * dMm * dMm / 4.0;
            double areaMm2;
            if (e.has("area")) {
                double a = e.positive("area", "nominal area, " + (us ? "in2" : "mm2"));
                areaMm2 = us ? a * MM_PER_IN * MM_PER_IN : a;
                double dev = Math.abs(areaMm2 - areaFromD) / areaFromD;
                if (dev > TOLERANCE) {
                    throw entryError(
                            e,
                            "area",
                            size,
                            String.format(
                                    java.util.Locale.ROOT,
                                    "area %s differs from pi d^2/4 = %s by %.1f %%; expected within 2 %%",
                                    trim(a),
                                    trim(us ? areaFromD / (MM_PER_IN * MM_PER_IN) : areaFromD),
                                    100 * dev));
                }
            } else {
                areaMm2 = areaFromD;
            }
            double massFromArea = areaMm2 * 1e-6 * STEEL_DENSITY; // kg/m
            double massKgM;
            if (e.has("mass")) {
                double m = e.positive("mass", "unit mass, " + (us ? "lb/ft" : "kg/m"));
                massKgM = us ? m * KG_PER_LB / M_PER_FT : m;
                double dev = Math.abs(massKgM - massFromArea) / massFromArea;
                if (dev > TOLERANCE) {
                    double expect = us ? massFromArea * M_PER_FT / KG_PER_LB : massFromArea;
                    throw entryError(
                            e,
                            "mass",
                            size,
                            String.format(
                                    java.util.Locale.ROOT,
                                    "mass %s differs from area x 7850 kg/m3 = %s by %.1f %%; expected within 2 %%",
                                    trim(m),
                                    trim(expect),
                                    100 * dev));
                }
            } else {
                massKgM = massFromArea;
            }
            bars.add(new BarSize(size, labelPattern.replace("{size}", size), dMm, areaMm2, massKgM));
        }
        for (int i = 1; i < bars.size(); i++) {
            if (bars.get(i).diameter() <= bars.get(i - 1).diameter()) {
                throw new InputError(
                        entries.get(i).location(),
                        "bars: size \"" + bars.get(i).designation()
                                + "\" is not larger than the one before; expected sizes from smallest to largest");
            }
        }
        return new BarCatalog(id, title, source, bars);
    }

    private static InputError entryError(YFields e, String key, String size, String message) {
        Location at = e.map().get(key).location();
        return new InputError(at, "bar \"" + size + "\": " + message);
    }

    private static String trim(double v) {
        String s = String.format(java.util.Locale.ROOT, "%.4g", v);
        if (s.contains(".") && !s.contains("e")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
