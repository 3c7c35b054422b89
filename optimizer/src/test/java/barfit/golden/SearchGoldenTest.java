package barfit.golden;

import static org.junit.jupiter.api.Assertions.fail;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.DesignOutcome;
import barfit.design.RandomProblemsAccess;
import barfit.design.SectionDesigner;
import barfit.design.SectionProblem;
import barfit.design.SolverOptions;
import barfit.design.beam.BeamDesigner;
import barfit.design.beam.BeamProblem;
import barfit.design.beam.RandomBeams;
import barfit.report.BeamJson;
import barfit.report.DesignJson;
import barfit.report.DesignText;
import barfit.report.Json;
import barfit.section.CodeEquations;
import barfit.units.UnitSystem;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * What the searches answer on a few hundred seeded random problems, kept as a golden file: one line per
 * instance with its status, cost in cost units, a section's layout in words and a hash of the full JSON
 * output.
 * A change meant to keep behaviour (a refactor, a speed-up) must leave this file unchanged; rewrite it
 * with {@code -Dgolden.update=true} only when the answers are meant to change, and say why in the commit.
 */
class SearchGoldenTest {
    static final Path GOLDEN = Path.of("src/test/resources/golden/search-answers.txt");
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    @Test
    void answersOnSeededRandomProblemsAreUnchanged() throws IOException {
        StringBuilder out = new StringBuilder();
        SectionDesigner sections = new SectionDesigner(COST, new SolverOptions(30, 1, 1));
        Random rnd = new Random(2_026_12L);
        for (int i = 0; i < 240; i++) {
            SectionProblem p = i % 3 == 2 ? RandomProblemsAccess.medium(rnd) : RandomProblemsAccess.small(rnd);
            DesignOutcome o = sections.design(p, i % 5 == 0 ? 2 : 0);
            String json = Json.write(DesignJson.beam(o, UnitSystem.SI, i % 7 == 0));
            out.append("section ").append(i).append(' ').append(o.status()).append(' ')
                    .append(o.feasible() ? CostModel.units(o.best().costPerMetre().total()) : -1).append(' ')
                    .append(o.feasible() ? DesignText.describe(o.best().layout(), UnitSystem.SI) : "-").append(' ')
                    .append(hash(json)).append('\n');
        }
        BeamDesigner spans = new BeamDesigner(COST, new SolverOptions(30, 1, 1));
        Random beams = new Random(2_026_13L);
        for (int i = 0; i < 60; i++) {
            BeamProblem p = RandomBeams.small(beams);
            BeamDesigner.Outcome o = spans.design(p, i % 6 == 0 ? 1 : 0);
            String json = Json.write(BeamJson.beam(o, UnitSystem.SI, i % 7 == 0));
            out.append("span ").append(i).append(' ').append(o.status()).append(' ')
                    .append(o.feasible() ? CostModel.units(o.best().cost().total()) : -1).append(' ')
                    .append(hash(json)).append('\n');
        }
        String actual = out.toString().replace("\r", "");
        if (Boolean.getBoolean("golden.update")) {
            Files.createDirectories(GOLDEN.getParent());
            Files.writeString(GOLDEN, actual, StandardCharsets.UTF_8);
            return;
        }
        if (!Files.isRegularFile(GOLDEN)) {
            fail("no golden file " + GOLDEN + "; write it with -Dgolden.update=true");
        }
        String[] want = Files.readString(GOLDEN, StandardCharsets.UTF_8).split("\n");
        String[] got = actual.split("\n");
        for (int k = 0; k < Math.max(want.length, got.length); k++) {
            String w = k < want.length ? want[k] : "(none)";
            String g = k < got.length ? got[k] : "(none)";
            if (!w.equals(g)) {
                Path kept = Path.of("target/golden-actual/search-answers.txt");
                Files.createDirectories(kept.getParent());
                Files.writeString(kept, actual, StandardCharsets.UTF_8);
                fail("search answers changed at line " + (k + 1) + ":\n  was " + w + "\n  now " + g
                        + "\nthe whole output is in " + kept + "; if intended, rewrite with -Dgolden.update=true");
            }
        }
    }

    static String hash(String s) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 8);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
