package barfit.input;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YNode;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Exposure;
import barfit.section.MaterialLimits;
import barfit.section.Materials;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/** Reads the project-wide keys every command shares. */
public final class SettingsReader {
    /** Top-level keys any command accepts; each command reads the ones it needs. */
    private static final String[] TOP_KEYS = {
        "units",
        "code",
        "concrete",
        "steel",
        "bars",
        "cover",
        "stirrup",
        "layer_gap",
        "exposure",
        "beams",
        "lines",
        "search",
        "costs",
        "carbon",
        "rationalise",
        "project"
    };

    private SettingsReader() {}

    public static Settings read(YFields doc, Path file) {
        doc.allowOnly(TOP_KEYS);
        String unitsText = doc.text("units", "SI or US");
        UnitSystem units;
        switch (unitsText.toUpperCase(Locale.ROOT)) {
            case "SI" -> units = UnitSystem.SI;
            case "US" -> units = UnitSystem.US;
            default ->
                throw doc.error(
                        "units",
                        "expected SI (mm, MPa, kN, kN·m, m) or US (in, psi, kip, kip·ft, ft), got \""
                                + Echo.cut(unitsText) + "\"");
        }
        if (doc.has("code")) {
            String code = doc.text("code", "ACI 318-19");
            if (!code.replace(" ", "").equalsIgnoreCase("ACI318-19")) {
                throw doc.error(
                        "code", "expected ACI 318-19 (the only code barfit checks), got \"" + Echo.cut(code) + "\"");
            }
        }
        CodeEquations code = units.code();
        boolean us = units == UnitSystem.US;

        YFields concrete =
                doc.map("concrete", "the concrete: {fc, aggregate}").allowOnly("fc", "aggregate", "lambda", "density");
        double fc = toSI(units, concrete.positive("fc", "f'c, " + units.unit(Dim.STRESS)), Dim.STRESS);
        double fcMin = units.limit(MaterialLimits.fcMin(code), Dim.STRESS);
        double fcMax = units.limit(MaterialLimits.fcMax(code), Dim.STRESS);
        double fcUser = units.fromSI(fc, Dim.STRESS);
        if (fcUser < fcMin * (1 - 1e-9) || fcUser > fcMax) {
            throw concrete.error(
                    "fc",
                    "expected f'c between " + fmt(fcMin) + " and " + fmt(fcMax) + " "
                            + units.unit(Dim.STRESS) + " (Table 19.2.1.1 sets the minimum), got " + fmt(fcUser)
                            + stressHint(units, fcUser, fcMin, fcMax));
        }
        double agg = concrete.optPositive("aggregate", "maximum aggregate size, " + units.unit(Dim.LENGTH))
                .map(v -> toSI(
                        units, InputLimits.require(concrete, "aggregate", InputLimits.AGGREGATE, units, v), Dim.LENGTH))
                .orElse(us ? 0.75 * 25.4 : 20.0);
        String lambdaRange = MaterialLimits.LAMBDA_MIN + " to " + MaterialLimits.LAMBDA_MAX;
        double lambda = concrete.optPositive("lambda", "lightweight factor, " + lambdaRange)
                .orElse(MaterialLimits.LAMBDA_MAX);
        if (lambda < MaterialLimits.LAMBDA_MIN || lambda > MaterialLimits.LAMBDA_MAX) {
            throw concrete.error(
                    "lambda",
                    "expected the lightweight factor λ between " + MaterialLimits.LAMBDA_MIN + " and "
                            + MaterialLimits.LAMBDA_MAX + " (19.2.4), got " + fmt(lambda));
        }

        YFields steel = doc.map("steel", "the reinforcement: {fy}").allowOnly("fy", "fyt");
        double fy = toSI(units, steel.positive("fy", "fy, " + units.unit(Dim.STRESS)), Dim.STRESS);
        double fyUser = units.fromSI(fy, Dim.STRESS);
        double fyMin = us ? 40000 : 280;
        double fyMax = units.limit(code.fyMax(), Dim.STRESS);
        if (fyUser < fyMin * (1 - 1e-9) || fyUser > fyMax * (1 + 1e-9)) {
            throw steel.error(
                    "fy",
                    "expected fy between " + fmt(fyMin) + " and " + fmt(fyMax) + " "
                            + units.unit(Dim.STRESS) + " (Table 20.2.2.4(a) limits flexural bars to " + fmt(fyMax)
                            + "), got "
                            + fmt(fyUser) + stressHint(units, fyUser, fyMin, fyMax));
        }
        double fyt = steel.optPositive("fyt", "stirrup fyt, " + units.unit(Dim.STRESS))
                .map(v -> toSI(units, v, Dim.STRESS))
                .orElse(fy);
        double fytUser = units.fromSI(fyt, Dim.STRESS);
        double fytMax = units.limit(MaterialLimits.fytMax(code), Dim.STRESS);
        if (fytUser < fyMin * (1 - 1e-9) || fytUser > fytMax * (1 + 1e-9)) {
            throw steel.error(
                    "fyt",
                    "expected fyt between " + fmt(fyMin) + " and " + fmt(fytMax) + " " + units.unit(Dim.STRESS)
                            + ", got " + fmt(fytUser) + stressHint(units, fytUser, fyMin, fytMax));
        }

        BarCatalog catalog = catalog(doc, file, units);
        double cover = doc.optPositive("cover", "clear cover to the stirrups, " + units.unit(Dim.LENGTH))
                .map(v -> toSI(units, InputLimits.require(doc, "cover", InputLimits.COVER, units, v), Dim.LENGTH))
                .orElse(code.coverInterior());
        String stirrupName = doc.optText("stirrup", "the stirrup bar size").orElse(us ? "3" : "10");
        BarSize stirrup = bar(catalog, stirrupName, doc.locationOf("stirrup"), "stirrup");
        // layer_gap may stand at the top or under search: (where the search's other layout rules are)
        YFields gapAt = doc;
        if (doc.has("search")) {
            YFields search = doc.map("search", "the search space");
            if (search.has("layer_gap")) {
                if (doc.has("layer_gap")) {
                    throw search.error(
                            "layer_gap",
                            "layer_gap is given twice (also at line "
                                    + doc.locationOf("layer_gap").line() + "); expected it once");
                }
                gapAt = search;
            }
        }
        double gap = gapAt.optPositive("layer_gap", "clear gap between bar layers, " + units.unit(Dim.LENGTH))
                .map(v -> toSI(units, v, Dim.LENGTH))
                .orElse(code.minLayerGap());
        if (gap < code.minLayerGap() - 1e-9) {
            throw gapAt.error(
                    "layer_gap",
                    "a clear gap of " + fmt(units.fromSI(gap, Dim.LENGTH)) + " "
                            + units.unit(Dim.LENGTH) + " between layers is below 25.2.2; expected at least "
                            + fmt(units.fromSI(code.minLayerGap(), Dim.LENGTH)) + " " + units.unit(Dim.LENGTH));
        }
        InputLimits.require(gapAt, "layer_gap", InputLimits.LAYER_GAP, units, units.fromSI(gap, Dim.LENGTH));
        Exposure exposure = Exposure.INTERIOR;
        if (doc.has("exposure")) {
            String e = doc.text("exposure", "interior, weather or ground");
            exposure = Arrays.stream(Exposure.values())
                    .filter(x -> x.key().equals(e))
                    .findFirst()
                    .orElseThrow(() ->
                            doc.error("exposure", "expected interior, weather or ground, got \"" + Echo.cut(e) + "\""));
        }
        Materials materials = new Materials(fc, fy, fyt, agg, lambda);
        Detailing detailing = new Detailing(cover, stirrup, gap, exposure);
        return new Settings(file.toString(), units, materials, catalog, detailing, doc.location());
    }

    private static BarCatalog catalog(YFields doc, Path file, UnitSystem units) {
        String id = doc.optText("bars", "a built-in bar catalog id or a catalog file path")
                .orElse(units == UnitSystem.US ? "astm-a615" : "astm-a615m");
        var builtIn = BarCatalogs.builtIn(id);
        if (builtIn.isPresent()) {
            return builtIn.get();
        }
        Path base = file.toAbsolutePath().getParent();
        Path p = base == null ? Path.of(id) : base.resolve(id);
        if (!Files.exists(p)) {
            throw doc.error(
                    "bars",
                    "expected one of " + String.join(", ", BarCatalogs.BUILT_IN)
                            + " or the path of a catalog file, got \"" + Echo.cut(id) + "\" (no such file)");
        }
        return BarCatalogs.load(Path.of(id).isAbsolute() ? p : relativeToCwd(p));
    }

    private static Path relativeToCwd(Path p) {
        try {
            return Path.of("").toAbsolutePath().relativize(p);
        } catch (IllegalArgumentException e) {
            return p;
        }
    }

    /** Looks a bar size up, or fails at {@code where} listing the sizes the catalog has. */
    public static BarSize bar(BarCatalog catalog, String name, Location at, String path) {
        return catalog.find(name)
                .orElseThrow(() -> new InputError(
                        at,
                        path + ": bar size \"" + Echo.cut(name)
                                + "\" is not in catalog " + catalog.id() + "; expected one of: "
                                + String.join(", ", catalog.designations())));
    }

    static double toSI(UnitSystem u, double v, Dim d) {
        return u.toSI(v, d);
    }

    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e12) {
            return String.valueOf((long) v);
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }

    /** A beam's mark: any text but an empty one. */
    static String id(YFields beam) {
        String id = beam.text("id", "the beam's mark, e.g. B1");
        if (id.isEmpty()) {
            throw beam.error("id", "expected the beam's mark, e.g. B1, got an empty text");
        }
        return id;
    }

    /** A hint when a stress out of range would be in range in the other unit system's unit. */
    private static String stressHint(UnitSystem units, double v, double min, double max) {
        double psiPerMpa = CodeEquations.PSI_PER_MPA;
        if (units == UnitSystem.SI && v > max && v / psiPerMpa >= min && v / psiPerMpa <= max) {
            return " (did you give psi? SI stresses are in MPa, or write units: US)";
        }
        if (units == UnitSystem.US && v < min && v * psiPerMpa >= min && v * psiPerMpa <= max) {
            return " (did you give MPa? inch-pound stresses are in psi, or write units: SI)";
        }
        return "";
    }

    /** Reads the file and wraps the root as a map of settings. */
    public static YFields root(YNode node) {
        return YFields.of(node, "", "a barfit input (a map with units, concrete, steel, beams...)");
    }
}
