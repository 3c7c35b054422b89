package barfit.design.span;

import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.SpanChecks;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The full verification of a span: each flexural section, each stirrup zone (with the design shear it was
 * checked for, null for minimum stirrups, and the design torsion, null where the span has none), and the
 * span checks.
 */
public record SpanReport(
        Map<SpanProblem.Place, CheckReport> sections,
        List<CheckResult> zoneChecks,
        List<Double> zoneShears,
        SpanChecks.Result span,
        barfit.section.trail.Trail zoneTrail,
        barfit.section.trail.Trail spanTrail,
        List<Double> zoneTorsions) {

    public List<CheckResult> all() {
        List<CheckResult> out = new ArrayList<>();
        sections.values().forEach(r -> out.addAll(r.checks()));
        out.addAll(zoneChecks);
        out.addAll(span.checks());
        return out;
    }

    public boolean ok() {
        return all().stream().allMatch(CheckResult::pass);
    }

    public List<CheckResult> failures() {
        return all().stream().filter(c -> !c.pass()).toList();
    }

    /** Whether everything except the span's deflection checks passes. */
    public boolean okApartFromDeflection() {
        return all().stream().filter(c -> !c.id().startsWith("deflection")).allMatch(CheckResult::pass);
    }
}
