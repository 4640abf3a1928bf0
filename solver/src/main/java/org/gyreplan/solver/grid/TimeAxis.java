package org.gyreplan.solver.grid;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/** An ordered list of UTC instants, one per time step of a field series. */
public record TimeAxis(List<Instant> instants) {
    public TimeAxis {
        Objects.requireNonNull(instants, "instants");
        instants = List.copyOf(instants);
        for (int k = 1; k < instants.size(); k++) {
            if (!instants.get(k).isAfter(instants.get(k - 1))) {
                throw new IllegalArgumentException("time axis must increase strictly: step " + k + " ("
                        + instants.get(k) + ") is not after " + instants.get(k - 1));
            }
        }
    }
    public int size() { return instants.size(); }
    public Instant get(int k) { return instants.get(k); }
}
