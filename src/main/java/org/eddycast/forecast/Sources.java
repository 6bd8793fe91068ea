package org.eddycast.forecast;

/** The published sources the forecast layer cites, in one place. */
public final class Sources {

    private Sources() {
    }

    public static final Reference FISCHER_1979 = new Reference("Fischer, List, Koh, Imberger & Brooks", 1979,
            "Mixing in Inland and Coastal Waters", "Academic Press, ch. 5");
    public static final Reference ELDER_1959 = new Reference("Elder", 1959,
            "The dispersion of marked fluid in turbulent shear flow", "J. Fluid Mech. 5:544");
    public static final Reference FISCHER_1975 = new Reference("Fischer", 1975,
            "Discussion of 'Simple method for predicting dispersion in streams'",
            "J. Environ. Eng. Div. ASCE 101:453");
    public static final Reference GRENVILLE_NIENOW_2004 = new Reference("Grenville & Nienow", 2004,
            "Blending of miscible liquids, in Handbook of Industrial Mixing (Paul, Atiemo-Obeng & Kresta, eds.)",
            "Wiley, ch. 9; after Grenville 1992, PhD thesis, Cranfield Institute of Technology");
    public static final Reference TAYLOR_1921 = new Reference("Taylor", 1921,
            "Diffusion by continuous movements", "Proc. London Math. Soc. s2-20:196");
    public static final Reference CRANK_1975 = new Reference("Crank", 1975,
            "The Mathematics of Diffusion", "2nd ed., Oxford University Press");
    public static final Reference NEZU_NAKAGAWA_1993 = new Reference("Nezu & Nakagawa", 1993,
            "Turbulence in Open-Channel Flows", "IAHR Monograph, Balkema");
    public static final Reference CHOW_1959 = new Reference("Chow", 1959, "Open-Channel Hydraulics",
            "McGraw-Hill");
    public static final Reference MANNING_1891 = new Reference("Manning", 1891,
            "On the flow of water in open channels and pipes", "Trans. Inst. Civil Eng. Ireland 20:161");
    public static final Reference KOLMOGOROV_1941 = new Reference("Kolmogorov", 1941,
            "The local structure of turbulence in incompressible viscous fluid for very large Reynolds numbers",
            "Dokl. Akad. Nauk SSSR 30:301");
    public static final Reference POPE_2000 = new Reference("Pope", 2000, "Turbulent Flows",
            "Cambridge University Press");
    public static final Reference SREENIVASAN_1998 = new Reference("Sreenivasan", 1998,
            "An update on the energy dissipation rate in isotropic turbulence", "Phys. Fluids 10:528");
    public static final Reference RUSHTON_1950 = new Reference("Rushton, Costich & Everett", 1950,
            "Power characteristics of mixing impellers", "Chem. Eng. Prog. 46:395 and 467");
    public static final Reference IAPWS_2008 = new Reference("Huber et al.", 2009,
            "New international formulation for the viscosity of H2O", "J. Phys. Chem. Ref. Data 38:101 (IAPWS 2008)");
    public static final Reference NORWOOD_METZNER_1960 = new Reference("Norwood & Metzner", 1960,
            "Flow patterns and mixing rates in agitated vessels", "AIChE J. 6:432");
    public static final Reference CUTTER_1966 = new Reference("Cutter", 1966,
            "Local mixing rates in stirred tanks", "AIChE J. 12:35");
    public static final Reference HEMRAJANI_TATTERSON_2004 = new Reference("Hemrajani & Tatterson", 2004,
            "Mechanically stirred vessels, in Handbook of Industrial Mixing (Paul, Atiemo-Obeng & Kresta, eds.)",
            "Wiley, ch. 6");
    public static final Reference CAMP_STEIN_1943 = new Reference("Camp & Stein", 1943,
            "Velocity gradients and internal work in fluid motion", "J. Boston Soc. Civ. Eng. 30:219");
    public static final Reference ROUSSINOVA_KRESTA_2008 = new Reference("Roussinova & Kresta", 2008,
            "Comparison of continuous blend time and residence time distribution models for a stirred tank",
            "Ind. Eng. Chem. Res. 47:3532");
    public static final Reference VISSER_1997 = new Reference("Visser", 1997,
            "Using random walk models to simulate the vertical distribution of particles in a turbulent water"
                    + " column", "Mar. Ecol. Prog. Ser. 158:275");
    public static final Reference THOMSON_1987 = new Reference("Thomson", 1987,
            "Criteria for the selection of stochastic models of particle trajectories in turbulent flows",
            "J. Fluid Mech. 180:529");
}
