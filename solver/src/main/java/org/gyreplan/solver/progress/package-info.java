/** Plain progress reporting and cooperative cancellation for long computations (no UI types). */
package org.gyreplan.solver.progress;
