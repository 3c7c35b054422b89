package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.Development;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * Lap splices of deformed bars in tension, 25.5.2 (Table 25.5.2.1): class A, 1.0 ld, where the steel
 * provided is at least twice that required over the whole lap and at most half the bars are spliced within
 * the lap; class B, 1.3 ld, otherwise; never less than 300 mm (12 in). ld is 25.4.2.1(a)'s, without its own
 * minimum. Bars larger than No. 36 (#11) are not lap spliced (25.5.1.1): they need a mechanical (or
 * welded) splice.
 */
public final class LapSplices {
    /** What joins two bars. */
    public enum Kind {
        CLASS_A,
        CLASS_B,
        /** a bar larger than No. 36 (#11): 25.5.1.1 allows no lap, a mechanical or welded splice (25.5.7) */
        MECHANICAL
    }

    /**
     * A splice: its kind, its length (0 for a mechanical splice), the ld it was taken from, and the clause
     * that decided it.
     */
    public record Lap(Kind kind, double length, double ld, String clause) {
        public boolean lapped() {
            return kind != Kind.MECHANICAL;
        }
    }

    /** Where stock bars overlap along a run: the start of each lap from the run's start, mm. */
    public record StockPlan(int pieces, List<Double> lapStarts, double lapLength) {
        public StockPlan {
            lapStarts = List.copyOf(lapStarts);
        }

        public int laps() {
            return lapStarts.size();
        }
    }

    private LapSplices() {}

    /** 25.5.1.1: lap splices only for No. 36 (#11) and smaller bars. */
    public static boolean lapAllowed(BarSize bar) {
        return BarClasses.upToNo36(bar);
    }

    /**
     * Class A only when As provided / As required is at least 2 over the whole lap and at most half of As is
     * spliced within the lap (Table 25.5.2.1).
     *
     * @param providedOverRequired As provided / As required along the lap
     * @param fractionSpliced the part of As spliced within the lap length (0.5 for half of the bars)
     */
    public static Kind tensionClass(BarSize bar, double providedOverRequired, double fractionSpliced) {
        if (!lapAllowed(bar)) {
            return Kind.MECHANICAL;
        }
        boolean classA = providedOverRequired >= 2.0 * (1 - 1e-12) && fractionSpliced <= 0.5 * (1 + 1e-12);
        return classA ? Kind.CLASS_A : Kind.CLASS_B;
    }

    /** A tension lap from the general ld of 25.4.2.4 (its value before 25.4.2.1(b)'s minimum). */
    public static Lap tension(
            BarSize bar,
            Development.Result ld,
            double providedOverRequired,
            double fractionSpliced,
            CodeEquations code,
            Trail t) {
        return tension(bar, ld.ldEquation(), providedOverRequired, fractionSpliced, code, t);
    }

    /**
     * A tension lap splice of {@code bar}.
     *
     * @param ld 25.4.2.1(a)'s development length of the bar, before 25.4.2.1(b)'s minimum
     */
    public static Lap tension(
            BarSize bar, double ld, double providedOverRequired, double fractionSpliced, CodeEquations code, Trail t) {
        return ofKind(bar, tensionClass(bar, providedOverRequired, fractionSpliced), ld, code, t);
    }

    /** A class B tension lap, or the mechanical splice a bar larger than No. 36 (#11) needs (9.7.7.5). */
    public static Lap classB(BarSize bar, double ld, CodeEquations code, Trail t) {
        return ofKind(bar, lapAllowed(bar) ? Kind.CLASS_B : Kind.MECHANICAL, ld, code, t);
    }

    private static Lap ofKind(BarSize bar, Kind kind, double ld, CodeEquations code, Trail t) {
        if (kind == Kind.MECHANICAL) {
            if (t.isOn()) {
                t.heading("Splice of " + bar.label(), "25.5.1.1");
                t.note("Bars larger than No. 36 (#11) are not lap spliced: a mechanical or welded splice (25.5.7).");
            }
            return new Lap(kind, 0, ld, "25.5.1.1");
        }
        double factor = kind == Kind.CLASS_A ? 1.0 : 1.3;
        double min = code.anchorage().lapMin();
        double length = Math.max(factor * ld, min);
        if (t.isOn()) {
            t.heading(
                    "Tension lap splice of " + bar.label() + ", class " + (kind == Kind.CLASS_A ? "A" : "B"), "25.5.2");
            t.step(
                    "lst",
                    "max(" + (kind == Kind.CLASS_A ? "1.0" : "1.3") + " ld, " + (code.inchPound() ? "12 in" : "300 mm")
                            + ")",
                    "max({} × {}, {})",
                    Q.length(length),
                    Q.number(factor),
                    Q.length(ld),
                    Q.length(min));
        }
        return new Lap(kind, length, ld, "Table 25.5.2.1");
    }

    /**
     * Bars of two sizes lapped in tension (25.5.2.2, from memory): the greater of ld of the larger bar and
     * the lap length of the smaller bar.
     */
    public static double mixedSizes(double ldLarger, Lap smallerLap) {
        return Math.max(ldLarger, smallerLap.length());
    }

    /**
     * How stock bars make up a run of {@code runLength}: pieces of the full stock length, each overlapping
     * the one before by {@code lapLength}, the last cut to what is left. The laps fall where the pieces end;
     * where they may go along the member (away from the points of peak stress, 9.7.7.5 for integrity bars)
     * is the caller's to decide, by moving them.
     */
    public static StockPlan stock(double runLength, double stockLength, double lapLength) {
        if (runLength <= stockLength) {
            return new StockPlan(1, List.of(), lapLength);
        }
        if (!(stockLength > lapLength)) {
            throw new IllegalArgumentException("a stock bar must be longer than its lap");
        }
        double step = stockLength - lapLength;
        int pieces = (int) Math.ceil((runLength - lapLength) / step - 1e-9);
        List<Double> starts = new ArrayList<>();
        for (int k = 1; k < pieces; k++) {
            starts.add(k * step);
        }
        return new StockPlan(pieces, starts, lapLength);
    }

    /** A usual stock length when the user gives none: 12 m, or 40 ft (common practice, no source). */
    public static double defaultStockLength(CodeEquations code) {
        return code.inchPound() ? 40 * 12 * CodeEquations.MM_PER_IN : 12_000.0;
    }
}
