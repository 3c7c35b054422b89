package barfit.design;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.Flange;
import barfit.section.StirrupHooks;
import barfit.section.Stirrups;
import java.util.List;

/**
 * The cost of a beam per metre of its length, from the user's rates. Concrete and formwork count the
 * web only below a flange (the slab is paid for anyway). A closed stirrup is its centre-line
 * perimeter plus two 135° hooks; each leg beyond two is a crosstie (one leg plus two hooks). Hooks
 * extend as Table 25.3.2 asks ({@link StirrupHooks#extension135}, in the edition of the input).
 */
public final class CostModel {
    /**
     * Money as the searches count it: whole numbers of a fixed fraction of the currency, so that CP-SAT,
     * the k-median and the oracles compare integers. Every conversion between currency and these units
     * goes through a scale; the proofs and the reports are given currency.
     */
    public enum Scale {
        /** 1/10 000 of the currency. */
        TEN_THOUSANDTHS(10_000.0),
        /** 1/1 000 000 of the currency. */
        MILLIONTHS(1_000_000.0);

        private final double perCurrency;

        Scale(double perCurrency) {
            this.perCurrency = perCurrency;
        }

        /** An amount in currency to whole units of this scale (rounded to the nearest). */
        public long units(double currency) {
            return Math.round(currency * perCurrency);
        }

        /** Whole units of this scale back to currency. */
        public double currency(long units) {
            return units / perCurrency;
        }

        /** An amount in currency rounded to this scale's unit (what the JSON reports print of a cost). */
        public double rounded(double currency) {
            return currency(units(currency));
        }
    }

    /** The searches' money: sections, the exhaustive oracles, the schedule's k-median. */
    public static final Scale UNITS = Scale.TEN_THOUSANDTHS;
    /**
     * The span model's money, finer: a span's price is the sum of five parts each rounded on its own (the
     * frame, the top bars, mid-span, each support), and millionths keep those roundings far below the
     * ten-thousandths in which its designs are compared with the oracle and the schedule.
     */
    public static final Scale SPAN_UNITS = Scale.MILLIONTHS;

    private final CostRates rates;
    private final double cover;
    private final CodeEquations code;
    /** What {@link #rates} price: the cost in currency, or the carbon in kg CO2e. */
    private final Objective objective;
    /** The same quantities priced in currency: this model unless it prices carbon. */
    private final CostModel money;
    /** The same quantities priced in kg CO2e (A1-A3); null where no carbon factors were given. */
    private final CostModel carbon;
    /** Whether {@link #rates} are a weighted sum of the money's and the carbon's ({@link #blend}). */
    private final boolean blended;
    /** The weight of money in this model's prices: 1 for cost, 0 for carbon, the blend's share in a blend. */
    private final double moneyShare;

    /** @param code the edition the input is in: it sets the least hook extension (75 mm or 3 in) */
    public CostModel(CostRates rates, double cover, CodeEquations code) {
        this.rates = rates;
        this.cover = cover;
        this.code = code;
        this.objective = Objective.COST;
        this.money = null;
        this.carbon = null;
        this.blended = false;
        this.moneyShare = 1;
    }

    private CostModel(CostRates rates, CostModel base, Objective objective, CostModel money, CostModel carbon) {
        this(rates, base, objective, money, carbon, false, objective == Objective.CARBON ? 0 : 1);
    }

    private CostModel(
            CostRates rates,
            CostModel base,
            Objective objective,
            CostModel money,
            CostModel carbon,
            boolean blended,
            double moneyShare) {
        this.rates = rates;
        this.cover = base.cover;
        this.code = base.code;
        this.objective = objective;
        this.money = money;
        this.carbon = carbon;
        this.blended = blended;
        this.moneyShare = moneyShare;
    }

    /** This model with the carbon factors beside its rates, so that every design also reports its carbon. */
    public CostModel withCarbon(CarbonFactors factors) {
        CostModel plain = new CostModel(money().rates, cover, code);
        return new CostModel(
                plain.rates,
                plain,
                Objective.COST,
                null,
                new CostModel(factors.rates(plain.rates.lapFactor()), cover, code));
    }

    /**
     * The model a search minimising {@code o} prices with: this one for cost; for carbon, one whose rates are
     * the carbon factors, with the money beside them ({@link #money}). Needs {@link #withCarbon} first.
     */
    public CostModel minimising(Objective o) {
        if (o == objective && !blended) {
            return this;
        }
        if (carbon() == null) {
            throw new IllegalStateException("no carbon factors to minimise");
        }
        CostModel m = money();
        CostModel c = carbon();
        return o == Objective.CARBON
                ? new CostModel(c.rates, this, Objective.CARBON, m, c)
                : new CostModel(m.rates, this, Objective.COST, null, c);
    }

    /**
     * The model minimising {@code costWeight} × cost + {@code carbonWeight} × carbon (both at least 0, not both
     * 0; scaled so that they add up to 1), with the money and the carbon beside it so that its designs still
     * report both. Carbon is linear in the same quantities as cost, so the blend is one more set of rates and
     * every bound of the searches holds for it as for cost: a design minimising it is on the convex hull of the
     * cost-carbon frontier (the weighted-sum method). Needs {@link #withCarbon} first.
     */
    public CostModel blend(double costWeight, double carbonWeight) {
        if (!(costWeight >= 0 && carbonWeight >= 0 && costWeight + carbonWeight > 0)) {
            throw new IllegalArgumentException(
                    "blend weights must be at least 0 and not both 0: " + costWeight + ", " + carbonWeight);
        }
        CostModel m = money();
        CostModel c = carbon();
        if (c == null) {
            throw new IllegalStateException("no carbon factors to blend");
        }
        double a = costWeight / (costWeight + carbonWeight);
        double k = carbonWeight / (costWeight + carbonWeight);
        CostRates r = new CostRates(
                a * m.rates.concretePerM3() + k * c.rates.concretePerM3(),
                a * m.rates.mainBarsPerKg() + k * c.rates.mainBarsPerKg(),
                a * m.rates.stirrupsPerKg() + k * c.rates.stirrupsPerKg(),
                a * m.rates.formworkPerM2() + k * c.rates.formworkPerM2(),
                a * m.rates.depthPremiumPerM() + k * c.rates.depthPremiumPerM(),
                m.rates.lapFactor());
        return new CostModel(r, this, Objective.COST, m, c, true, a);
    }

    /**
     * The weight of money in this model's prices: 1 pricing cost, 0 pricing carbon, a blend's share of cost.
     * A price paid in money alone (a set of forms) enters a search with this weight.
     */
    public double moneyShare() {
        return moneyShare;
    }

    /** What this model's prices are: cost (currency) or carbon (kg CO2e). */
    public Objective objective() {
        return objective;
    }

    /** The model pricing in currency: this one unless it prices carbon. */
    public CostModel money() {
        return money == null ? this : money;
    }

    /** The model pricing in kg CO2e, stages A1-A3; null where no carbon factors were given. */
    public CostModel carbon() {
        return objective == Objective.CARBON ? this : carbon;
    }

    /** Clear cover to the stirrups, mm (the hoops' size). */
    public double cover() {
        return cover;
    }

    public CostRates rates() {
        return rates;
    }

    /** Concrete, formwork and depth premium of a section, per metre. */
    public CostBreakdown frame(double b, double h, Flange flange) {
        double webDepth = flange == null ? h : h - flange.thickness();
        double concrete = rates.concretePerM3() * (b / 1000.0) * (webDepth / 1000.0);
        double formwork = rates.formworkPerM2() * (b + 2 * webDepth) / 1000.0;
        double premium = rates.depthPremiumPerM() * h / 1000.0;
        return new CostBreakdown(concrete, 0, 0, formwork, premium);
    }

    /**
     * The price of a kilogram of main (longitudinal) bars in the beam: the rate times the lap and waste
     * factor. Every main-bar price is this times a mass, multiplied in the order of the methods below:
     * a product in another order can differ in its last bit, and so change which design is cheapest.
     */
    public double mainBarPricePerKg() {
        return rates.mainBarsPerKg() * rates.lapFactor();
    }

    /** Main (longitudinal) bars, per metre. */
    public double bars(BarSize bar, int count) {
        return mainBarPricePerKg() * bar.massPerMetre() * count;
    }

    /** {@code count} main bars each {@code length} mm long. */
    public double bars(BarSize bar, int count, double length) {
        return bars(bar, count) * length / 1000.0;
    }

    /** Main bars of one size, {@code metres} of them in all. */
    public double barMetres(BarSize bar, double metres) {
        return mainBarPricePerKg() * bar.massPerMetre() * metres;
    }

    /**
     * Centre-line length of one stirrup set, mm: the closed hoop and a crosstie for every leg beyond two,
     * {@link #hoopLength} + (legs − 2) {@link #crosstieLength}; the bar list gives the two as separate bars.
     */
    public double stirrupSetLength(double b, double h, BarSize bar, int legs) {
        return hoopLength(b, h, bar) + (legs - 2) * crosstieLength(h, bar);
    }

    /** Centre-line length of the closed hoop, mm: its perimeter inside the cover plus two 135° hooks. */
    public double hoopLength(double b, double h, BarSize bar) {
        double ds = bar.diameter();
        double w = b - 2 * cover - ds;
        double ht = h - 2 * cover - ds;
        double hook = StirrupHooks.extension135(bar, code);
        return 2 * w + 2 * ht + 2 * hook;
    }

    /** Centre-line length of one crosstie, mm: one leg the height of the hoop plus a 135° hook at each end. */
    public double crosstieLength(double h, BarSize bar) {
        double ds = bar.diameter();
        double ht = h - 2 * cover - ds;
        double hook = StirrupHooks.extension135(bar, code);
        return ht + 2 * hook;
    }

    /** Stirrups, per metre of beam. */
    public double stirrups(double b, double h, Stirrups s) {
        return stirrupsPerMetre(
                stirrupSetLength(b, h, s.bar(), s.legs()) / 1000.0 * s.bar().massPerMetre(), s.spacing());
    }

    /**
     * The least of {@link #stirrups} over every legs count and spacing given: a search's bound on a frame's
     * stirrups. Each set's mass is worked out once per legs count; the prices are the same numbers.
     */
    public double cheapestStirrups(double b, double h, BarSize bar, List<Integer> legs, List<Double> spacings) {
        double least = Double.POSITIVE_INFINITY;
        for (int n : legs) {
            double kgPerSet = stirrupSetLength(b, h, bar, n) / 1000.0 * bar.massPerMetre();
            for (double spacing : spacings) {
                least = Math.min(least, stirrupsPerMetre(kgPerSet, spacing));
            }
        }
        return least;
    }

    private double stirrupsPerMetre(double kgPerSet, double spacing) {
        double setsPerMetre = 1000.0 / spacing;
        return rates.stirrupsPerKg() * kgPerSet * setsPerMetre;
    }

    /** {@code sets} stirrup sets (a zone's stirrups). */
    public double stirrupSets(double b, double h, Stirrups s, int sets) {
        return rates.stirrupsPerKg()
                * s.bar().massPerMetre()
                * sets
                * stirrupSetLength(b, h, s.bar(), s.legs())
                / 1000.0;
    }

    /** An amount in currency to the searches' units ({@link #UNITS}). */
    public static long units(double cost) {
        return UNITS.units(cost);
    }

    /** The searches' units ({@link #UNITS}) back to currency. */
    public static double currency(long units) {
        return UNITS.currency(units);
    }
}
