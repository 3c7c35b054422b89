package barfit.section;

/**
 * The unit-dependent constants of ACI 318-19. The SI edition (ACI 318M-19) and the inch-pound edition
 * round some coefficients differently (0.17 vs 2 for Vc, 25 mm vs 1 in clear spacing...). The section
 * model always computes in N, mm and MPa; this record holds each constant converted exactly from the
 * edition the user works in, so a US design matches a US hand calculation.
 */
public record CodeEquations(
        String edition,
        boolean inchPound,
        double es,
        double minClearSpacing,
        double minLayerGap,
        double beta1FcLow,
        double beta1FcStep,
        double beta1FcHigh,
        Coef vcSimple,
        Coef vcRho,
        Coef vcMax,
        Coef vsSplit,
        Coef vsMax,
        Coef shearMinTrigger,
        Coef avMinRoot,
        double avMinFlat,
        Coef asMinRoot,
        double asMinFlat,
        double rootFcMax,
        double sizeEffectLength,
        double stirrupSpacingCap,
        double stirrupSpacingCapHigh,
        double crackA,
        double crackB,
        double crackFsRef,
        double skinDepthLimit,
        double minDepthFyRef,
        double minDepthFyDivisor,
        double fytMax,
        double fyMax,
        double coverInterior,
        double coverWeatherLarge,
        double coverGround,
        Coef ec,
        Coef fr,
        Coef ldSimpleSmall,
        Coef ldSimpleLarge,
        Coef ldOtherSmall,
        Coef ldOtherLarge,
        Coef ldGeneral,
        double ldMin,
        double topBarConcreteBelow,
        double smallBarLimit,
        double fyGrade420,
        double fyGrade550) {

    /** psi per MPa (exact: 1 psi = 6.894757293 kPa). */
    public static final double PSI_PER_MPA = 145.037737730;

    public static final double MM_PER_IN = 25.4;

    private static final double ROOT_PSI = Math.sqrt(PSI_PER_MPA);

    /** ACI 318M-19, the SI edition. */
    public static final CodeEquations SI = new CodeEquations(
            "ACI 318M-19 (SI units)",
            false,
            200_000.0, // 20.2.2.2
            25.0,
            25.0, // 25.2.1, 25.2.2
            28.0,
            7.0,
            55.0, // Table 22.2.2.4.3
            new Coef(0.17, "0.17"), // Table 22.5.5.1 (a)
            new Coef(0.66, "0.66"), // Table 22.5.5.1 (b), (c)
            new Coef(0.42, "0.42"), // 22.5.5.1.1
            new Coef(0.33, "0.33"), // 9.7.6.2.2
            new Coef(0.66, "0.66"), // 22.5.1.2
            new Coef(0.083, "0.083"), // 9.6.3.1
            new Coef(0.062, "0.062"),
            0.35, // Table 9.6.3.4
            new Coef(0.25, "0.25"),
            1.4, // 9.6.1.2
            8.3, // 22.5.3.1
            250.0, // 22.5.5.1.3: 1 + 0.004 d = 1 + d/250
            600.0,
            300.0, // Table 9.7.6.2.2
            380.0,
            300.0,
            280.0, // 24.3.2
            900.0, // 9.7.2.3
            420.0,
            700.0, // Table 9.3.1.1 note
            420.0, // Table 20.2.2.4(a), shear
            550.0, // Table 20.2.2.4(a), flexure
            40.0,
            50.0,
            75.0, // Table 20.5.1.3.1
            new Coef(4700.0, "4700"), // 19.2.2.1(b)
            new Coef(0.62, "0.62"), // 19.2.3.1
            new Coef(2.1, "2.1"), // Table 25.4.2.3, No. 19 and smaller, spacing and cover met
            new Coef(1.7, "1.7"), // Table 25.4.2.3, No. 22 and larger, spacing and cover met
            new Coef(1.4, "1.4"), // Table 25.4.2.3, other cases
            new Coef(1.1, "1.1"),
            new Coef(1.1, "1.1"), // 25.4.2.4(a)
            300.0, // 25.4.2.1(b)
            300.0, // Table 25.4.2.5, top bars
            20.0, // "No. 19 and smaller" (db 19.1 mm)
            420.0,
            550.0); // Table 25.4.2.5, psi_g

    /** ACI 318-19, the inch-pound edition, with every constant converted exactly to N, mm, MPa. */
    public static final CodeEquations INCH_POUND = new CodeEquations(
            "ACI 318-19 (inch-pound units)",
            true,
            29_000_000.0 / PSI_PER_MPA,
            MM_PER_IN,
            MM_PER_IN,
            4000.0 / PSI_PER_MPA,
            1000.0 / PSI_PER_MPA,
            8000.0 / PSI_PER_MPA,
            new Coef(2.0 / ROOT_PSI, "2"),
            new Coef(8.0 / ROOT_PSI, "8"),
            new Coef(5.0 / ROOT_PSI, "5"),
            new Coef(4.0 / ROOT_PSI, "4"),
            new Coef(8.0 / ROOT_PSI, "8"),
            new Coef(1.0 / ROOT_PSI, "1"),
            new Coef(0.75 / ROOT_PSI, "0.75"),
            50.0 / PSI_PER_MPA,
            new Coef(3.0 / ROOT_PSI, "3"),
            200.0 / PSI_PER_MPA,
            100.0 / ROOT_PSI,
            10.0 * MM_PER_IN,
            24.0 * MM_PER_IN,
            12.0 * MM_PER_IN,
            15.0 * MM_PER_IN,
            12.0 * MM_PER_IN,
            40_000.0 / PSI_PER_MPA,
            36.0 * MM_PER_IN,
            60_000.0 / PSI_PER_MPA,
            100_000.0 / PSI_PER_MPA,
            60_000.0 / PSI_PER_MPA,
            80_000.0 / PSI_PER_MPA,
            1.5 * MM_PER_IN,
            2.0 * MM_PER_IN,
            3.0 * MM_PER_IN,
            new Coef(57_000.0 / ROOT_PSI, "57000"),
            new Coef(7.5 / ROOT_PSI, "7.5"),
            new Coef(
                    25.0 / ROOT_PSI, "25"), // Table 25.4.2.3 (inch-pound): fy psi_t psi_e psi_g / (25 lambda sqrt(f'c))
            new Coef(20.0 / ROOT_PSI, "20"),
            new Coef(50.0 / 3.0 / ROOT_PSI, "50/3"),
            new Coef(40.0 / 3.0 / ROOT_PSI, "40/3"),
            new Coef(40.0 / 3.0 / ROOT_PSI, "40/3"), // 25.4.2.4(a): (3/40) fy / (lambda sqrt(f'c)) ...
            12.0 * MM_PER_IN,
            12.0 * MM_PER_IN,
            20.0, // "#6 and smaller" (db 0.75 in)
            60_000.0 / PSI_PER_MPA,
            80_000.0 / PSI_PER_MPA);

    /** √f'c in √MPa, capped per 22.5.3.1 (8.3 MPa, or 100 psi). */
    public double rootFcForShear(double fc) {
        return Math.min(Math.sqrt(fc), rootFcMax);
    }

    /** The constants of hooks, development in compression, laps and bar cut-offs of this edition. */
    public Anchorage anchorage() {
        return inchPound ? Anchorage.INCH_POUND : Anchorage.SI;
    }

    /**
     * The unit-dependent constants of anchorage and bar detailing (25.3.1, 25.4.3, 25.4.9, 25.5.2, 9.7.3),
     * converted exactly from the edition the user works in, like the constants of {@link CodeEquations}.
     *
     * @param ldh          25.4.3.1(a): ldh = fy ψe ψr ψo ψc / (ldh λ √f'c) × db^1.5
     * @param ldhMin       25.4.3.1(c): the least ldh
     * @param hook180Min   Table 25.3.1: the least straight extension of a 180-degree hook
     * @param psiCDivisor  Table 25.4.3.2: ψc = f'c / psiCDivisor + 0.6 below {@code psiCLimit}
     * @param psiCLimit    Table 25.4.3.2: ψc = 1.0 from this f'c up
     * @param hookCover    Table 25.4.3.2 (ψo) and 25.4.3.4: the side (and top) cover over a hook
     * @param ldcRoot      25.4.9.2(a): ldc = ldcRoot fy ψr / (λ √f'c) × db
     * @param ldcFlat      25.4.9.2(b): ldc = ldcFlat fy ψr × db
     * @param ldcMin       25.4.9.1: the least ldc
     * @param lapMin       Table 25.5.2.1: the least tension lap
     * @param extraStirrup 9.7.3.5(c): the excess stirrup area at least extraStirrup bw s / fyt (a stress)
     * @param intoSupport  9.7.3.8.1, 9.7.3.8.2: how far positive moment bars run into a support
     */
    public record Anchorage(
            Coef ldh,
            double ldhMin,
            double hook180Min,
            double psiCDivisor,
            double psiCLimit,
            double hookCover,
            Coef ldcRoot,
            Coef ldcFlat,
            double ldcMin,
            double lapMin,
            Coef extraStirrup,
            double intoSupport) {

        /**
         * ACI 318M-19. From memory: 23 in 25.4.3.1(a), f'c / 105 + 0.6 for ψc. The limit of ψc's first row is
         * taken as 40 MPa: if the edition says 42 MPa (where f'c / 105 + 0.6 reaches 1.0), 40 errs on the
         * long side between the two.
         */
        public static final Anchorage SI = new Anchorage(
                new Coef(23.0, "23"),
                150.0,
                65.0,
                105.0,
                40.0,
                65.0,
                new Coef(0.24, "0.24"),
                new Coef(0.043, "0.043"),
                200.0,
                300.0,
                new Coef(0.41, "0.41"),
                150.0);

        /**
         * ACI 318-19. 25.4.3.1(a) divides by 55 with f'c in psi and db in inches: in N and mm that is
         * 55 √25.4 / √(psi per MPa) = 23.02 (db^1.5 keeps one √in).
         */
        public static final Anchorage INCH_POUND = new Anchorage(
                new Coef(55.0 * Math.sqrt(MM_PER_IN) / ROOT_PSI, "55"),
                6.0 * MM_PER_IN,
                2.5 * MM_PER_IN,
                15_000.0 / PSI_PER_MPA,
                6000.0 / PSI_PER_MPA,
                2.5 * MM_PER_IN,
                new Coef(ROOT_PSI / 50.0, "1/50"),
                new Coef(0.0003 * PSI_PER_MPA, "0.0003"),
                8.0 * MM_PER_IN,
                12.0 * MM_PER_IN,
                new Coef(60.0 / PSI_PER_MPA, "60"),
                6.0 * MM_PER_IN);
    }
}
