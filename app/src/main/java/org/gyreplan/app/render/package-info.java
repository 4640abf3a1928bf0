/**
 * Map and chart rendering with Java2D (works headless): scalar fields with colour bars (diverging scales centred
 * on zero for signed quantities), land, bathymetry shading, arrows, contours, zones, points, tracks, graticule,
 * scale bar and legend; time-series charts. Display only: no physics, no file formats.
 */
package org.gyreplan.app.render;
