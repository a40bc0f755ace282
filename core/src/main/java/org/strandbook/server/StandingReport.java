package org.strandbook.server;

import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.sql.Types;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.Urgency;
import org.strandbook.site.MeasurementPoint;

/**
 * Reports a site's evaluation to the plant server, for the fleet view: one row per point whose
 * standing differs from the last one the server holds, so that a sync that changed nothing adds
 * nothing.
 */
public final class StandingReport {

    private StandingReport() {
    }

    /** The standings of every point of the site: evaluated ones from the evaluation, the rest NOT_EVALUATED. */
    public static List<PointStanding> of(SiteEvaluation evaluation, List<MeasurementPoint> points) {
        Map<String, PointEvaluation> byTag = new HashMap<>();
        evaluation.points().forEach(e -> byTag.put(e.point().tag(), e));
        List<PointStanding> out = new ArrayList<>();
        String site = evaluation.site().name();
        for (MeasurementPoint p : points) {
            PointEvaluation e = byTag.get(p.tag());
            if (e == null) {
                out.add(new PointStanding(site, p.tag(), "NOT_EVALUATED", null, null, null, evaluation.evaluatedAt()));
                continue;
            }
            Double margin = e.worstBand().map(v -> v.marginDb()).filter(Double::isFinite).orElse(null);
            out.add(new PointStanding(site, p.tag(), e.status().name(),
                    e.worstBand().map(v -> v.band().name()).orElse(null), margin,
                    Urgency.runOutDate(e).orElse(null), evaluation.evaluatedAt()));
        }
        return out;
    }

    /** Sends the standings that changed; how many rows the server took. */
    public static int publish(PlantServer server, String siteName, List<PointStanding> standings) {
        try (Connection c = server.connect()) {
            try {
                long siteId = SiteSync.siteId(c, siteName);
                Map<String, PointStanding> last = latest(c, siteId, siteName);
                int sent = 0;
                try (PreparedStatement ps = c.prepareStatement("INSERT INTO point_status (site_id, tag, status,"
                        + " worst_band, margin_db, run_out_date, evaluated_at) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
                    for (PointStanding s : standings) {
                        if (sameStanding(last.get(s.tag()), s)) {
                            continue;
                        }
                        ps.setLong(1, siteId);
                        ps.setString(2, s.tag());
                        ps.setString(3, s.status());
                        ps.setString(4, s.worstBand());
                        if (s.marginDb() == null) {
                            ps.setNull(5, Types.DOUBLE);
                        } else {
                            ps.setDouble(5, s.marginDb());
                        }
                        ps.setDate(6, s.runOutDate() == null ? null : Date.valueOf(s.runOutDate()));
                        ps.setTimestamp(7, Timestamp.from(s.evaluatedAt()));
                        ps.addBatch();
                        sent++;
                    }
                    ps.executeBatch();
                }
                c.commit();
                return sent;
            } catch (SQLException e) {
                c.rollback();
                throw e;
            }
        } catch (SQLException e) {
            throw new ServerException("cannot report the points' standing to " + server.login().displayUrl() + ": "
                    + ServerException.firstLine(e), e);
        }
    }

    private static boolean sameStanding(PointStanding a, PointStanding b) {
        return a != null && a.status().equals(b.status()) && Objects.equals(a.worstBand(), b.worstBand())
                && Objects.equals(a.runOutDate(), b.runOutDate()) && sameMargin(a.marginDb(), b.marginDb());
    }

    /** Margins within 0.01 dB are one standing: the scan-to-scan noise moves them more than that. */
    private static boolean sameMargin(Double a, Double b) {
        return a == null ? b == null : b != null && Math.abs(a - b) < 0.01;
    }

    static Map<String, PointStanding> latest(Connection c, long siteId, String siteName) throws SQLException {
        Map<String, PointStanding> out = new HashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT DISTINCT ON (tag) tag, status, worst_band, margin_db,"
                + " run_out_date, evaluated_at FROM point_status WHERE site_id = ? ORDER BY tag, evaluated_at DESC, id DESC")) {
            ps.setLong(1, siteId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.put(rs.getString(1), FleetView.standing(siteName, rs));
                }
            }
        }
        return out;
    }
}
