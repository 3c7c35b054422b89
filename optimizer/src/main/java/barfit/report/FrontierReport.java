package barfit.report;

import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.section.SectionFrontier;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanFrontier;
import barfit.input.Settings;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

/** The cost-carbon frontier of {@code barfit frontier}, as a table and as JSON. */
public final class FrontierReport {
    private FrontierReport() {}

    /** What every point of a section's frontier is, said once. */
    static final String METHOD = "each point is the proven-cheapest design within its own carbon (CP-SAT with the "
            + "carbon cap as a constraint), and the lowest in carbon at that cost; the next cap is just below its "
            + "carbon, until nothing passes under it";

    /** What every point of a whole span's frontier is, said once. */
    static final String SPAN_METHOD = "each point of a whole span is the proven optimum of a weighted sum of cost "
            + "and carbon (the weighted-sum method, weights from the line through two neighbouring points, "
            + "Aneja and Nair's dichotomic search), so it is the cheapest design within its own carbon; "
            + "designs in a concave stretch between two points, optimal under no weighting, are not listed";

    /**
     * One row of a frontier: the design in words and its layout for JSON, its cost and carbon in the user's
     * units (per length for a section, over the span for a span) with their parts, and its proof's status.
     */
    public record Row(
            String design,
            Consumer<ObjectNode> layout,
            double cost,
            double carbon,
            CostBreakdown costParts,
            CostBreakdown carbonParts,
            String status) {}

    /**
     * One beam's frontier as the reports show it, from a section's or a whole span's: {@code rows} cheapest
     * first, empty with {@code noDesign} (limit and summary) where nothing passes; {@code over} what the
     * figures are for ("the span", "the schedule"; null: per length); {@code complete} false where a search
     * limit left part of it unsearched.
     */
    public record Entry(
            String id, String heading, String over, List<Row> rows, int solves, boolean complete, NoDesign noDesign) {
        public Entry {
            rows = List.copyOf(rows);
        }

        /** The heading's first part ("Beam R-01"), for a chart's title. */
        String title() {
            int cut = heading.indexOf("   ");
            return cut < 0 ? heading : heading.substring(0, cut);
        }

        public boolean overSpan() {
            return over != null;
        }

        /** "for the span", or the cost's unit length ("per m"). */
        String costBasis(UnitSystem u) {
            return over != null ? "for " + over : Money.perLengthLabel(u);
        }

        /** "kg CO2e for the span", or "kg CO2e per m". */
        String carbonBasis(UnitSystem u) {
            return over != null ? Carbon.unit(u) + " for " + over : Carbon.perLengthUnit(u);
        }
    }

    /** Why a beam has no frontier: the binding limit and the diagnosis in words. */
    public record NoDesign(String limit, String summary) {}

    /** A section's frontier, per length. */
    public static Entry entry(SectionFrontier.Result r, UnitSystem u) {
        var p = r.problem();
        String heading = "Beam " + p.id() + "   Mu = " + u.withUnit(Math.abs(p.mu()), Dim.MOMENT) + ' '
                + p.bending().word()
                + (p.vu() != null ? "   Vu = " + u.withUnit(p.vu(), Dim.FORCE) : "")
                + (p.maxDepth() != null ? "   max depth " + u.withUnit(p.maxDepth(), Dim.LENGTH) : "");
        List<Row> rows = new ArrayList<>();
        for (SectionFrontier.Point pt : r.points()) {
            var d = pt.design();
            rows.add(new Row(
                    DesignText.describe(d.layout(), u),
                    o -> DesignJson.layout(o, d.layout(), u),
                    Money.perLength(d.costPerMetre().total(), u),
                    Carbon.perLength(d.carbonPerMetre().total(), u),
                    Money.scaled(d.costPerMetre(), u),
                    Carbon.perLength(d.carbonPerMetre(), u),
                    pt.cheapest().status()));
        }
        NoDesign none = r.points().isEmpty()
                ? new NoDesign(
                        r.first().diagnosis().limit(),
                        DiagnosisWords.summary(r.first().diagnosis(), u))
                : null;
        return new Entry(p.id(), heading, null, rows, r.solves(), true, none);
    }

    /** A whole span's frontier, over the span. */
    public static Entry entry(SpanFrontier.Result r, UnitSystem u) {
        var p = r.problem();
        String heading = "Beam " + p.id() + "   whole span, " + u.withUnit(p.span(), Dim.SPAN)
                + (p.maxDepth() != null ? "   max depth " + u.withUnit(p.maxDepth(), Dim.LENGTH) : "");
        List<Row> rows = new ArrayList<>();
        for (var pt : r.points()) {
            SpanDesigner.Design d = pt.answer().best();
            rows.add(new Row(
                    describe(pt.answer(), d, u),
                    o -> {
                        SpanJson.outline(o, d.layout(), p, u);
                        o.set("stirrups", SpanJson.stirrups(d.layout(), p, u));
                    },
                    d.cost().total(),
                    Carbon.mass(d.carbon().total(), u),
                    d.cost(),
                    Carbon.mass(d.carbon(), u),
                    pt.answer().status()));
        }
        NoDesign none = null;
        if (r.points().isEmpty()) {
            var d = r.first().diagnosis();
            none = new NoDesign(d == null ? "none" : d.limit(), d == null ? "" : DiagnosisWords.summary(d, u));
        }
        return new Entry(p.id(), heading, "the span", rows, r.solves(), r.complete(), none);
    }

    /** "300 × 500 mm, bottom 4 No. 19, top 2 No. 16 (left 4+4 No. 16, right 4+4 No. 16), stirrups ...". */
    static String describe(SpanDesigner.Outcome o, SpanDesigner.Design d, UnitSystem u) {
        ScheduleRows.Row row = ScheduleRows.row(o, d);
        List<String> at = new ArrayList<>();
        if (row.left() != null) {
            at.add("left " + row.left().bars());
        }
        if (row.right() != null) {
            at.add("right " + row.right().bars());
        }
        return ScheduleRows.size(row, u) + " " + u.unit(Dim.LENGTH) + ", bottom " + row.bottom() + ", top "
                + row.top() + (at.isEmpty() ? "" : " (" + String.join(", ", at) + ")") + ", stirrups "
                + ScheduleRows.stirrupsShort(row, u);
    }

    public static String text(Settings settings, List<Entry> entries, String currency) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder();
        out.append("barfit frontier — ")
                .append(settings.file())
                .append(" — ")
                .append(settings.code().edition())
                .append('\n');
        out.append(Caution.text()).append('\n');
        out.append(DesignText.CARBON_NOTE).append("\n\n");
        out.append(CheckText.materials(settings)).append('\n');
        String cur = currency.isEmpty() ? "" : " (" + currency + ")";
        boolean sections = false;
        boolean spans = false;
        for (Entry e : entries) {
            out.append('\n').append(e.heading()).append('\n');
            if (e.rows().isEmpty()) {
                out.append("  no layout in the search space passes: ")
                        .append(e.noDesign().limit())
                        .append(" — ")
                        .append(e.noDesign().summary())
                        .append('\n');
                continue;
            }
            sections |= !e.overSpan();
            spans |= e.overSpan();
            out.append("  ")
                    .append(e.rows().size())
                    .append(
                            e.rows().size() == 1
                                    ? " design: the cheapest is also the lowest in carbon ("
                                    : " designs, from the cheapest to the lowest-carbon (")
                    .append(e.solves())
                    .append(" proven designs):\n");
            String basis = e.costBasis(u);
            TextTable t = new TextTable(true, false, true, true);
            t.row("#", "design", "cost " + basis + cur, "carbon " + e.carbonBasis(u));
            int k = 1;
            for (Row row : e.rows()) {
                t.row(String.valueOf(k++), row.design(), Money.amount(row.cost()), Carbon.amount(row.carbon()));
            }
            t.write("    ", out);
            if (e.rows().size() > 1) {
                Row a = e.rows().get(0);
                Row b = e.rows().get(e.rows().size() - 1);
                double dc = b.cost() - a.cost();
                double dk = a.carbon() - b.carbon();
                out.append("  from end to end: ")
                        .append(Carbon.amount(dk))
                        .append(' ')
                        .append(e.overSpan() ? Carbon.unit(u) : Carbon.perLengthUnit(u))
                        .append(" less carbon (")
                        .append(String.format(Locale.ROOT, "%.1f %%", 100 * dk / a.carbon()))
                        .append(") for ")
                        .append(Money.amount(dc))
                        .append(' ')
                        .append(basis)
                        .append(" more (")
                        .append(String.format(Locale.ROOT, "%.1f %%", 100 * dc / a.cost()))
                        .append(")\n");
            }
            if (!e.complete()) {
                out.append("  (the search stopped at ")
                        .append(SpanFrontier.MOST_POINTS)
                        .append(" points between the ends; more may lie between them)\n");
            }
        }
        out.append('\n');
        if (sections || !spans) {
            out.append(sentence(METHOD));
        }
        if (spans) {
            out.append(sentence(SPAN_METHOD));
        }
        return out.toString();
    }

    private static String sentence(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1) + ".\n";
    }

    public static String json(Settings settings, List<Entry> entries, String currency) {
        UnitSystem u = settings.units();
        ObjectNode root = Json.object();
        root.put("units", u.name());
        root.set("unit_labels", Json.units(u));
        root.put("code", settings.code().edition());
        root.put("caution", Caution.SHORT);
        root.put("currency", currency);
        root.put("cost_basis", Money.perLengthLabel(u));
        root.put("carbon_basis", Carbon.perLengthUnit(u) + ", " + Carbon.STAGES);
        root.put("method", METHOD);
        if (entries.stream().anyMatch(Entry::overSpan)) {
            root.put("span_method", SPAN_METHOD);
        }
        ArrayNode beams = root.putArray("beams");
        for (Entry e : entries) {
            ObjectNode b = beams.addObject();
            b.put("id", e.id());
            if (e.overSpan()) {
                b.put("basis", "whole span: cost and carbon for the span");
                b.put("complete", e.complete());
            }
            b.put("solves", e.solves());
            ArrayNode points = b.putArray("points");
            for (Row row : e.rows()) {
                ObjectNode o = points.addObject();
                row.layout().accept(o);
                o.put("cost", CostModel.UNITS.rounded(row.cost()));
                o.put("carbon", Carbon.round(row.carbon()));
                o.set(e.overSpan() ? "cost_parts" : "cost_per_length", DesignJson.cost(row.costParts()));
                o.set(e.overSpan() ? "carbon_parts" : "carbon_per_length", Carbon.json(row.carbonParts()));
                o.put("status", row.status());
            }
            if (e.rows().isEmpty()) {
                ObjectNode dn = b.putObject("diagnosis");
                dn.put("limit", e.noDesign().limit());
                dn.put("summary", e.noDesign().summary());
            } else {
                b.putNull("diagnosis");
            }
        }
        return Json.write(root);
    }
}
