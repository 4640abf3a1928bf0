package org.gyreplan.solver.upwelling;

/** Test access to the package-private great-circle distance. */
final class FieldSamplerAccess {
    private FieldSamplerAccess() {}

    static double greatCircleKm(double lon1, double lat1, double lon2, double lat2, double radiusM) {
        return FieldSampler.greatCircleKm(lon1, lat1, lon2, lat2, radiusM);
    }
}
