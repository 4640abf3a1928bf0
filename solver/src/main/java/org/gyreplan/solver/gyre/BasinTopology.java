package org.gyreplan.solver.gyre;

import org.gyreplan.solver.grid.LonLatGrid;

import java.util.ArrayList;
import java.util.List;

/**
 * Connectivity of a masked basin: ocean components, the main basin and its islands.
 *
 * <ul>
 *   <li>Ocean cells connect through shared edges (4-connectivity): the five-point operators couple only those.</li>
 *   <li>The main basin is the largest ocean component (ties: the one met first in row-major order). Smaller ocean
 *       components are reported and excluded (treated as land).</li>
 *   <li>Land (everything that is not main-basin ocean) connects through edges and corners (8-connectivity, the dual
 *       of 4-connected ocean: two land cells touching at a corner block the flow between them). The outside of the
 *       grid is land. The land component that touches the grid edge is the outer coast (ψ = 0); every other land
 *       component is an island, whose coast carries its own constant ψ (island rule, Godfrey 1989).</li>
 * </ul>
 *
 * Longitudes are continuous on {@link LonLatGrid}, so a basin crossing the antimeridian needs nothing special.
 */
public final class BasinTopology {
    /** An island: a land component enclosed by the main basin. */
    public record Island(int id, int[] cells, double centreLonDeg, double centreLatDeg) {
        public int cellCount() { return cells.length; }
        /** One-line description for messages. */
        public String describe() {
            return String.format("island #%d (%d cells, centre %.3f°E %.3f°N)", id, cells.length, centreLonDeg, centreLatDeg);
        }
    }

    private final LonLatGrid grid;
    private final boolean[] main;
    private final int mainCount;
    private final int oceanComponentCount;
    private final int excludedOceanCells;
    private final List<Island> islands;
    private final int[] islandOf;      // −1 or island id per cell
    private final boolean touchesEdge;

    private BasinTopology(LonLatGrid grid, boolean[] main, int mainCount, int comps, int excluded,
                          List<Island> islands, int[] islandOf, boolean touchesEdge) {
        this.grid = grid;
        this.main = main;
        this.mainCount = mainCount;
        this.oceanComponentCount = comps;
        this.excludedOceanCells = excluded;
        this.islands = islands;
        this.islandOf = islandOf;
        this.touchesEdge = touchesEdge;
    }

    /** Analyses the ocean mask of a grid. */
    public static BasinTopology of(LonLatGrid grid) {
        int nx = grid.nx(), ny = grid.ny(), n = nx * ny;
        boolean[] ocean = grid.oceanMask();
        int[] comp = new int[n];
        java.util.Arrays.fill(comp, -1);
        int[] stack = new int[n];
        List<Integer> sizes = new ArrayList<>();
        int nComp = 0;
        for (int start = 0; start < n; start++) {
            if (!ocean[start] || comp[start] >= 0) continue;
            int top = 0, size = 0;
            stack[top++] = start;
            comp[start] = nComp;
            while (top > 0) {
                int k = stack[--top];
                size++;
                int i = k % nx, j = k / nx;
                if (i > 0 && ocean[k - 1] && comp[k - 1] < 0) { comp[k - 1] = nComp; stack[top++] = k - 1; }
                if (i < nx - 1 && ocean[k + 1] && comp[k + 1] < 0) { comp[k + 1] = nComp; stack[top++] = k + 1; }
                if (j > 0 && ocean[k - nx] && comp[k - nx] < 0) { comp[k - nx] = nComp; stack[top++] = k - nx; }
                if (j < ny - 1 && ocean[k + nx] && comp[k + nx] < 0) { comp[k + nx] = nComp; stack[top++] = k + nx; }
            }
            sizes.add(size);
            nComp++;
        }
        int best = -1, bestSize = 0;
        for (int c = 0; c < nComp; c++) if (sizes.get(c) > bestSize) { bestSize = sizes.get(c); best = c; }
        boolean[] main = new boolean[n];
        boolean edge = false;
        for (int k = 0; k < n; k++) {
            main[k] = best >= 0 && comp[k] == best;
            if (main[k]) {
                int i = k % nx, j = k / nx;
                if (i == 0 || j == 0 || i == nx - 1 || j == ny - 1) edge = true;
            }
        }
        int oceanTotal = 0;
        for (int k = 0; k < n; k++) if (grid.isOcean(k)) oceanTotal++;
        // land components, 8-connected; component touching the grid edge = outer coast
        int[] land = new int[n];
        java.util.Arrays.fill(land, -1);
        int[] islandOf = new int[n];
        java.util.Arrays.fill(islandOf, -1);
        List<Island> islands = new ArrayList<>();
        int nLand = 0;
        int[] cells = new int[n];
        for (int start = 0; start < n; start++) {
            if (main[start] || land[start] >= 0) continue;
            int top = 0, count = 0;
            stack[top++] = start;
            land[start] = nLand;
            boolean outer = false;
            while (top > 0) {
                int k = stack[--top];
                cells[count++] = k;
                int i = k % nx, j = k / nx;
                if (i == 0 || j == 0 || i == nx - 1 || j == ny - 1) outer = true;
                for (int dj = -1; dj <= 1; dj++) {
                    int jj = j + dj;
                    if (jj < 0 || jj >= ny) continue;
                    for (int di = -1; di <= 1; di++) {
                        int ii = i + di;
                        if ((di == 0 && dj == 0) || ii < 0 || ii >= nx) continue;
                        int m = jj * nx + ii;
                        if (!main[m] && land[m] < 0) { land[m] = nLand; stack[top++] = m; }
                    }
                }
            }
            if (!outer) {
                int[] arr = java.util.Arrays.copyOf(cells, count);
                java.util.Arrays.sort(arr);
                double lon = 0, lat = 0;
                for (int k : arr) { lon += grid.lonDeg(k % nx); lat += grid.latDeg(k / nx); }
                int id = islands.size();
                for (int k : arr) islandOf[k] = id;
                islands.add(new Island(id, arr, lon / arr.length, lat / arr.length));
            }
            nLand++;
        }
        return new BasinTopology(grid, main, bestSize, nComp, oceanTotal - bestSize, List.copyOf(islands), islandOf, edge);
    }

    public LonLatGrid grid() { return grid; }
    /** Whether cell k belongs to the main basin. */
    public boolean isMain(int k) { return main[k]; }
    /** A copy of the main-basin mask. */
    public boolean[] mainMask() { return main.clone(); }
    /** Number of cells of the main basin. */
    public int mainCellCount() { return mainCount; }
    /** Number of 4-connected ocean components in the mask. */
    public int oceanComponentCount() { return oceanComponentCount; }
    /** Ocean cells outside the main basin (excluded from the solution). */
    public int excludedOceanCells() { return excludedOceanCells; }
    /** Islands of the main basin, in row-major order of their first cell. */
    public List<Island> islands() { return islands; }
    /** Island id of cell k, or −1. */
    public int islandOf(int k) { return islandOf[k]; }
    /** Whether the main basin reaches the edge of the grid (the edge is then treated as coast). */
    public boolean touchesGridEdge() { return touchesEdge; }
}
