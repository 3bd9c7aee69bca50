package org.halyard.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * Entry point of the {@code halyard} command. Subcommands are listed here, once.
 *
 * <p>Every failure becomes one line {@code error: <message>} on stderr and exit code 1 (2 for a usage
 * error); {@code --debug} adds the stack trace.
 */
@Command(name = "halyard", mixinStandardHelpOptions = true, versionProvider = HalyardCli.Version.class,
        description = "Marine magnetic survey processing: lines to grids, targets and map sheets.%n"
                + "A target list is an aid to interpretation, never a clearance certificate.",
        subcommands = {
                ProcessesCommand.class,
                FilterCommand.class,
                RunCommand.class,
                SimulateCommand.class,
                DetectabilityCommand.class,
                LinesCommand.class,
                SheetCommand.class,
                GridCommand.class,
                WorkbenchCommand.class,
        })
public final class HalyardCli implements Callable<Integer> {

    @Option(names = "--debug", description = "Print stack traces with errors.", scope = CommandLine.ScopeType.INHERIT)
    boolean debug;

    @Override
    public Integer call() {
        new CommandLine(this).usage(System.out);
        return 0;
    }

    /** Runs the command line and returns the exit code, without calling {@code System.exit}. */
    public static int execute(String... args) {
        CommandLine cl = new CommandLine(new HalyardCli());
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            boolean dbg = parsed.matchedOption("--debug") != null
                    || parsed.subcommands().stream().anyMatch(p -> p.matchedOption("--debug") != null);
            PrintWriter err = line.getErr();
            err.println("error: " + oneLine(ex));
            if (dbg) {
                ex.printStackTrace(err);
            }
            err.flush();
            return 1;
        });
        cl.setParameterExceptionHandler((ex, args1) -> {
            PrintWriter err = ex.getCommandLine().getErr();
            err.println("error: " + oneLine(ex));
            err.println("(see 'halyard " + ex.getCommandLine().getCommandName() + " --help')");
            err.flush();
            return 2;
        });
        return cl.execute(args);
    }

    /** The message of an exception as one line, falling back on its causes and then its type. */
    static String oneLine(Throwable ex) {
        for (Throwable t = ex; t != null; t = t.getCause()) {
            String m = t.getMessage();
            if (m != null && !m.isBlank()) {
                return m.replaceAll("\\s*[\\r\\n]+\\s*", " ").trim();
            }
        }
        return ex.getClass().getSimpleName();
    }

    /** Loggers kept reachable so their quieter levels stick (java.util.logging holds them weakly). */
    private static final java.util.List<java.util.logging.Logger> QUIET = new java.util.ArrayList<>();

    /** Library chatter (GeoTools, image I/O) would bury our one-line messages: keep only severe records. */
    static void quietLibraryLogs() {
        for (String name : new String[] {"org.geotools", "it.geosolutions", "javax.media.jai", "mil.nga", "hsqldb.db"}) {
            java.util.logging.Logger l = java.util.logging.Logger.getLogger(name);
            l.setLevel(java.util.logging.Level.SEVERE);
            QUIET.add(l);
        }
    }

    public static void main(String[] args) {
        quietLibraryLogs();
        int code = execute(args);
        System.out.flush();
        // JTransforms' pool threads are not daemons: exit explicitly so the command returns (STACK.md).
        System.exit(code);
    }

    /** Version from the jar manifest, or "development" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = HalyardCli.class.getPackage().getImplementationVersion();
            String h = null;
            try (var in = HalyardCli.class.getResourceAsStream("/halyard-version.txt")) {
                if (in != null) {
                    h = new String(in.readAllBytes()).trim();
                }
            } catch (java.io.IOException ignored) {
                // fall through to the default below
            }
            return new String[] {"halyard " + (h != null ? h : v != null ? v : "development")};
        }
    }
}
