package barfit.input;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarSize;
import barfit.catalogs.yaml.Location;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Materials;
import barfit.units.UnitSystem;

/** The project-wide part of an input file: units, materials, bar catalog and detailing defaults. */
public record Settings(
        String file,
        UnitSystem units,
        Materials materials,
        BarCatalog catalog,
        Detailing detailing,
        Location location) {

    public CodeEquations code() {
        return units.code();
    }

    public BarSize stirrupBar() {
        return detailing.stirrupBar();
    }

    /** The same settings with another stirrup bar: a beam's own stirrups place its bars. */
    /** The same settings with other materials (a study's f'c). */
    public Settings withMaterials(Materials m) {
        return new Settings(file, units, m, catalog, detailing, location);
    }

    public Settings withStirrupBar(BarSize bar) {
        return bar.equals(detailing.stirrupBar())
                ? this
                : new Settings(
                        file,
                        units,
                        materials,
                        catalog,
                        new Detailing(detailing.cover(), bar, detailing.layerGap(), detailing.exposure()),
                        location);
    }
}
