package eluvia.zone;

/**
 * A column of the block model (one plan cell) holding at least one block above a cleanup level.
 *
 * @param columnIndex          easting index i of the cell
 * @param rowIndex             northing index j of the cell
 * @param centreEastingMetres  easting of the cell centre, m
 * @param centreNorthingMetres northing of the cell centre, m
 * @param topDepthMetres       depth of the top of the shallowest block above the level in the cell, m
 * @param bottomDepthMetres    depth of the bottom of the deepest such block, m
 * @param blocksAbove          the number of blocks above the level in the cell
 */
public record PlanCell(int columnIndex, int rowIndex, double centreEastingMetres, double centreNorthingMetres,
        double topDepthMetres, double bottomDepthMetres, int blocksAbove) {
}
