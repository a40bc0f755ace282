package org.strandbook.server;

import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The analyzer group's view across the sites of one plant server: per site its points' status
 * counts, across sites the points ranked by urgency, and the points whose status changed since a
 * date. A technician sees the sites it is a member of; the server's owner sees all.
 */
public final class FleetView {

    /** A site's points by their latest reported status. */
    public record SiteCounts(String site, long pass, long review, long fail, long notEvaluated, Instant lastSync) {
    }

    /**
     * A point whose status differs from the one it had at {@code since}.
     *
     * @param before null when the point had no reported status then (its first report came later)
     */
    public record StatusChange(String site, String tag, String before, String after, Instant at) {
    }

    public record Fleet(List<SiteCounts> sites, List<PointStanding> ranking, List<StatusChange> changes,
                        Instant since) {
    }

    /** FAIL first, then the earliest run-out date, then REVIEW, then the least margin: the workbook's own urgency order. */
    static final Comparator<PointStanding> URGENCY = Comparator
            .comparing((PointStanding s) -> !s.status().equals("FAIL"))
            .thenComparing(s -> s.runOutDate() == null ? LocalDate.MAX : s.runOutDate())
            .thenComparing(s -> !s.status().equals("REVIEW"))
            .thenComparing(s -> s.status().equals("NOT_EVALUATED"))
            .thenComparingDouble(s -> s.marginDb() == null ? Double.POSITIVE_INFINITY : s.marginDb())
            .thenComparing(PointStanding::site)
            .thenComparing(PointStanding::tag);

    private FleetView() {
    }

    public static Fleet read(PlantServer server, Instant since) {
        try (Connection c = server.connect()) {
            c.setReadOnly(true);
            List<PointStanding> latest = standings(c, null);
            List<SiteCounts> sites = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT s.name, (SELECT max(pushed_at) FROM workbook_push w"
                    + " WHERE w.site_id = s.id) FROM site s ORDER BY s.name");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    String name = rs.getString(1);
                    Timestamp last = rs.getTimestamp(2);
                    List<PointStanding> mine = latest.stream().filter(p -> p.site().equals(name)).toList();
                    sites.add(new SiteCounts(name, count(mine, "PASS"), count(mine, "REVIEW"), count(mine, "FAIL"),
                            count(mine, "NOT_EVALUATED"), last == null ? null : last.toInstant()));
                }
            }
            List<StatusChange> changes = new ArrayList<>();
            if (since != null) {
                List<PointStanding> before = standings(c, since);
                for (PointStanding now : latest) {
                    PointStanding then = before.stream().filter(b -> b.site().equals(now.site())
                            && b.tag().equals(now.tag())).findFirst().orElse(null);
                    String was = then == null ? null : then.status();
                    if (!now.status().equals(was)) {
                        changes.add(new StatusChange(now.site(), now.tag(), was, now.status(), now.evaluatedAt()));
                    }
                }
            }
            c.commit();
            return new Fleet(sites, latest.stream().sorted(URGENCY).toList(), changes, since);
        } catch (SQLException e) {
            throw new ServerException("cannot read the fleet from " + server.login().displayUrl() + ": "
                    + ServerException.firstLine(e), e);
        }
    }

    private static long count(List<PointStanding> points, String status) {
        return points.stream().filter(p -> p.status().equals(status)).count();
    }

    /** Each point's latest standing, or its latest evaluated before {@code asOf}. */
    private static List<PointStanding> standings(Connection c, Instant asOf) throws SQLException {
        List<PointStanding> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT DISTINCT ON (p.site_id, p.tag) p.tag, p.status,"
                + " p.worst_band, p.margin_db, p.run_out_date, p.evaluated_at, s.name FROM point_status p"
                + " JOIN site s ON s.id = p.site_id"
                + (asOf == null ? "" : " WHERE p.evaluated_at <= ?")
                + " ORDER BY p.site_id, p.tag, p.evaluated_at DESC, p.id DESC")) {
            if (asOf != null) {
                ps.setTimestamp(1, Timestamp.from(asOf));
            }
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(standing(rs.getString(7), rs));
                }
            }
        }
        return out;
    }

    static PointStanding standing(String site, ResultSet rs) throws SQLException {
        double margin = rs.getDouble(4);
        Double marginDb = rs.wasNull() ? null : margin;
        Date runOut = rs.getDate(5);
        return new PointStanding(site, rs.getString(1), rs.getString(2), rs.getString(3), marginDb,
                runOut == null ? null : runOut.toLocalDate(), rs.getTimestamp(6).toInstant());
    }
}
