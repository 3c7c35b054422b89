package barfit.section.anchorage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.Materials;
import barfit.section.trail.Trail;

/** Test helpers: catalog bars, materials in either edition's units, and a check that a trail is whole. */
final class Bars {
    static final double IN = 25.4;
    static final double IN2 = IN * IN;
    static final double KSI = 1000.0 / CodeEquations.PSI_PER_MPA;
    static final CodeEquations SI = CodeEquations.SI;
    static final CodeEquations US = CodeEquations.INCH_POUND;

    private static final BarCatalog SI_BARS = BarCatalogs.builtIn("astm-a615m").orElseThrow();
    private static final BarCatalog US_BARS = BarCatalogs.builtIn("astm-a615").orElseThrow();

    private Bars() {}

    static BarSize si(String size) {
        return SI_BARS.find(size).orElseThrow();
    }

    static BarSize us(String size) {
        return US_BARS.find(size).orElseThrow();
    }

    static Materials siMaterials(double fc, double fy) {
        return new Materials(fc, fy, fy, 20, 1.0);
    }

    /** f'c in psi, fy in ksi, normal-weight concrete. */
    static Materials usMaterials(double fcPsi, double fyKsi) {
        return new Materials(fcPsi / CodeEquations.PSI_PER_MPA, fyKsi * KSI, fyKsi * KSI, 19.05, 1.0);
    }

    /** Every step of the trail fills each {} of its substitution with one argument, and it says something. */
    static void assertWhole(Trail t) {
        assertFalse(t.entries().isEmpty(), "the trail records the working");
        for (Trail.Entry e : t.entries()) {
            if (e instanceof Trail.Step s && s.substitution() != null) {
                int holes = s.substitution().split("\\{}", -1).length - 1;
                assertEquals(holes, s.args().size(), s.symbol() + ": " + s.substitution());
            }
        }
    }
}
