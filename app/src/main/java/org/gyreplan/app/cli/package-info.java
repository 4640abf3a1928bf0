/**
 * Command line ({@code gyreplan}), one class per subcommand: {@code run}, {@code inspect}, {@code verify},
 * {@code desktop}. Imports no JavaFX (the desktop app is loaded reflectively).
 */
package org.gyreplan.app.cli;
