package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * Solver outputs and operating choices that the flushing take-off turns into quantities.
 *
 * <p>The flushing solver gives the pore volumes needed to reach the cleanup level and the volume
 * of one pore volume; the rest are design choices. One pore volume is theta L A (water content x
 * layer thickness x area), so the applied rate q A delivers a pore volume every theta L / q days.
 *
 * @param poreVolumes                      pore volumes to reach the cleanup level (dimensionless), greater than 0
 * @param poreVolumeCubicMetres            volume of one pore volume, m3, greater than 0
 * @param darcyFluxMetresPerDay            Darcy flux through the treated layer while operating, m/d, greater than 0
 * @param areaSquareMetres                 flushed plan area, m2, greater than 0
 * @param operatingDaysPerWeek             days per calendar week the system runs, in (0, 7]
 * @param captureEfficiencyFraction        fraction of the applied water the extraction system
 *                                         captures (dimensionless), in [0, 1]
 * @param extractionToInjectionRatio       extracted volume per applied volume (dimensionless), in
 *                                         [1, 10]; 1 = balanced, more to keep hydraulic control
 * @param monitoring                       sampling plan
 * @param amendmentDoseKilogramsPerCubicMetre amendment (surfactant, cosolvent...) per m3 of applied
 *                                         water, kg/m3, in [0, 1000]; 0 = plain water
 */
public record FlushingInput(double poreVolumes, double poreVolumeCubicMetres, double darcyFluxMetresPerDay,
        double areaSquareMetres, double operatingDaysPerWeek, double captureEfficiencyFraction,
        double extractionToInjectionRatio, MonitoringPlan monitoring, double amendmentDoseKilogramsPerCubicMetre) {

    /** Checks the fields. */
    public FlushingInput {
        Checks.positive("poreVolumes (dimensionless)", poreVolumes);
        Checks.positive("poreVolumeCubicMetres", poreVolumeCubicMetres);
        Checks.positive("darcyFluxMetresPerDay", darcyFluxMetresPerDay);
        Checks.positive("areaSquareMetres", areaSquareMetres);
        Checks.openClosed("operatingDaysPerWeek", operatingDaysPerWeek, 0.0, 7.0, null);
        Checks.closed("captureEfficiencyFraction", captureEfficiencyFraction, 0.0, 1.0,
                "enter a fraction (0.9 for 90 %)");
        Checks.closed("extractionToInjectionRatio (dimensionless)", extractionToInjectionRatio, 1.0, 10.0,
                "1 extracts as much as is applied; extracting less cannot capture the flushing water");
        Checks.notNull("monitoring plan", monitoring);
        Checks.closed("amendmentDoseKilogramsPerCubicMetre", amendmentDoseKilogramsPerCubicMetre, 0.0, 1000.0,
                "enter kg of amendment per m3 of water (10 for a 1 % by mass solution); 0 for plain water");
    }
}
