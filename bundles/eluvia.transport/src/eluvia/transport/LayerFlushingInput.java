package eluvia.transport;

/**
 * One homogeneous soil layer and the conditions it is flushed under: the inputs of a screening
 * flushing calculation.
 *
 * <p>Units: thickness L in metres; volumetric water content theta and porosity n dimensionless
 * (volume fractions, theta the water-filled part of n); dry bulk density rho_b in kg/m3;
 * distribution coefficient Kd in L/kg; downward Darcy flux q in m/day; longitudinal
 * dispersivity alpha_L in metres; free-water molecular diffusion coefficient D0 in m2/s (as
 * tabulated, about 1e-9 m2/s for small solutes by common practice); first-order decay rate
 * in 1/day, applied to dissolved and sorbed contaminant alike.
 *
 * <p>The compact constructor validates every field and throws {@link TransportInputException}
 * naming the field, its value and the allowed range: thickness &gt; 0; 0 &lt; porosity &lt; 1;
 * 0 &lt; water content &le; porosity; bulk density &gt; 0; Kd &ge; 0; flux &gt; 0;
 * dispersivity &ge; 0; diffusion &ge; 0; decay &ge; 0 (all finite).
 *
 * @param thicknessMetres layer thickness L, m
 * @param waterContent volumetric water content theta during flushing, dimensionless
 * @param porosity total porosity n, dimensionless
 * @param bulkDensityKgPerCubicMetre dry bulk density rho_b, kg/m3 (1600 kg/m3 = 1.6 kg/L)
 * @param kdLitresPerKg linear sorption distribution coefficient Kd, L/kg
 * @param darcyFluxMetresPerDay Darcy flux q through the layer, m/day
 * @param dispersivityMetres longitudinal dispersivity alpha_L, m
 * @param diffusionSquareMetresPerSecond free-water diffusion coefficient D0, m2/s
 * @param decayPerDay first-order decay rate constant, 1/day
 */
public record LayerFlushingInput(double thicknessMetres, double waterContent, double porosity,
        double bulkDensityKgPerCubicMetre, double kdLitresPerKg, double darcyFluxMetresPerDay,
        double dispersivityMetres, double diffusionSquareMetresPerSecond, double decayPerDay) {

    public LayerFlushingInput {
        TransportInputException.requirePositive("layer thickness (m)", thicknessMetres);
        TransportInputException.requireOpenInterval("porosity (-)", porosity, 0, 1);
        if (!(waterContent > 0 && waterContent <= porosity)) {
            throw new TransportInputException("water content (-)", waterContent,
                    "greater than 0 and at most the porosity " + porosity
                            + " (water content is a volume fraction, not a percentage)");
        }
        TransportInputException.requirePositive("dry bulk density (kg/m3)", bulkDensityKgPerCubicMetre);
        TransportInputException.requireNonNegative("Kd (L/kg)", kdLitresPerKg);
        TransportInputException.requirePositive("Darcy flux (m/day)", darcyFluxMetresPerDay);
        TransportInputException.requireNonNegative("dispersivity (m)", dispersivityMetres);
        TransportInputException.requireNonNegative("diffusion coefficient (m2/s)", diffusionSquareMetresPerSecond);
        TransportInputException.requireNonNegative("decay rate (1/day)", decayPerDay);
    }
}
