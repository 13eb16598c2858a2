package eluvia.zone;

/**
 * A regular three-dimensional grid of soil blocks, each of the same size, addressed by column
 * (easting) index {@code i}, row (northing) index {@code j} and layer (depth) index {@code k}.
 *
 * <p>The origin is the corner of the grid with the smallest easting, the smallest northing and
 * the shallowest depth. Depths are measured downwards from the (level) ground surface, so layer
 * {@code k} spans depths {@code originDepthMetres + k dz} to {@code originDepthMetres + (k + 1) dz}.
 * A block stands for its centre: every estimator evaluates concentrations at block centres, and
 * a block counts as wholly above a cleanup level when its centre estimate is above it (the usual
 * block-model take-off). The linear block index is {@code i + nx (j + ny k)}.
 *
 * @param originEastingMetres  easting of the grid's west edge, m
 * @param originNorthingMetres northing of the grid's south edge, m
 * @param originDepthMetres    depth of the grid's top face below ground, m, 0 or more
 * @param blockEastingMetres   block size along easting (dx), m, greater than 0
 * @param blockNorthingMetres  block size along northing (dy), m, greater than 0
 * @param blockDepthMetres     block size along depth (dz), m, greater than 0
 * @param countEasting         number of blocks along easting (nx), 1 or more
 * @param countNorthing        number of blocks along northing (ny), 1 or more
 * @param countDepth           number of blocks along depth (nz), 1 or more
 */
public record BlockModel(double originEastingMetres, double originNorthingMetres, double originDepthMetres,
        double blockEastingMetres, double blockNorthingMetres, double blockDepthMetres,
        int countEasting, int countNorthing, int countDepth) {

    /**
     * The largest number of blocks a model may hold (20 million): each estimate holds one double
     * per block, so this keeps one estimate under 160 MB.
     */
    public static final long MAX_BLOCKS = 20_000_000L;

    /** Checks every field; throws {@link ZoneInputException} naming the field and its range. */
    public BlockModel {
        ZoneInputException.requireFinite("block model originEastingMetres", originEastingMetres);
        ZoneInputException.requireFinite("block model originNorthingMetres", originNorthingMetres);
        ZoneInputException.requireNonNegative("block model originDepthMetres", originDepthMetres);
        ZoneInputException.requirePositive("block model blockEastingMetres", blockEastingMetres);
        ZoneInputException.requirePositive("block model blockNorthingMetres", blockNorthingMetres);
        ZoneInputException.requirePositive("block model blockDepthMetres", blockDepthMetres);
        ZoneInputException.requireAtLeast("block model countEasting", countEasting, 1);
        ZoneInputException.requireAtLeast("block model countNorthing", countNorthing, 1);
        ZoneInputException.requireAtLeast("block model countDepth", countDepth, 1);
        long blocks = (long) countEasting * countNorthing * countDepth;
        if (blocks > MAX_BLOCKS) {
            throw new ZoneInputException("block model block count (countEasting x countNorthing x countDepth)",
                    blocks, "at most " + MAX_BLOCKS + "; use larger blocks or a smaller model area");
        }
    }

    /** The number of blocks, nx ny nz. */
    public int blockCount() {
        return countEasting * countNorthing * countDepth;
    }

    /** The number of plan cells (columns of blocks), nx ny. */
    public int planCellCount() {
        return countEasting * countNorthing;
    }

    /** The volume of one block, dx dy dz, m3. */
    public double blockVolumeCubicMetres() {
        return blockEastingMetres * blockNorthingMetres * blockDepthMetres;
    }

    /** The plan area of one block, dx dy, m2. */
    public double blockPlanAreaSquareMetres() {
        return blockEastingMetres * blockNorthingMetres;
    }

    /** Easting of the centre of column {@code i}, m. */
    public double centreEastingMetres(int i) {
        return originEastingMetres + (i + 0.5) * blockEastingMetres;
    }

    /** Northing of the centre of row {@code j}, m. */
    public double centreNorthingMetres(int j) {
        return originNorthingMetres + (j + 0.5) * blockNorthingMetres;
    }

    /** Depth of the centre of layer {@code k} below ground, m. */
    public double centreDepthMetres(int k) {
        return originDepthMetres + (k + 0.5) * blockDepthMetres;
    }

    /** Depth of the top face of layer {@code k} below ground, m. */
    public double topDepthMetres(int k) {
        return originDepthMetres + k * blockDepthMetres;
    }

    /** Depth of the bottom face of layer {@code k} below ground, m. */
    public double bottomDepthMetres(int k) {
        return originDepthMetres + (k + 1) * blockDepthMetres;
    }

    /** The linear index of block (i, j, k); throws when an index is outside the grid. */
    public int blockIndex(int i, int j, int k) {
        checkIndex("column index i", i, countEasting);
        checkIndex("row index j", j, countNorthing);
        checkIndex("layer index k", k, countDepth);
        return i + countEasting * (j + countNorthing * k);
    }

    /** The column index i of a linear block index. */
    public int columnOf(int blockIndex) {
        checkIndex("block index", blockIndex, blockCount());
        return blockIndex % countEasting;
    }

    /** The row index j of a linear block index. */
    public int rowOf(int blockIndex) {
        checkIndex("block index", blockIndex, blockCount());
        return (blockIndex / countEasting) % countNorthing;
    }

    /** The layer index k of a linear block index. */
    public int layerOf(int blockIndex) {
        checkIndex("block index", blockIndex, blockCount());
        return blockIndex / (countEasting * countNorthing);
    }

    private static void checkIndex(String name, int index, int count) {
        if (index < 0 || index >= count) {
            throw new ZoneInputException(name, index, "0 to " + (count - 1));
        }
    }
}
