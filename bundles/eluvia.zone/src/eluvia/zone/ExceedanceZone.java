package eluvia.zone;

import eluvia.zone.internal.ConvexHull;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The soil above the cleanup level: the blocks of a {@link BlockModel} whose estimate of at least
 * one contaminant is strictly above that contaminant's cleanup level, with their volume, plan
 * footprint, depth range and a proposed treatment zone.
 *
 * <p>A block counts whole when its centre estimate is above the level (block-model take-off), so
 * the volume is the number of such blocks times the block volume, in place (bank) m3. A block
 * that no estimate reaches (no sample in the search neighbourhood) and that no other estimated
 * contaminant puts above its level is counted in {@link #unestimatedBlockCount()}, never in the
 * volume: a result with unestimated blocks understates the zone where those blocks lie, and says
 * so in {@link #description()}.
 *
 * <p>The footprint is the set of plan cells holding at least one block above the level; its area
 * is the number of such cells times the block plan area. The proposed footprint polygon is the
 * <b>convex hull of the corners of those cells</b> (Andrew's monotone chain on the grid lines),
 * which contains every cell and bridges gaps and bays between them; the proposed treatment zone
 * extrudes it from the top of the shallowest to the bottom of the deepest block above the level.
 */
public final class ExceedanceZone {

    /** How the proposed footprint polygon is drawn, stated in every result. */
    public static final String FOOTPRINT_METHOD =
            "convex hull of the corners of the plan cells holding at least one block above the cleanup level";

    private final BlockModel blockModel;
    private final BitSet above;
    private final int unestimatedBlockCount;
    private final List<ContaminantExceedance> byContaminant;
    private final List<PlanCell> planCells;
    private final FootprintPolygon footprintPolygon;
    private final double topDepthMetres;
    private final double bottomDepthMetres;

    private ExceedanceZone(BlockModel blockModel, BitSet above, int unestimatedBlockCount,
            List<ContaminantExceedance> byContaminant) {
        this.blockModel = blockModel;
        this.above = above;
        this.unestimatedBlockCount = unestimatedBlockCount;
        this.byContaminant = List.copyOf(byContaminant);
        int nx = blockModel.countEasting();
        int ny = blockModel.countNorthing();
        int nz = blockModel.countDepth();
        List<PlanCell> cells = new ArrayList<>();
        int shallowest = Integer.MAX_VALUE;
        int deepest = -1;
        long[] rowMin = new long[ny];
        long[] rowMax = new long[ny];
        Arrays.fill(rowMin, Long.MAX_VALUE);
        Arrays.fill(rowMax, Long.MIN_VALUE);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int top = -1;
                int bottom = -1;
                int count = 0;
                for (int k = 0; k < nz; k++) {
                    if (above.get(i + nx * (j + ny * k))) {
                        if (top < 0) {
                            top = k;
                        }
                        bottom = k;
                        count++;
                    }
                }
                if (count > 0) {
                    cells.add(new PlanCell(i, j, blockModel.centreEastingMetres(i), blockModel.centreNorthingMetres(j),
                            blockModel.topDepthMetres(top), blockModel.bottomDepthMetres(bottom), count));
                    shallowest = Math.min(shallowest, top);
                    deepest = Math.max(deepest, bottom);
                    rowMin[j] = Math.min(rowMin[j], i);
                    rowMax[j] = Math.max(rowMax[j], i);
                }
            }
        }
        this.planCells = List.copyOf(cells);
        if (cells.isEmpty()) {
            topDepthMetres = Double.NaN;
            bottomDepthMetres = Double.NaN;
            footprintPolygon = new FootprintPolygon(List.of(), 0.0, FOOTPRINT_METHOD);
        } else {
            topDepthMetres = blockModel.topDepthMetres(shallowest);
            bottomDepthMetres = blockModel.bottomDepthMetres(deepest);
            footprintPolygon = hull(blockModel, rowMin, rowMax);
        }
    }

    /** The hull of the cells' corners; only each row's outermost cells can contribute vertices. */
    private static FootprintPolygon hull(BlockModel model, long[] rowMin, long[] rowMax) {
        List<Long> xs = new ArrayList<>();
        List<Long> ys = new ArrayList<>();
        for (int j = 0; j < rowMin.length; j++) {
            if (rowMin[j] == Long.MAX_VALUE) {
                continue;
            }
            long[][] corners = { { rowMin[j], j }, { rowMin[j], j + 1 }, { rowMax[j] + 1, j }, { rowMax[j] + 1, j + 1 } };
            for (long[] c : corners) {
                xs.add(c[0]);
                ys.add(c[1]);
            }
        }
        List<long[]> hull = ConvexHull.of(xs.stream().mapToLong(Long::longValue).toArray(),
                ys.stream().mapToLong(Long::longValue).toArray());
        List<PlanPoint> vertices = new ArrayList<>(hull.size());
        for (long[] v : hull) {
            vertices.add(new PlanPoint(model.originEastingMetres() + v[0] * model.blockEastingMetres(),
                    model.originNorthingMetres() + v[1] * model.blockNorthingMetres()));
        }
        double area = 0.5 * ConvexHull.twiceSignedArea(hull) * model.blockPlanAreaSquareMetres();
        return new FootprintPolygon(vertices, area, FOOTPRINT_METHOD);
    }

    /**
     * Finds the blocks above the cleanup level of at least one contaminant.
     *
     * @param estimates one entry per contaminant, at least one, all on the same block model,
     *                  with distinct names
     */
    public static ExceedanceZone find(List<ContaminantEstimate> estimates) {
        ZoneInputException.requireNonNull("contaminant estimates", estimates);
        if (estimates.isEmpty()) {
            throw new ZoneInputException("number of contaminant estimates", 0, "1 or more");
        }
        ContaminantEstimate first = ZoneInputException.requireNonNull("contaminant estimate 0", estimates.get(0));
        BlockModel model = first.estimate().blockModel();
        List<String> names = new ArrayList<>();
        for (int c = 0; c < estimates.size(); c++) {
            ContaminantEstimate e = ZoneInputException.requireNonNull("contaminant estimate " + c, estimates.get(c));
            if (!e.estimate().blockModel().equals(model)) {
                throw new ZoneInputException("block model of " + e.contaminantName(), e.estimate().blockModel(),
                        "the same block model as " + first.contaminantName() + " (" + model
                                + "); estimate every contaminant on one block model");
            }
            if (names.contains(e.contaminantName())) {
                throw new ZoneInputException("contaminantName", e.contaminantName(),
                        "a name not already used by another estimate");
            }
            names.add(e.contaminantName());
        }
        int blocks = model.blockCount();
        BitSet above = new BitSet(blocks);
        BitSet missing = new BitSet(blocks);
        List<ContaminantExceedance> summaries = new ArrayList<>();
        for (ContaminantEstimate e : estimates) {
            double level = e.cleanupLevelMgPerKg();
            BlockEstimate est = e.estimate();
            int count = 0;
            for (int b = 0; b < blocks; b++) {
                double c = est.concentrationMgPerKg(b);
                if (Double.isNaN(c)) {
                    missing.set(b);
                } else if (c > level) {
                    above.set(b);
                    count++;
                }
            }
            summaries.add(new ContaminantExceedance(e.contaminantName(), level, count,
                    count * model.blockVolumeCubicMetres(), est.maxConcentrationMgPerKg(), est.unestimatedBlockCount(),
                    est.methodDescription()));
        }
        missing.andNot(above);
        return new ExceedanceZone(model, above, missing.cardinality(), summaries);
    }

    /** Finds the blocks above the cleanup level of one contaminant. */
    public static ExceedanceZone find(ContaminantEstimate estimate) {
        return find(List.of(ZoneInputException.requireNonNull("contaminant estimate", estimate)));
    }

    /** The block model. */
    public BlockModel blockModel() {
        return blockModel;
    }

    /** True when no block is above any cleanup level. */
    public boolean isEmpty() {
        return above.isEmpty();
    }

    /** The number of blocks above the cleanup level of at least one contaminant. */
    public int blockCount() {
        return above.cardinality();
    }

    /** The in-place (bank) volume of the blocks above the level of at least one contaminant, m3. */
    public double volumeCubicMetres() {
        return blockCount() * blockModel.blockVolumeCubicMetres();
    }

    /** Whether a block is above the cleanup level of at least one contaminant. */
    public boolean isAbove(int blockIndex) {
        if (blockIndex < 0 || blockIndex >= blockModel.blockCount()) {
            throw new ZoneInputException("block index", blockIndex, "0 to " + (blockModel.blockCount() - 1));
        }
        return above.get(blockIndex);
    }

    /** The linear indices of the blocks above the level, ascending. */
    public int[] blockIndices() {
        return above.stream().toArray();
    }

    /** The blocks without an estimate that no estimated contaminant puts above its level. */
    public int unestimatedBlockCount() {
        return unestimatedBlockCount;
    }

    /** The result per contaminant, in the order given. */
    public List<ContaminantExceedance> byContaminant() {
        return byContaminant;
    }

    /** The plan cells holding at least one block above the level, by row then column. */
    public List<PlanCell> planCells() {
        return planCells;
    }

    /** The footprint area, the number of plan cells times the block plan area, m2. */
    public double footprintAreaSquareMetres() {
        return planCells.size() * blockModel.blockPlanAreaSquareMetres();
    }

    /** Depth of the top of the shallowest block above the level, m (NaN when empty). */
    public double topDepthMetres() {
        return topDepthMetres;
    }

    /** Depth of the bottom of the deepest block above the level, m (NaN when empty). */
    public double bottomDepthMetres() {
        return bottomDepthMetres;
    }

    /** The proposed footprint polygon ({@value #FOOTPRINT_METHOD}); no vertices when empty. */
    public FootprintPolygon footprintPolygon() {
        return footprintPolygon;
    }

    /** The proposed treatment zone: the footprint polygon over the depth range; empty when no block is above. */
    public Optional<TreatmentZone> proposedTreatmentZone() {
        if (isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new TreatmentZone(footprintPolygon, topDepthMetres, bottomDepthMetres,
                FOOTPRINT_METHOD + ", from the top of the shallowest to the bottom of the deepest such block"));
    }

    /** A paragraph for results: volume, footprint, depth range, unestimated blocks, per contaminant. */
    public String description() {
        StringBuilder text = new StringBuilder();
        text.append(String.format(Locale.ROOT,
                "%d blocks (%.1f m3) above the cleanup level of at least one contaminant; footprint %d plan cells "
                        + "(%.1f m2)",
                blockCount(), volumeCubicMetres(), planCells.size(), footprintAreaSquareMetres()));
        if (!isEmpty()) {
            text.append(String.format(Locale.ROOT, ", %.2f to %.2f m deep; proposed footprint: %s (%.1f m2)",
                    topDepthMetres, bottomDepthMetres, FOOTPRINT_METHOD, footprintPolygon.areaSquareMetres()));
        }
        text.append('.');
        if (unestimatedBlockCount > 0) {
            text.append(String.format(Locale.ROOT,
                    " %d blocks have no estimate (no sample in the search neighbourhood) and are not counted: "
                            + "widen the search radius or extend the sampling.", unestimatedBlockCount));
        }
        for (ContaminantExceedance c : byContaminant) {
            text.append(String.format(Locale.ROOT, " %s: %d blocks (%.1f m3) above %s mg/kg by %s.",
                    c.contaminantName(), c.blockCount(), c.volumeCubicMetres(), c.cleanupLevelMgPerKg(),
                    c.methodDescription()));
        }
        return text.toString();
    }
}
