/**
 * The scenario: one YAML file that states a whole study (basin, winds, drag law, constants, gyre model, coast
 * index, planning inputs, outputs and expected values). {@link org.gyreplan.app.scenario.ScenarioFiles} reads,
 * validates (file, line, key and allowed values for every problem) and writes it back.
 * Units: SI unless the key names another ({@code Deg}, {@code Km}, {@code Knots}, {@code Hours}).
 */
package org.gyreplan.app.scenario;
