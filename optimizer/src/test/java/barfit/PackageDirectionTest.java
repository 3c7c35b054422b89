package barfit;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.fail;

import com.tngtech.archunit.core.domain.Dependency;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The one direction of DEVELOPERS.md (input -> catalogs -> section model -> search -> reports), read from
 * the compiled main classes of every module (ArchUnit), so every use counts: an import, a fully qualified
 * name, a call, a field or parameter type.
 *
 * <p>Each rule may keep a list of frozen exceptions: the classes that broke it when the rule was written.
 * <b>A frozen list may only shrink.</b> A class not on the list that breaks the rule fails the test; so
 * does a listed class that no longer breaks it (take it off the list). Never add a class to a list: move
 * the code instead (a report's words into {@code barfit.report}, a unit conversion to the input readers
 * or the reports).
 */
class PackageDirectionTest {
    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("barfit");

    /** Packages outside the section model and the catalogs: the optimizer module. */
    private static final List<String> OPTIMIZER = List.of(
            "barfit.design",
            "barfit.detailing",
            "barfit.input",
            "barfit.report",
            "barfit.cli",
            "barfit.schedule",
            "barfit.study",
            "barfit.bench",
            "barfit.serve",
            "barfit.units");

    private static final String SOLVER = "com.google.ortools";

    /**
     * A rule: no class in {@code from} (packages with their subpackages) uses a class in {@code forbidden}.
     * {@code frozen}: the top-level classes that broke it when it was written (may only shrink).
     */
    record Rule(String says, List<String> from, List<String> forbidden, Set<String> frozen) {}

    static final List<Rule> RULES = List.of(
            new Rule(
                    "the section model knows no solver, search, input, report or command line, and does no I/O",
                    List.of("barfit.section", "barfit.analysis"),
                    concat(OPTIMIZER, List.of(SOLVER, "barfit.catalogs.yaml", "java.io", "java.nio.file", "java.net")),
                    Set.of()),
            new Rule(
                    "the catalogs hold data and its loader: no section model, search or solver",
                    List.of("barfit.catalogs"),
                    concat(OPTIMIZER, List.of(SOLVER, "barfit.section", "barfit.analysis")),
                    Set.of()),
            new Rule(
                    "a study designs; it does not write reports or read the command line",
                    List.of("barfit.study"),
                    List.of("barfit.report", "barfit.cli"),
                    Set.of()),
            new Rule(
                    "the searches and the schedule do not write reports or read the command line",
                    List.of("barfit.design", "barfit.schedule"),
                    List.of("barfit.report", "barfit.cli"),
                    Set.of()),
            new Rule(
                    "the single-section search knows no span or line: a span is built from sections, not the "
                            + "other way round",
                    List.of("barfit.design.section"),
                    List.of("barfit.design.span", "barfit.design.line"),
                    Set.of()),
            new Rule(
                    "the whole-span search knows no line: a line is built from spans",
                    List.of("barfit.design.span"),
                    List.of("barfit.design.line"),
                    Set.of()),
            new Rule(
                    "detailing follows design: the searches do not detail, and detailing writes no report, reads no "
                            + "command line and solves nothing",
                    List.of("barfit.detailing"),
                    List.of("barfit.report", "barfit.cli", "barfit.schedule", "barfit.study", SOLVER),
                    Set.of()),
            new Rule(
                    "the page server answers requests through its Explorer: it designs nothing, reads no input "
                            + "file and knows no command line",
                    List.of("barfit.serve"),
                    List.of(
                            "barfit.design",
                            "barfit.input",
                            "barfit.study",
                            "barfit.schedule",
                            "barfit.detailing",
                            "barfit.cli",
                            "barfit.section",
                            "barfit.analysis",
                            SOLVER),
                    Set.of()),
            new Rule("the searches know no detailing", List.of("barfit.design"), List.of("barfit.detailing"), Set.of()),
            new Rule("the reports do not reach into the solver", List.of("barfit.report"), List.of(SOLVER), Set.of()),
            new Rule(
                    "the searches, the schedule and the studies work in SI: units are converted by the input "
                            + "readers and the reports",
                    List.of("barfit.design", "barfit.schedule", "barfit.study"),
                    List.of("barfit.units"),
                    Set.of()));

    @TestFactory
    Stream<DynamicTest> everyRuleHolds() {
        return RULES.stream().map(r -> DynamicTest.dynamicTest(r.says(), () -> check(r)));
    }

    /** A rule that finds no class to look at would pass for nothing: each package the rules name has classes. */
    @Test
    void everyPackageTheRulesNameHasClasses() {
        for (Rule r : RULES) {
            for (String p : r.from()) {
                assertFalse(
                        MAIN.stream().noneMatch(c -> within(c.getPackageName(), p)),
                        "no main class in " + p + " (" + r.says() + ")");
            }
        }
    }

    private static void check(Rule r) {
        TreeMap<String, List<String>> broken = new TreeMap<>();
        for (JavaClass c : MAIN) {
            if (!withinAny(c.getPackageName(), r.from())) {
                continue;
            }
            for (Dependency d : c.getDirectDependenciesFromSelf()) {
                JavaClass target = d.getTargetClass().getBaseComponentType();
                if (withinAny(target.getPackageName(), r.forbidden())) {
                    broken.computeIfAbsent(topLevel(c), k -> new ArrayList<>()).add(d.getDescription());
                }
            }
        }
        List<String> problems = new ArrayList<>();
        broken.forEach((cls, uses) -> {
            if (!r.frozen().contains(cls)) {
                problems.add(cls + " breaks it: " + uses.get(0)
                        + (uses.size() > 1 ? " (and " + (uses.size() - 1) + " more)" : ""));
            }
        });
        for (String cls : new TreeSet<>(r.frozen())) {
            if (!broken.containsKey(cls)) {
                problems.add(cls + " is on the frozen list but no longer breaks the rule: take it off the list");
            }
        }
        if (!problems.isEmpty()) {
            fail("rule \"" + r.says() + "\":\n  " + String.join("\n  ", problems));
        }
    }

    private static String topLevel(JavaClass c) {
        JavaClass t = c;
        while (t.getEnclosingClass().isPresent()) {
            t = t.getEnclosingClass().get();
        }
        return t.getName();
    }

    private static boolean withinAny(String pkg, List<String> roots) {
        return roots.stream().anyMatch(r -> within(pkg, r));
    }

    private static boolean within(String pkg, String root) {
        return pkg.equals(root) || pkg.startsWith(root + ".");
    }

    private static List<String> concat(List<String> a, List<String> b) {
        List<String> out = new ArrayList<>(a);
        out.addAll(b);
        return List.copyOf(out);
    }
}
