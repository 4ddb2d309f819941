package org.tautline.app.ui.setup;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Material;
import org.tautline.analysis.specimen.Specimen;

/**
 * A handbook material offered on the setup screen; with a diameter it fills the section properties of a solid round wire.
 *
 * <p>Densities and moduli are those of {@link Material}: handbook material tables (music wire E
 * 190-210 GPa, rho 7.80-7.86 g/cm^3; 302/304 stainless E 193 GPa, rho 7.92 g/cm^3; nylon 6,6 rho
 * 1.14 g/cm^3, E 2-5 GPa; PET rho 1.38 g/cm^3; para-aramid rho 1.44-1.47 g/cm^3, E 83-186 GPa), with
 * uniform-range uncertainties. The section formulas (mu = rho pi d^2/4, EI = E pi d^4/64) are those of
 * {@link Specimen#roundWire}.
 *
 * @param material the handbook material
 */
public record MaterialPreset(Material material) {

    /** @return every material the handbook tables give */
    public static List<MaterialPreset> all() {
        return Arrays.stream(Material.values()).map(MaterialPreset::new).toList();
    }

    /** @return the label and the source values, for the choice list */
    @Override
    public String toString() {
        String modulus = material.hasYoungsModulus()
                ? String.format(java.util.Locale.ROOT, "%.0f GPa", material.youngsModulusPa() / 1e9) : "no modulus";
        return String.format(java.util.Locale.ROOT, "%s (%.0f kg/m³, %s)", material.label(), material.densityKgPerM3(),
                modulus);
    }

    /**
     * @param diameterM diameter of the solid round wire, m, positive
     * @return the field values it sets: mass per length, bending and axial stiffness, with uncertainties
     */
    public Map<String, String> valuesFor(double diameterM) {
        if (!(diameterM > 0) || Double.isInfinite(diameterM)) {
            throw new IllegalArgumentException("wire diameter must be a positive number of metres, got " + diameterM);
        }
        Specimen s = Specimen.roundWire("preset", material, diameterM, 1.0, EndCondition.PINNED, 0.1, 0.5, 100.0);
        Map<String, String> v = new LinkedHashMap<>();
        v.put("linearDensityKgPerM", SetupForm.format(s.linearDensityKgPerM()));
        v.put("linearDensityStdKgPerM", SetupForm.format(s.linearDensityStdKgPerM()));
        v.put("bendingStiffnessNm2", SetupForm.format(s.bendingStiffnessNm2()));
        v.put("bendingStiffnessStdNm2", SetupForm.format(s.bendingStiffnessStdNm2()));
        v.put("axialStiffnessN", SetupForm.format(s.axialStiffnessN()));
        return v;
    }
}
