package barfit.section;

/**
 * Immediate and long-term deflection of a beam (24.2): gross and cracked transformed moments of
 * inertia, the cracking moment, the effective moment of inertia of Table 24.2.3.5 and the long-term
 * multiplier of 24.2.4.1. Lengths mm, forces N, moments N·mm.
 */
public final class Deflection {
    /** Stiffness data of one section for one direction of bending. */
    public record Stiffness(double ig, double yt, double mcr, double icr, double kd, double n, double ec) {}

    private Deflection() {}

    /**
     * Ec = 4700 √f'c (19.2.2.1(b), normal-weight concrete; 57 000 √f'c in psi). For lightweight concrete
     * (λ < 1) the density is not known, so 19.2.2.1(a) is taken at its lightest, wc = 1440 kg/m³ (90 lb/ft³):
     * the lowest Ec, which gives the largest deflections.
     */
    public static double ec(Materials m, CodeEquations code) {
        return code.ec().si() * lightweightEcFactor(m, code) * Math.sqrt(m.fc());
    }

    /** Ec of 19.2.2.1(a) at the lightest density over the normal-weight Ec; 1 for normal-weight concrete. */
    public static double lightweightEcFactor(Materials m, CodeEquations code) {
        if (m.lambda() >= 1) {
            return 1;
        }
        return code.inchPound() ? 33 * Math.pow(90, 1.5) / 57_000 : 0.043 * Math.pow(1440, 1.5) / 4700;
    }

    /** fr = 0.62 λ √f'c (19.2.3.1). */
    public static double fr(Materials m, CodeEquations code) {
        return code.fr().si() * m.lambda() * Math.sqrt(m.fc());
    }

    /**
     * Gross and cracked stiffness of a section. The cracked transformed section takes every bar layer at
     * its own depth: a layer below the neutral axis as n As, a layer above it (in compression, displacing
     * concrete) as (n − 1) As. kd is the root of the first moment of that section about the neutral axis.
     *
     * @param shape the section; its flange counts only when it is on the compression side
     * @param depth each bar layer's depth from the extreme compression fibre of this bending, mm
     * @param area  each bar layer's area, mm²
     */
    public static Stiffness stiffness(
            SectionShape shape, Bending bending, Materials m, CodeEquations code, double[] depth, double[] area) {
        if (depth.length != area.length) {
            throw new IllegalArgumentException("one area per layer depth");
        }
        double ec = ec(m, code);
        double n = code.es() / ec;
        double h = shape.height();
        double bw = shape.width();
        Flange f = bending == Bending.SAGGING ? shape.flange() : null;
        double bf = f == null ? bw : f.width();
        double hf = f == null ? 0 : f.thickness();
        // gross section (flange on the compression side only), measured from the compression face
        double grossArea = bw * h + (bf - bw) * hf;
        double firstMoment = bw * h * h / 2 + (bf - bw) * hf * hf / 2;
        double yc = firstMoment / grossArea;
        double ig = bw * h * h * h / 12
                + bw * h * sq(h / 2 - yc)
                + (bf - bw) * hf * hf * hf / 12
                + (bf - bw) * hf * sq(hf / 2 - yc);
        double yt = h - yc;
        double mcr = fr(m, code) * ig / yt;
        double kd = crackedNeutralAxis(bf, hf, bw, n, depth, area);
        double icr = compressionInertia(bf, hf, bw, kd);
        for (int i = 0; i < depth.length; i++) {
            icr += transformed(n, depth[i], kd) * area[i] * sq(depth[i] - kd);
        }
        return new Stiffness(ig, yt, mcr, icr, kd, n, ec);
    }

    /** The modular ratio a bar at {@code depth} counts with for a neutral axis at {@code x}: n below, n − 1 above. */
    private static double transformed(double n, double depth, double x) {
        return depth < x ? n - 1 : n;
    }

    private static double sq(double x) {
        return x * x;
    }

    private static double compressionFirstMoment(double bf, double hf, double bw, double x) {
        // first moment of the concrete above the neutral axis at depth x, about that axis
        if (x <= hf || hf == 0) {
            double b = hf == 0 ? bw : bf;
            return b * x * x / 2;
        }
        return bf * hf * (x - hf / 2) + bw * (x - hf) * (x - hf) / 2;
    }

    private static double compressionInertia(double bf, double hf, double bw, double x) {
        if (x <= hf || hf == 0) {
            double b = hf == 0 ? bw : bf;
            return b * x * x * x / 3;
        }
        double web = x - hf;
        return bf * hf * hf * hf / 12 + bf * hf * sq(x - hf / 2) + bw * web * web * web / 3;
    }

    /**
     * kd: where the first moment of the cracked transformed section about the axis vanishes. That moment
     * grows with the axis depth (its derivative is the transformed area above the axis plus that below),
     * is negative at the compression face and positive at the deepest bar, so the root is unique.
     */
    private static double crackedNeutralAxis(double bf, double hf, double bw, double n, double[] depth, double[] area) {
        double lo = 0;
        double hi = 0;
        for (double d : depth) {
            hi = Math.max(hi, d);
        }
        for (int i = 0; i < 200; i++) {
            double x = 0.5 * (lo + hi);
            double balance = compressionFirstMoment(bf, hf, bw, x);
            for (int j = 0; j < depth.length; j++) {
                balance += transformed(n, depth[j], x) * area[j] * (x - depth[j]);
            }
            if (balance > 0) {
                hi = x;
            } else {
                lo = x;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** Table 24.2.3.5: Ie = Ig if Ma ≤ (2/3) Mcr, else Icr / (1 − ((2/3) Mcr / Ma)² (1 − Icr / Ig)). */
    public static double ie(double ma, Stiffness s) {
        double m = Math.abs(ma);
        double threshold = 2.0 / 3.0 * s.mcr();
        if (m <= threshold) {
            return s.ig();
        }
        double ie = s.icr() / (1 - Math.pow(threshold / m, 2) * (1 - s.icr() / s.ig()));
        return Math.min(ie, s.ig());
    }

    /** 24.2.4.1.1: λΔ = ξ / (1 + 50 ρ'), with ξ = 2.0 for five years or more (Table 24.2.4.1.3). */
    public static double lambdaDelta(double rhoPrime) {
        return 2.0 / (1 + 50 * rhoPrime);
    }

    /**
     * Mid-span deflection of a span under a uniform load from its moments (positive magnitudes):
     * simple span 5 M L² / (48 Ec Ie); continuous spans 5 L² / (48 Ec Ie) (Mmid − 0.1 (Mleft + Mright));
     * cantilever (tip) M L² / (4 Ec Ie). (Common practice for uniformly loaded spans, no clause.)
     */
    public static double spanDeflection(
            EndCondition ends, double length, double ec, double ie, double mLeft, double mMid, double mRight) {
        double l2 = length * length;
        return switch (ends) {
            case SIMPLE -> 5 * mMid * l2 / (48 * ec * ie);
            case ONE_END_CONTINUOUS, BOTH_ENDS_CONTINUOUS -> 5 * l2 / (48 * ec * ie) * (mMid - 0.1 * (mLeft + mRight));
            case CANTILEVER -> Math.max(mLeft, mRight) * l2 / (4 * ec * ie);
        };
    }
}
