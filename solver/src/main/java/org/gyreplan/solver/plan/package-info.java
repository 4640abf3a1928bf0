/**
 * Planning: turning the physics into decisions — upwelling zones ({@code plan.zones}), mooring sites
 * ({@code plan.mooring}) and a survey cruise with route and schedule ({@code plan.survey}).
 *
 * <h2>Units</h2>
 * <ul>
 *   <li>SI inside: distances in m, times in s, speeds in m s⁻¹, Ekman pumping in m s⁻¹ (positive upward).</li>
 *   <li>Coordinates in degrees (names end in {@code Deg}); bearings in degrees clockwise from true north.</li>
 *   <li>km, nautical miles (1 nmi = 1852 m exactly), knots (1 kn = 1852/3600 m s⁻¹), hours, days and m day⁻¹
 *       appear only in names that say so ({@code ...Km}, {@code ...Nmi}, {@code ...Kn}, {@code ...Hours});
 *       conversions live in {@link org.gyreplan.solver.plan.PlanUnits}.</li>
 *   <li>Depth in m, positive down.</li>
 *   <li>Geodesics on the WGS 84 ellipsoid through GeographicLib (Karney 2013, "Algorithms for geodesics",
 *       J. Geodesy 87, 43–55).</li>
 * </ul>
 *
 * <p>Everything here feeds work at sea and carries the cautions of {@link org.gyreplan.solver.plan.Cautions}:
 * not for navigation; the master and licensed practice decide.
 */
package org.gyreplan.solver.plan;
