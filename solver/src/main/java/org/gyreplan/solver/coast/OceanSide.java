package org.gyreplan.solver.coast;

/** Side of a line, looking along the order of its vertices, on which the ocean lies. */
public enum OceanSide {
    /** The ocean is on the left-hand side when walking from the first to the last vertex. */
    LEFT,
    /** The ocean is on the right-hand side when walking from the first to the last vertex. */
    RIGHT
}
