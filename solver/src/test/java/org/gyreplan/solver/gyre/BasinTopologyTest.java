package org.gyreplan.solver.gyre;

import org.gyreplan.solver.grid.LonLatGrid;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Connectivity rules of {@link BasinTopology} (4-connected ocean, 8-connected land; common practice on C-grids). */
class BasinTopologyTest {
    /** Grid from rows of text, north row first: '.' ocean, '#' land. */
    static LonLatGrid parse(double lon0, String... rows) {
        int ny = rows.length, nx = rows[0].length();
        boolean[] ocean = new boolean[nx * ny];
        for (int r = 0; r < ny; r++) {
            int j = ny - 1 - r;
            for (int i = 0; i < nx; i++) ocean[j * nx + i] = rows[r].charAt(i) == '.';
        }
        return new LonLatGrid(nx, ny, lon0, 10, 1, 1, 6.371e6, ocean);
    }

    @Test
    void islandsAreLandNotTouchingTheOuterCoast() {
        LonLatGrid g = parse(0,
                "##########",
                "#........#",
                "#.##.....#",
                "#.##...#.#",
                "#........#",
                "##.......#",
                "#..#.....#",
                "##########");
        BasinTopology t = BasinTopology.of(g);
        assertEquals(1, t.oceanComponentCount());
        // the 2×2 block and the single cell (7,4) are islands; (3,1) and (1,2) touch the coast and are coast
        assertEquals(2, t.islands().size());
        BasinTopology.Island block = t.islands().get(0);     // row-major order of the first cell
        assertEquals(4, block.cellCount());
        assertEquals(2.5, block.centreLonDeg(), 1e-12);
        assertEquals(14.5, block.centreLatDeg(), 1e-12);
        assertTrue(block.describe().contains("4 cells"), block.describe());
        BasinTopology.Island single = t.islands().get(1);
        assertEquals(1, single.cellCount());
        assertEquals(7.0, single.centreLonDeg(), 1e-12);
        assertEquals(single.id(), t.islandOf(g.index(7, 4)));
        assertEquals(-1, t.islandOf(g.index(3, 1)));
        assertFalse(t.touchesGridEdge());
    }

    @Test
    void landTouchingTheCoastAtACornerIsCoastNotIsland() {
        LonLatGrid g = parse(0,
                "######",
                "#....#",
                "#.#..#",
                "##...#",
                "######");
        // (2,2) touches the coast cell (1,1) diagonally: 8-connected land → part of the outer coast
        BasinTopology t = BasinTopology.of(g);
        assertEquals(0, t.islands().size());
    }

    @Test
    void mainBasinIsTheLargestComponentAndOneCellChannelsConnect() {
        LonLatGrid g = parse(170,
                "############",
                "#...#.######",
                "#...#.#....#",
                "#.....#....#",
                "#...####...#",
                "############");
        BasinTopology t = BasinTopology.of(g);
        assertEquals(2, t.oceanComponentCount());
        // left part: 3-wide basin plus a one-cell channel up column 5 = 16 cells; right part 11 cells
        int left = 0;
        for (int k = 0; k < g.size(); k++) if (t.isMain(k)) left++;
        assertEquals(t.mainCellCount(), left);
        assertEquals(16, t.mainCellCount());
        assertEquals(11, t.excludedOceanCells());
        assertTrue(t.isMain(g.index(5, 4)));          // the channel end is in the main basin
        assertFalse(t.isMain(g.index(8, 2)));
    }

    @Test
    void gridEdgeOceanIsReported() {
        LonLatGrid g = parse(0, "....", "....");
        BasinTopology t = BasinTopology.of(g);
        assertTrue(t.touchesGridEdge());
        assertEquals(0, t.islands().size());
    }
}
