package barfit.input;

import barfit.catalogs.BarSize;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.catalogs.yaml.YFields;
import barfit.section.BarLayer;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Face;
import barfit.section.Flange;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.Span;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Reads the per-beam pieces shared by the commands: sections, flanges, bar layers, stirrups, spans. */
public final class SectionReader {
    private final Settings settings;
    private final UnitSystem u;

    public SectionReader(Settings settings) {
        this.settings = settings;
        this.u = settings.units();
    }

    /** A positive length within {@code range} (null: no range), in mm. */
    public double length(YFields f, String key, String what, InputLimits.Range range) {
        double v = f.positive(key, what + ", " + u.unit(Dim.LENGTH));
        if (range != null) {
            InputLimits.require(f, key, range, u, v);
        }
        return u.toSI(v, Dim.LENGTH);
    }

    public Optional<Double> optLength(YFields f, String key, String what, InputLimits.Range range) {
        return f.has(key) ? Optional.of(length(f, key, what, range)) : Optional.empty();
    }

    /**
     * A flange as given: its width, slab thickness, type and, optionally, the clear distance to the next
     * web. {@code span} (may be null) is the beam's span, taken as the clear span ln of Table 6.3.2.1; the
     * section model takes the flange at its effective width on each web it is put on.
     */
    public Flange flange(YFields f, double webWidth, Span span) {
        f.allowOnly("width", "thickness", "type", "clear_to_next_web");
        double bf = length(f, "width", "flange width", InputLimits.FLANGE_WIDTH);
        double hf = length(f, "thickness", "flange (slab) thickness", InputLimits.FLANGE_THICKNESS);
        Double sw = optLength(
                        f, "clear_to_next_web", "the clear distance from the web to the next web", InputLimits.WEB_GAP)
                .orElse(null);
        boolean oneSided = false;
        if (f.has("type")) {
            String t = f.text("type", "T or L");
            if (t.equals("L")) {
                oneSided = true;
            } else if (!t.equals("T")) {
                throw f.error("type", "expected T (flange on both sides) or L (one side), got \"" + Echo.cut(t) + "\"");
            }
        }
        if (bf < webWidth) {
            throw f.error(
                    "width",
                    "the flange (" + fmt(bf, Dim.LENGTH) + ") is narrower than the web (" + fmt(webWidth, Dim.LENGTH)
                            + "); expected flange width >= web width");
        }
        return Flange.given(bf, hf, oneSided, sw, span == null ? null : span.length());
    }

    /** The section of a check beam; {@code span} (may be null) bounds its flange's effective width. */
    public SectionShape shape(YFields sec, Span span) {
        sec.allowOnly("width", "height", "flange");
        double b = length(sec, "width", "web width", InputLimits.WEB_WIDTH);
        double h = length(sec, "height", "total height", InputLimits.HEIGHT);
        Flange flange = null;
        if (sec.has("flange")) {
            YFields f = sec.map("flange", "the flange: {width, thickness}");
            flange = flange(f, b, span);
            if (flange.thickness() >= h) {
                throw f.error("thickness", "the flange is as thick as the whole section; expected thickness < height");
            }
        }
        double minSide =
                2 * (settings.detailing().cover() + settings.stirrupBar().diameter());
        if (b <= minSide) {
            throw sec.error(
                    "width",
                    "a web of " + fmt(b, Dim.LENGTH) + " leaves no room inside cover and stirrups ("
                            + fmt(minSide, Dim.LENGTH) + "); expected a wider web");
        }
        if (h <= minSide) {
            throw sec.error(
                    "height",
                    "a height of " + fmt(h, Dim.LENGTH) + " leaves no room inside cover and stirrups ("
                            + fmt(minSide, Dim.LENGTH) + "); expected a deeper section");
        }
        return new SectionShape(b, h, flange);
    }

    /** Layers of one face, from the face inward; default depths stack them at the layer gap. */
    public List<BarLayer> layers(YFields beam, String key, Face face, SectionShape shape) {
        List<YFields> items = beam.listOfMaps(key, "bar layers {bar, count}");
        List<BarLayer> out = new ArrayList<>();
        Detailing det = settings.detailing();
        double prevCentroid = 0;
        double prevDb = 0;
        for (int i = 0; i < items.size(); i++) {
            YFields l = items.get(i).allowOnly("bar", "count", "depth");
            BarSize bar = bar(l, "bar");
            int count = l.positiveInt("count", "number of bars in the layer");
            double db = bar.diameter();
            double stacked = i == 0 ? det.firstLayerCentroid(db) : prevCentroid + prevDb / 2 + det.layerGap() + db / 2;
            double y = stacked;
            if (l.has("depth")) {
                y = length(l, "depth", "distance from the " + face.word() + " face to the layer's centroid", null);
                double least = det.firstLayerCentroid(db);
                if (y < least - 1e-6) {
                    throw l.error(
                            "depth",
                            "a depth of " + fmt(y, Dim.LENGTH)
                                    + " puts the bars inside the cover; expected at least cover + stirrup + db/2 = "
                                    + fmt(least, Dim.LENGTH));
                }
                if (i > 0 && y <= prevCentroid) {
                    throw l.error(
                            "depth",
                            "layers are listed from the " + face.word()
                                    + " face inward; expected a depth greater than the layer before ("
                                    + fmt(prevCentroid, Dim.LENGTH) + ")");
                }
            }
            double inner = BarSpacing.innerWidth(shape.width(), det);
            if (count * db > inner + 1e-9) {
                throw new InputError(
                        l.location(),
                        l.path() + ": " + count + " " + bar.label() + " bars need "
                                + fmt(count * db, Dim.LENGTH) + " side by side but only " + fmt(inner, Dim.LENGTH)
                                + " lies between the stirrup legs; expected fewer or smaller bars, or a wider web");
            }
            if (y + db / 2 > shape.height() - det.cover() - det.stirrupBar().diameter() + 1e-9) {
                throw new InputError(
                        l.location(),
                        l.path() + ": the layer at " + fmt(y, Dim.LENGTH) + " from the "
                                + face.word() + " face falls outside the section's height "
                                + fmt(shape.height(), Dim.LENGTH)
                                + "; expected fewer layers or a deeper section");
            }
            out.add(new BarLayer(face, bar, count, y));
            prevCentroid = y;
            prevDb = db;
        }
        return out;
    }

    /** Rejects top and bottom bars that would occupy the same place. */
    public void requireNoOverlap(YFields beam, List<BarLayer> bottom, List<BarLayer> top, double h) {
        for (BarLayer b : bottom) {
            for (BarLayer t : top) {
                double yb = h - b.fromFace();
                double yt = t.fromFace();
                if (yb - yt < (b.bar().diameter() + t.bar().diameter()) / 2 + 1e-9) {
                    throw new InputError(
                            beam.locationOf("top"),
                            beam.path() + ": the bottom layer at "
                                    + fmt(b.fromFace(), Dim.LENGTH) + " from the bottom and the top layer at "
                                    + fmt(t.fromFace(), Dim.LENGTH) + " from the top overlap in a section "
                                    + fmt(h, Dim.LENGTH) + " high; expected fewer layers or a deeper section");
                }
            }
        }
    }

    public Stirrups stirrups(YFields s) {
        s.allowOnly("bar", "legs", "spacing");
        BarSize bar = s.has("bar") ? bar(s, "bar") : settings.stirrupBar();
        int legs = s.has("legs") ? s.positiveInt("legs", "number of vertical legs, 2 or more") : 2;
        if (legs < 2) {
            throw s.error("legs", "expected at least 2 legs (a closed stirrup), got " + legs);
        }
        if (legs > InputLimits.MAX_LEGS) {
            throw s.error("legs", "expected 2 to " + InputLimits.MAX_LEGS + " legs, got " + legs);
        }
        double spacing = length(s, "spacing", "stirrup spacing along the beam", InputLimits.STIRRUP_SPACING);
        return new Stirrups(bar, legs, spacing);
    }

    public SkinBars skin(YFields s) {
        s.allowOnly("bar", "spacing");
        return new SkinBars(
                bar(s, "bar"), length(s, "spacing", "vertical spacing of skin bars", InputLimits.SKIN_SPACING));
    }

    public EndCondition ends(YFields beam) {
        String e = beam.text("ends", "simple, one-end-continuous, both-ends-continuous or cantilever");
        EndCondition ec = EndCondition.byKey(e);
        if (ec == null) {
            throw beam.error(
                    "ends",
                    "expected simple, one-end-continuous, both-ends-continuous or cantilever, got \"" + Echo.cut(e)
                            + "\"");
        }
        return ec;
    }

    public Span span(YFields beam) {
        Double len = beam.optPositive("span", "span length, " + u.unit(Dim.SPAN))
                .map(v -> u.toSI(InputLimits.require(beam, "span", InputLimits.SPAN, u, v), Dim.SPAN))
                .orElse(null);
        EndCondition ends = beam.has("ends") ? ends(beam) : null;
        if (ends != null && len == null) {
            throw beam.error("ends", "ends given without a span; expected span: <length in " + u.unit(Dim.SPAN) + ">");
        }
        return len == null ? null : new Span(len, ends);
    }

    public BarSize bar(YFields f, String key) {
        String name =
                f.text(key, "a bar size from catalog " + settings.catalog().id());
        return SettingsReader.bar(settings.catalog(), name, f.locationOf(key), f.child(key));
    }

    public String fmt(double si, Dim d) {
        return u.compact(si, d) + " " + u.unit(d);
    }

    public Location location(YFields f) {
        return f.location();
    }

    public BeamSection section(SectionShape shape, List<BarLayer> layers, Stirrups stirrups, SkinBars skin) {
        return new BeamSection(
                shape, settings.materials(), settings.detailing(), layers, stirrups, skin, settings.code());
    }
}
