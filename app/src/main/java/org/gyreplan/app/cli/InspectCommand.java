package org.gyreplan.app.cli;

import org.gyreplan.app.pipeline.Inspection;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code gyreplan inspect <file>}: what a data file contains and how Gyreplan would read it. */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = {"Describe a data file (netCDF, CSV, polygon file, bathymetry) or a scenario:",
                "what it contains and how Gyreplan would interpret it."},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:described", "3:the file is missing or cannot be read (reason printed)"})
public final class InspectCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "<file>", description = "file to describe")
    Path file;

    @CommandLine.Spec CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        if (!Files.isRegularFile(file)) {
            spec.commandLine().getErr().println("gyreplan: " + file + ": file not found");
            return GyreplanCommand.EXIT_INPUT;
        }
        try {
            spec.commandLine().getOut().print(Inspection.describe(file));
            spec.commandLine().getOut().flush();
            return 0;
        } catch (Inspection.CannotInspect e) {
            spec.commandLine().getErr().println("gyreplan: " + file + ": " + GyreplanCommand.oneLine(e));
            return GyreplanCommand.EXIT_INPUT;
        }
    }
}
