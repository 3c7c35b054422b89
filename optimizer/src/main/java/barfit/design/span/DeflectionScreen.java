package barfit.design.span;

import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.Deflection;
import barfit.section.SectionShape;
import barfit.section.SpanChecks;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Below Table 9.3.1.1: drops the options that fail deflection even with the stiffest partners the frame
 * offers (the largest Ie of every other section at every load level, the most compression steel), a bound
 * the section model's deflection functions make safe: a span's deflections only grow as the Ie of any of
 * its sections or ρ' falls. Partners must share the top bar size. What remains is settled by the CP-SAT
 * model's deflection cuts.
 */
final class DeflectionScreen {
    private final SpanProblem p;
    private final List<MidOption> mids = new ArrayList<>();
    private final List<SupportOption> lefts = new ArrayList<>();
    private final List<SupportOption> rights = new ArrayList<>();

    DeflectionScreen(
            SpanProblem problem,
            SpanSections sections,
            SpanFrame f,
            SectionShape shape,
            List<MidOption> allMids,
            List<SupportOption> allLefts,
            List<SupportOption> allRights) {
        this.p = problem;
        SpanChecks.ServiceMoments service = p.serviceMoments();
        double ec = Deflection.ec(p.materials(), p.code());
        // each option's Ie per service level and ρ' (a cantilever's mid-span section takes no part)
        Map<MidOption, double[]> midIe = new IdentityHashMap<>();
        Map<MidOption, Double> midRho = new IdentityHashMap<>();
        for (MidOption m : allMids) {
            BeamSection s = sections.mid(f, shape, m);
            midIe.put(m, p.cantilever() ? null : SpanChecks.ieLevels(s, Bending.SAGGING, service.mid()));
            midRho.put(m, p.cantilever() ? 0.0 : SpanChecks.rhoPrime(s, Bending.SAGGING));
        }
        Map<SupportOption, double[]> leftIe = new IdentityHashMap<>();
        Map<SupportOption, Double> leftRho = new IdentityHashMap<>();
        for (SupportOption l : allLefts) {
            BeamSection s = sections.support(f, shape, l);
            leftIe.put(l, SpanChecks.ieLevels(s, Bending.HOGGING, service.left()));
            leftRho.put(l, SpanChecks.rhoPrime(s, Bending.HOGGING));
        }
        Map<SupportOption, double[]> rightIe = new IdentityHashMap<>();
        for (SupportOption r : allRights) {
            rightIe.put(r, SpanChecks.ieLevels(sections.support(f, shape, r), Bending.HOGGING, service.right()));
        }
        // the stiffest partners per top bar size (by designation), computed once
        Map<String, double[]> stiffestLeft = new HashMap<>();
        Map<String, double[]> stiffestRight = new HashMap<>();
        Map<String, double[]> stiffestMidIe = new HashMap<>();
        Map<String, Double> mostMidRho = new HashMap<>();
        Map<String, Double> mostLeftRho = new HashMap<>();
        for (String topSize : topSizes(allMids, allLefts, allRights)) {
            mostMidRho.put(topSize, 0.0);
            mostLeftRho.put(topSize, 0.0);
        }
        for (SupportOption l : allLefts) {
            stiffestLeft.merge(l.bar().designation(), leftIe.get(l).clone(), DeflectionScreen::max);
            mostLeftRho.merge(l.bar().designation(), leftRho.get(l), Math::max);
        }
        for (SupportOption r : allRights) {
            stiffestRight.merge(r.bar().designation(), rightIe.get(r).clone(), DeflectionScreen::max);
        }
        for (MidOption m : allMids) {
            if (midIe.get(m) != null) {
                stiffestMidIe.merge(m.top().bar().designation(), midIe.get(m).clone(), DeflectionScreen::max);
            }
            mostMidRho.merge(m.top().bar().designation(), midRho.get(m), Math::max);
        }
        for (MidOption m : allMids) {
            String topSize = m.top().bar().designation();
            double rho = p.cantilever() ? mostLeftRho.get(topSize) : midRho.get(m);
            if (passes(ec, service, stiffestLeft.get(topSize), midIe.get(m), stiffestRight.get(topSize), rho)) {
                mids.add(m);
            }
        }
        for (SupportOption l : allLefts) {
            String topSize = l.bar().designation();
            double rho = p.cantilever() ? leftRho.get(l) : mostMidRho.get(topSize);
            if (passes(ec, service, leftIe.get(l), stiffestMidIe.get(topSize), stiffestRight.get(topSize), rho)) {
                lefts.add(l);
            }
        }
        for (SupportOption r : allRights) {
            String topSize = r.bar().designation();
            if (passes(
                    ec,
                    service,
                    stiffestLeft.get(topSize),
                    stiffestMidIe.get(topSize),
                    rightIe.get(r),
                    mostMidRho.get(topSize))) {
                rights.add(r);
            }
        }
    }

    private static Set<String> topSizes(List<MidOption> mids, List<SupportOption> lefts, List<SupportOption> rights) {
        Set<String> out = new TreeSet<>();
        mids.forEach(m -> out.add(m.top().bar().designation()));
        lefts.forEach(l -> out.add(l.bar().designation()));
        rights.forEach(r -> out.add(r.bar().designation()));
        return out;
    }

    /** Whether the span passes its deflection limits with these sections' Ie (null: none found) and ρ'. */
    private boolean passes(
            double ec, SpanChecks.ServiceMoments service, double[] left, double[] mid, double[] right, double rho) {
        if ((p.leftSupport() && left == null)
                || (p.rightSupport() && right == null)
                || (p.midSection() && mid == null)) {
            return false;
        }
        double[] deflections = SpanChecks.deflections(
                p.span(),
                p.ends(),
                ec,
                service,
                p.leftSupport() ? left : null,
                mid,
                p.rightSupport() ? right : null,
                rho);
        return SpanChecks.within(p.span(), p.limits(), deflections);
    }

    /** The larger of each pair of values, written into {@code into}. */
    private static double[] max(double[] into, double[] other) {
        for (int i = 0; i < into.length; i++) {
            into[i] = Math.max(into[i], other[i]);
        }
        return into;
    }

    List<MidOption> mids() {
        return mids;
    }

    List<SupportOption> lefts() {
        return lefts;
    }

    List<SupportOption> rights() {
        return rights;
    }
}
