package barfit.report;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import barfit.units.UnitSystem;
import java.util.List;

/** Writes a calculation trail as lines of text in the user's units. */
public final class TrailText {
    private TrailText() {}

    public static String substitute(String template, List<Q> args, UnitSystem u) {
        if (template == null) {
            return null;
        }
        StringBuilder sb = new StringBuilder();
        int k = 0;
        int i = 0;
        while (i < template.length()) {
            if (template.startsWith("{}", i) && k < args.size()) {
                Q q = args.get(k++);
                String v = u.compact(q.value(), q.dim());
                boolean wrap = v.startsWith("-") && i > 0;
                sb.append(wrap ? "(" + v + ")" : v);
                i += 2;
            } else {
                sb.append(template.charAt(i++));
            }
        }
        return sb.toString();
    }

    /** One step as "symbol = formula = substituted = result unit". */
    public static String step(Trail.Step s, UnitSystem u) {
        StringBuilder sb = new StringBuilder(s.symbol());
        if (s.formula() != null) {
            sb.append(" = ").append(s.formula());
        }
        String sub = substitute(s.substitution(), s.args(), u);
        if (sub != null
                && u == UnitSystem.US
                && s.result().dim() == barfit.section.trail.Dim.MOMENT
                && s.args().stream().noneMatch(q -> q.dim() == barfit.section.trail.Dim.MOMENT)) {
            sub = "[" + sub + "] / 12"; // kip·in to kip·ft
        }
        if (sub != null) {
            sb.append(" = ").append(sub);
        }
        sb.append(" = ").append(u.withUnit(s.result().value(), s.result().dim()));
        if (s.note() != null) {
            sb.append("   (").append(s.note()).append(')');
        }
        return sb.toString();
    }

    public static void write(Trail trail, UnitSystem u, String indent, StringBuilder out) {
        for (Trail.Entry e : trail.entries()) {
            if (e instanceof Trail.Heading h) {
                out.append(indent)
                        .append(h.title())
                        .append("   [")
                        .append(h.clause())
                        .append("]\n");
            } else if (e instanceof Trail.Step s) {
                out.append(indent).append("  ").append(step(s, u)).append('\n');
            } else if (e instanceof Trail.Note n) {
                out.append(indent).append("  · ").append(n.text()).append('\n');
            }
        }
    }
}
