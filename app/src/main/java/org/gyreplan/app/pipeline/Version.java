package org.gyreplan.app.pipeline;

/** The program version shown in reports and output metadata. */
public final class Version {
    private Version() {}

    /** Version from the jar manifest when packaged, else the development version. */
    public static String current() {
        String v = Version.class.getPackage().getImplementationVersion();
        return v != null ? v : "0.1.0-SNAPSHOT";
    }
}
