package org.eddycast.forecast;

import java.util.List;

import org.eddycast.field.PowerLawBand;
import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.SpectrumSpec;

/**
 * The Kolmogorov length and the -5/3 power-law band shared by the tank and channel rules.
 *
 * @param spec        the spectrum
 * @param derivations the Kolmogorov length and the band, as derivation steps
 */
record SpectrumStep(SpectrumSpec spec, List<Derivation> derivations) {

    static SpectrumStep of(double integralLength, double viscosity, double dissipation,
                           double bandEndInKolmogorovLengths, List<String> warnings) {
        double eta = Math.pow(viscosity * viscosity * viscosity / dissipation, 0.25);
        double ratio = integralLength / (bandEndInKolmogorovLengths * eta);
        if (ratio < 1.0) {
            warnings.add(String.format("the integral length is only %.3g Kolmogorov lengths: no inertial range,"
                    + " the -5/3 band collapses to a single scale", integralLength / eta));
            ratio = 1.0;
        }
        if (ratio > PowerLawBand.MAX_RATIO) {
            // a huge vessel or a fast flow: the inertial range spans more decades than the field samples
            warnings.add(String.format("the inertial range spans %.3g decades of wavenumber, more than the %.0f the "
                    + "field samples: eddies smaller than L / %.0e are left out (they carry little of the spreading,"
                    + " whose eddy diffusivity is set by the large scales)", Math.log10(ratio),
                    Math.log10(PowerLawBand.MAX_RATIO), PowerLawBand.MAX_RATIO));
            ratio = PowerLawBand.MAX_RATIO;
        }
        Derivation kolmogorov = new Derivation("Kolmogorov length", eta, "m", "eta = (nu^3 / eps)^(1/4)",
                Sources.KOLMOGOROV_1941.cite());
        Derivation band = new Derivation("spectrum band ratio", ratio, "",
                String.format("E(k) ~ k^(-5/3) from 1/L to 1/(%.0f eta): ratio L / (%.0f eta), at least 1",
                        bandEndInKolmogorovLengths, bandEndInKolmogorovLengths),
                "Kolmogorov 1941 slope; band end: " + Sources.POPE_2000.cite()
                        + ", sec. 6.1, dissipation range below about 60 eta (from memory)");
        return new SpectrumStep(SpectrumSpec.powerLaw(SpectrumSpec.KOLMOGOROV_SLOPE, ratio),
                List.of(kolmogorov, band));
    }
}
