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
}
