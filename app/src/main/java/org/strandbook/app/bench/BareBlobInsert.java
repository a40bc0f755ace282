package org.strandbook.app.bench;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import org.sqlite.SQLiteConfig;
import org.strandbook.site.Spectrum;
import org.strandbook.store.SpectrumCodec;

/**
 * The floor of the import benchmark: the same spectra, encoded as the workbook stores them, inserted
 * with one bare prepared statement in one transaction into a one-table SQLite file with the
 * workbook's journal settings. No parsing, hashing, validation or audit: what SQLite itself costs.
 */
final class BareBlobInsert {

    private BareBlobInsert() {
    }

    /** Encodes spectra as the workbook's BLOBs (little-endian doubles). */
    public static List<byte[]> encode(List<Spectrum> spectra) {
        List<byte[]> out = new ArrayList<>(spectra.size());
        for (Spectrum s : spectra) {
            out.add(SpectrumCodec.encode(s));
        }
        return out;
    }

    /** Inserts the BLOBs into a new file and returns the seconds it took, connection set-up excluded. */
    public static double secondsToInsert(Path newFile, List<byte[]> blobs) {
        SQLiteConfig config = new SQLiteConfig();
        config.setJournalMode(SQLiteConfig.JournalMode.WAL);
        config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + newFile, config.toProperties())) {
            try (Statement s = c.createStatement()) {
                s.execute("CREATE TABLE spectrum (id INTEGER PRIMARY KEY, data BLOB NOT NULL)");
            }
            long start = System.nanoTime();
            c.setAutoCommit(false);
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO spectrum (data) VALUES (?)")) {
                for (byte[] blob : blobs) {
                    ps.setBytes(1, blob);
                    ps.executeUpdate();
                }
            }
            c.commit();
            return (System.nanoTime() - start) * 1e-9;
        } catch (SQLException e) {
            throw new IllegalStateException("bare insert floor failed: " + e.getMessage(), e);
        }
    }
}
