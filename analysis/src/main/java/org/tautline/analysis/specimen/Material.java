package org.tautline.analysis.specimen;

/**
 * Handbook materials for strings, wires and belts, with their density and Young's modulus.
 *
 * <p>Source for every value: material tables, as summarised in checks.md (handbook ranges). Where the
 * table gives a range and no single value, the nominal value is the midpoint of the range and its
 * standard uncertainty is that of a uniform distribution over the range, (high - low)/sqrt(12).
 * Where the table gives a single value, the standard uncertainty is zero (not stated). A modulus the
 * table does not give is {@code NaN}: the bending stiffness of such a wire is then unknown (zero).
 */
public enum Material {
    /** Music wire (high-carbon spring steel): E 190-210 GPa (200 used), rho 7.80-7.86 g/cm^3 (7850 used). */
    MUSIC_WIRE("music wire", 7850, 7800, 7860, 200e9, 190e9, 210e9),
    /** 302/304 stainless spring wire: E 193 GPa, rho 7.92 g/cm^3. */
    STAINLESS_302_304("302/304 stainless spring wire", 7920, 7920, 7920, 193e9, 193e9, 193e9),
    /** Nylon 6,6: rho 1.14 g/cm^3, E 2-5 GPa (midpoint 3.5 GPa). */
    NYLON_66("nylon 6,6", 1140, 1140, 1140, 3.5e9, 2e9, 5e9),
    /** PET (polyester): rho 1.38 g/cm^3; the table gives no modulus. */
    PET("PET", 1380, 1380, 1380, Double.NaN, Double.NaN, Double.NaN),
    /** Para-aramid: rho 1.44-1.47 g/cm^3, E 83-186 GPa by grade (midpoints 1455 kg/m^3, 134.5 GPa). */
    PARA_ARAMID("para-aramid", 1455, 1440, 1470, 134.5e9, 83e9, 186e9);

    private final String label;
    private final double densityKgPerM3;
    private final double densityLowKgPerM3;
    private final double densityHighKgPerM3;
    private final double youngsModulusPa;
    private final double youngsModulusLowPa;
    private final double youngsModulusHighPa;

    Material(String label, double density, double densityLow, double densityHigh,
             double modulus, double modulusLow, double modulusHigh) {
        this.label = label;
        this.densityKgPerM3 = density;
        this.densityLowKgPerM3 = densityLow;
        this.densityHighKgPerM3 = densityHigh;
        this.youngsModulusPa = modulus;
        this.youngsModulusLowPa = modulusLow;
        this.youngsModulusHighPa = modulusHigh;
    }

    /** @return the plain name of the material, for reports */
    public String label() {
        return label;
    }

    /** @return nominal density, kg/m^3 */
    public double densityKgPerM3() {
        return densityKgPerM3;
    }

    /** @return standard uncertainty of the density, kg/m^3: (high - low)/sqrt(12) over the handbook range */
    public double densityStdKgPerM3() {
        return (densityHighKgPerM3 - densityLowKgPerM3) / Math.sqrt(12.0);
    }

    /** @return nominal Young's modulus, Pa, or {@code NaN} when the table gives none */
    public double youngsModulusPa() {
        return youngsModulusPa;
    }

    /** @return standard uncertainty of Young's modulus over the handbook range, Pa, or {@code NaN} */
    public double youngsModulusStdPa() {
        return (youngsModulusHighPa - youngsModulusLowPa) / Math.sqrt(12.0);
    }

    /** @return whether the table gives a Young's modulus for this material */
    public boolean hasYoungsModulus() {
        return !Double.isNaN(youngsModulusPa);
    }
}
