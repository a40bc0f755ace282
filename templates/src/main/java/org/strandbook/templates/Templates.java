package org.strandbook.templates;

import java.io.InputStream;
import java.io.UncheckedIOException;

/** Access to the XLSX templates and component catalogs shipped in this module. */
public final class Templates {

    private Templates() {
    }

    /** Opens a resource kept beside this class; the caller closes it. */
    public static InputStream open(String name) {
        InputStream in = Templates.class.getResourceAsStream(name);
        if (in == null) {
            throw new UncheckedIOException(new java.io.FileNotFoundException("template not found: " + name));
        }
        return in;
    }
}
