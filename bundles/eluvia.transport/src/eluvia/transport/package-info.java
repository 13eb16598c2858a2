/**
 * Transport numerics for soil flushing: the transport properties of a layer, analytical
 * flushing solutions and the pore-volume search, column-test calibration and the spreading of a
 * contaminated zone by dispersion. Plain Java and Commons Math, no user interface.
 *
 * <p>Entry points: {@link eluvia.transport.LayerFlushingInput} and
 * {@link eluvia.transport.LayerTransport} (inputs and derived groups R, v, D, P); the models of
 * {@link eluvia.transport.FlushingModels} (finite layer: Brenner 1962 with the initial-value form
 * of van Genuchten and Alves 1982; well-mixed; plug flow; two-region: van Genuchten and Wierenga
 * 1976, Nkedi-Kizza et al. 1984); {@link eluvia.transport.PoreVolumeSearch} and
 * {@link eluvia.transport.FlushingScreening}; {@link eluvia.transport.ReboundEstimate};
 * {@link eluvia.transport.SemiInfiniteSolutions} (Ogata and Banks 1961, Lindstrom et al. 1967);
 * {@link eluvia.transport.ColumnTestFit}; {@link eluvia.transport.SourceSpreading} (Crank 1975,
 * Hunt 1978); {@link eluvia.transport.FlushingPushDown}; {@link eluvia.transport.FluxLimit}.
 *
 * <p>Units are in every name: metres, days, m/day, m2/day, kg/m3, L/kg; diffusion coefficients in
 * m2/s as tabulated. Pore volumes T = q t / (theta L) and every fraction of an initial
 * concentration are dimensionless. Bad inputs throw {@link eluvia.transport.TransportInputException}
 * with the quantity, the value and the allowed range.
 */
package eluvia.transport;
