package barfit.report.html;

import barfit.catalogs.BarSize;
import barfit.design.span.SpanDesigner;
import barfit.report.Money;
import barfit.report.ScheduleRows;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.FixedDecimals;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * What the report's sections share: words for lengths, spans, money and bar labels, the key-value rows and
 * list items, and the page's CSS.
 */
final class Html {
    private Html() {}

    // ---------------------------------------------------------------- words

    /** The HTML's words for the top bars at a support: "4 No. 25; 2 extra, 2.100 m past the face". */
    static String topAtSupport(ScheduleRows.SupportTop at, UnitSystem u) {
        return at.bars()
                + (at.extra() > 0 ? "; " + at.extra() + " extra, " + span(at.extension(), u) + " past the face" : "");
    }

    /** What failed: the beam on its own, or its group's need to share one section size. */
    static String headline(SpanDesigner.Diagnosis d) {
        return d.limit().equals("group")
                ? "No section size fits every beam of its group"
                : "No layout in the search space passes";
    }

    static String unitsWords(UnitSystem u) {
        return u == UnitSystem.US
                ? "inch-pound units: in, psi, kip, kip·ft; spans and bar lengths in ft"
                : "SI units: mm, MPa, kN, kN·m; spans and bar lengths in m";
    }

    static String len(double mm, UnitSystem u) {
        return SectionDrawing.len(mm, u);
    }

    static String span(double mm, UnitSystem u) {
        return u.number(mm, Dim.SPAN) + " " + u.unit(Dim.SPAN);
    }

    static String lengths(List<Double> mm, UnitSystem u) {
        List<String> parts = new ArrayList<>();
        for (double v : mm) {
            parts.add(u.compact(v, Dim.LENGTH));
        }
        return String.join(", ", parts) + " " + u.unit(Dim.LENGTH);
    }

    /** "400 to 750 mm in steps of 25 mm" for an even range, else the list. */
    static String range(List<Double> mm, UnitSystem u) {
        if (mm.size() >= 3) {
            double step = mm.get(1) - mm.get(0);
            boolean even = true;
            for (int i = 2; i < mm.size(); i++) {
                even &= Math.abs(mm.get(i) - mm.get(i - 1) - step) < 1e-6;
            }
            if (even) {
                return u.compact(mm.get(0), Dim.LENGTH) + " to " + len(mm.get(mm.size() - 1), u) + " in steps of "
                        + len(step, u);
            }
        }
        return lengths(mm, u);
    }

    /** Bar designations as the catalog labels them ("No. 25"). */
    static String labels(ScheduleResult r, List<String> designations) {
        List<String> parts = new ArrayList<>();
        for (String d : designations) {
            parts.add(r.input().space().barSizes().stream()
                    .filter(b -> b.designation().equals(d))
                    .map(BarSize::label)
                    .findFirst()
                    .orElse(d));
        }
        return String.join(", ", parts);
    }

    static String labels(List<BarSize> bars) {
        List<String> parts = new ArrayList<>();
        for (BarSize b : bars) {
            parts.add(b.label());
        }
        return String.join(", ", parts);
    }

    static String joinInts(List<Integer> v) {
        List<String> parts = new ArrayList<>();
        for (int i : v) {
            parts.add(String.valueOf(i));
        }
        return String.join(", ", parts);
    }

    static String plain(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    static String amount(double v) {
        return FixedDecimals.of(v, 2);
    }

    static String money(double v, String currency) {
        return Money.amount(v) + (currency.isEmpty() ? "" : " " + currency);
    }

    // ---------------------------------------------------------------- rows

    static void kv(StringBuilder out, String key, String value) {
        out.append("<tr><th>")
                .append(Svg.esc(key))
                .append("</th><td>")
                .append(Svg.esc(value))
                .append("</td></tr>\n");
    }

    static void kvStrong(StringBuilder out, String key, String value) {
        out.append("<tr class=\"total\"><th>")
                .append(Svg.esc(key))
                .append("</th><td>")
                .append(Svg.esc(value))
                .append("</td></tr>\n");
    }

    static void li(StringBuilder out, String text) {
        out.append("<li>").append(Svg.esc(text)).append("</li>\n");
    }

    // ---------------------------------------------------------------- style

    static final String CSS = """
            :root { color-scheme: light; }
            body { font-family: sans-serif; font-size: 14px; line-height: 1.4; color: #1e1e1e; margin: 0 auto;
                   padding: 16px 24px 40px; max-width: 1400px; background: #fff; }
            h1 { font-size: 22px; margin: 0 0 4px; }
            h2 { font-size: 18px; border-bottom: 2px solid #2b4a66; padding-bottom: 3px; margin-top: 32px; }
            h3 { font-size: 16px; margin: 20px 0 8px; }
            h4 { font-size: 14px; margin: 18px 0 6px; }
            h5 { font-size: 13px; margin: 12px 0 4px; }
            .sub { color: #555; margin: 0; }
            nav { margin: 10px 0; }
            a { color: #1f4e79; }
            .caution { border: 2px solid #a8321e; background: #fbeee9; padding: 8px 14px; margin: 14px 0; }
            .caution p { margin: 4px 0; }
            .cols { display: flex; flex-wrap: wrap; gap: 18px; align-items: flex-start; }
            .wide { overflow-x: auto; }
            table { border-collapse: collapse; margin: 6px 0; }
            caption { text-align: left; font-weight: bold; padding: 2px 0 4px; }
            .kv th { text-align: left; font-weight: normal; color: #444; padding: 2px 12px 2px 0; vertical-align: top;
                     white-space: nowrap; }
            .kv td { padding: 2px 0; vertical-align: top; max-width: 640px; }
            .kv tr.total th, .kv tr.total td { font-weight: bold; border-top: 1px solid #888; }
            .grid th, .grid td { border: 1px solid #c8c8c8; padding: 3px 6px; vertical-align: top; }
            .grid th { background: #eef2f6; text-align: left; }
            td.mark, td.lines, .checks td:first-child { white-space: nowrap; }
            .num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
            tr.fail td { background: #f8d7d0; color: #7a1a0c; font-weight: bold; }
            tr.infeasible td { background: #fbeee9; }
            .status { font-size: 12px; padding: 1px 6px; border-radius: 3px; vertical-align: middle; }
            .status.ok { background: #dcead5; color: #22501a; }
            .status.none { background: #f8d7d0; color: #7a1a0c; }
            .diagnosis { border-left: 4px solid #a8321e; padding: 4px 12px; background: #fbeee9; }
            .warn { color: #7a1a0c; }
            .note { color: #555; font-size: 13px; }
            .rules li { margin: 2px 0; }
            section.beam { border-top: 1px solid #bbb; margin-top: 28px; padding-top: 4px; }
            figure { margin: 10px 0; }
            .pair { display: flex; gap: 8px; align-items: flex-start; }
            /* both drawings shrink by the same factor when the page is narrow, so their heights still line up */
            .pair svg { flex: 0 1 auto; min-width: 0; height: auto; border: 1px solid #e2e2e2; background: #fff; }
            .zone-section svg { max-width: 100%; height: auto; border: 1px solid #e2e2e2; background: #fff; }
            .plot svg { max-width: 100%; height: auto; }
            details.trail { margin: 10px 0; }
            details.trail summary { cursor: pointer; font-weight: bold; }
            pre { font-size: 12px; background: #f7f7f5; padding: 6px 10px; white-space: pre-wrap; }
            footer { margin-top: 36px; color: #555; border-top: 1px solid #ccc; }
            @page { size: A4 landscape; margin: 12mm; }
            @media print {
              body { max-width: none; padding: 0; font-size: 12px; }
              .wide { overflow: visible; }
              .grid { font-size: 11px; }
              section.beam { break-before: page; border-top: none; }
              figure, tr, .kv { break-inside: avoid; }
              h2, h3, h4, h5, caption { break-after: avoid; }
              nav { display: none; }
            }
            """;
}
