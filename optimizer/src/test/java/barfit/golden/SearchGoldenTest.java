package barfit.golden;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.design.section.DesignOutcome;
import barfit.design.section.RandomProblems;
import barfit.design.section.SectionDesigner;
import barfit.design.section.SectionProblem;
import barfit.design.span.RandomSpans;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;
import barfit.report.DesignJson;
import barfit.report.DesignText;
import barfit.report.Json;
import barfit.report.SpanJson;
import barfit.section.CodeEquations;
import barfit.units.UnitSystem;
import java.nio.charset.StandardCharsets;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * What the searches answer on a few hundred seeded random problems, kept as a golden file: one line per
 * instance with its status, cost in cost units, a section's layout in words and a hash of the full JSON
 * output.
 * A change meant to keep behaviour (a refactor, a speed-up) must leave this file unchanged; rewrite it
 * with {@code -Dgolden.update=true} only when the answers are meant to change, and say why in the commit
 * ({@link Golden} compares and rewrites it).
 */
class SearchGoldenTest {
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    @Test
    void answersOnSeededRandomProblemsAreUnchanged() {
        StringBuilder out = new StringBuilder();
        SectionDesigner sections = new SectionDesigner(COST, new SolverOptions(30, 1, 1));
        Random rnd = new Random(2_026_12L);
        for (int i = 0; i < 240; i++) {
            SectionProblem p = i % 3 == 2 ? RandomProblems.medium(rnd) : RandomProblems.small(rnd);
            DesignOutcome o = sections.design(p, i % 5 == 0 ? 2 : 0);
            String json = Json.write(DesignJson.beam(o, UnitSystem.SI, i % 7 == 0));
            out.append("section ")
                    .append(i)
                    .append(' ')
                    .append(o.status())
                    .append(' ')
                    .append(
                            o.feasible()
                                    ? CostModel.units(o.best().costPerMetre().total())
                                    : -1)
                    .append(' ')
                    .append(o.feasible() ? DesignText.describe(o.best().layout(), UnitSystem.SI) : "-")
                    .append(' ')
                    .append(hash(json))
                    .append('\n');
        }
        SpanDesigner spans = new SpanDesigner(COST, new SolverOptions(30, 1, 1));
        Random beams = new Random(2_026_13L);
        for (int i = 0; i < 60; i++) {
            SpanProblem p = RandomSpans.small(beams);
            SpanDesigner.Outcome o = spans.design(p, i % 6 == 0 ? 1 : 0);
            String json = Json.write(SpanJson.beam(o, UnitSystem.SI, i % 7 == 0));
            out.append("span ")
                    .append(i)
                    .append(' ')
                    .append(o.status())
                    .append(' ')
                    .append(o.feasible() ? CostModel.units(o.best().cost().total()) : -1)
                    .append(' ')
                    .append(hash(json))
                    .append('\n');
        }
        Golden.check("search-answers.txt", out.toString().replace("\r", ""));
    }

    /** The first 8 bytes of the output's SHA-256, in hex: enough to see that it changed. */
    static String hash(String s) {
        return Golden.sha256(s.getBytes(StandardCharsets.UTF_8)).substring(0, 16);
    }
}
