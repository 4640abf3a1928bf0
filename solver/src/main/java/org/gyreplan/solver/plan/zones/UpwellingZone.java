package org.gyreplan.solver.plan.zones;

import org.locationtech.jts.geom.Geometry;

import java.util.List;

/**
 * One contiguous upwelling zone.
 *
 * @param id               1-based id, zones ordered by decreasing area
 * @param polygon          valid JTS Polygon or MultiPolygon in lon/lat degrees (x = longitude, continuous as in the grid;
 *                         y = latitude); holes where inner cells miss a threshold
 * @param areaKm2          spherical area, km² (sum of exact cell areas on the grid's sphere)
 * @param centroidLonDeg   area-weighted centroid longitude of the member cells, degrees east
 * @param centroidLatDeg   area-weighted centroid latitude, degrees north
 * @param meanMps          area-weighted mean of the cells' time-mean rates, m s⁻¹
 * @param peakMps          largest cell time-mean rate in the zone, m s⁻¹
 * @param peakMonthlyMps   largest zone-mean monthly climatological rate, m s⁻¹ (NaN if no monthly data)
 * @param meanPersistence  area-weighted mean persistence, fraction 0…1
 * @param peakMonth        month (1…12) of the largest zone-mean climatological rate; 0 if none
 * @param monthsActive     months (1…12, ascending) whose zone-mean climatological rate is at least the intensity threshold
 * @param cells            flat grid indices of the member cells, ascending
 */
public record UpwellingZone(int id, Geometry polygon, double areaKm2, double centroidLonDeg, double centroidLatDeg,
                            double meanMps, double peakMps, double peakMonthlyMps, double meanPersistence,
                            int peakMonth, List<Integer> monthsActive, int[] cells) {
    public UpwellingZone {
        monthsActive = List.copyOf(monthsActive);
    }
}
