package barfit.section;

import barfit.catalogs.BarSize;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * One trial: the concrete section, its materials and detailing, every longitudinal bar layer, and the
 * stirrups and skin bars if any. Immutable; the search builds many of these, the check one.
 */
public record BeamSection(
        SectionShape shape,
        Materials materials,
        Detailing detailing,
        List<BarLayer> layers,
        Stirrups stirrups,
        SkinBars skin,
        CodeEquations code) {

    public BeamSection {
        layers = List.copyOf(layers);
    }

    /** The layers on one face, from the face inward. */
    public List<BarLayer> layersOn(Face face) {
        List<BarLayer> out = new ArrayList<>();
        for (BarLayer l : layers) {
            if (l.face() == face) {
                out.add(l);
            }
        }
        out.sort(Comparator.comparingDouble(BarLayer::fromFace));
        return out;
    }

    /** Distance from the top face to a layer's centroid. */
    public double depthFromTop(BarLayer l) {
        return l.face() == Face.TOP ? l.fromFace() : shape.height() - l.fromFace();
    }

    /** Distance from the extreme compression fibre to a layer's centroid, for the given bending. */
    public double depthFromCompression(BarLayer l, Bending b) {
        return l.face() == b.compressionFace() ? l.fromFace() : shape.height() - l.fromFace();
    }

    public BeamSection withLayers(List<BarLayer> newLayers) {
        return new BeamSection(shape, materials, detailing, newLayers, stirrups, skin, code);
    }

    public BeamSection withStirrups(Stirrups s) {
        return new BeamSection(shape, materials, detailing, layers, s, skin, code);
    }

    /** A bar size and count, before it has a position. */
    public record BarGroup(BarSize bar, int count) {}

    /**
     * Default layer positions on one face: the first layer's centroid at cover + stirrup + db/2, each
     * further layer {@code layerGap} clear inward of the one before (25.2.2).
     */
    public static List<BarLayer> stack(Face face, List<BarGroup> groups, Detailing detailing) {
        List<BarLayer> out = new ArrayList<>();
        double prevCentroid = 0;
        double prevDb = 0;
        for (int i = 0; i < groups.size(); i++) {
            BarGroup g = groups.get(i);
            double db = g.bar().diameter();
            double y = i == 0
                    ? detailing.firstLayerCentroid(db)
                    : prevCentroid + prevDb / 2 + detailing.layerGap() + db / 2;
            out.add(new BarLayer(face, g.bar(), g.count(), y));
            prevCentroid = y;
            prevDb = db;
        }
        return out;
    }
}
