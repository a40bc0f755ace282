package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;

import org.strandbook.site.Analyzer;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.DetectorType;
import org.strandbook.site.Site;

/** The site record (one per workbook) and its analyzers. Every change is audited. */
public final class SiteRepository {

    private static final String SELECT_SITE =
            "SELECT name, plant_area, revision, default_tolerance_db FROM site WHERE id = 1";
    private static final String SELECT_ANALYZER = "SELECT tag, description, min_nm, max_nm, channels, "
            + "allowed_loss_db, detector FROM analyzer";

    private final Session session;
    private final AuditLog audit;

    SiteRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /** The site this workbook holds. */
    public Site get() {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_SITE);
                 ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new WorkbookException("workbook " + session.file() + " holds no site record");
                }
                return new Site(rs.getString("name"), rs.getString("plant_area"), rs.getString("revision"),
                        rs.getDouble("default_tolerance_db"));
            }
        });
    }

    /** Replaces the site's name, plant area, revision and default tolerance. */
    public void update(Site site) {
        session.write(() -> {
            RowImage before = audit.capture(AuditedTable.SITE, 1).orElseThrow(
                    () -> new WorkbookException("workbook " + session.file() + " holds no site record"));
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE site SET name = ?, "
                    + "plant_area = ?, revision = ?, default_tolerance_db = ? WHERE id = 1")) {
                bindSite(ps, site);
                ps.executeUpdate();
            }
            audit.updated(AuditedTable.SITE, 1, before);
            return null;
        });
    }

    /** The site's decision rule; the fixed tolerance while none has been chosen. */
    public DecisionRule decisionRule() {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(
                    "SELECT kind, coverage, guard_band_db FROM decision_rule WHERE id = 1");
                 ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    return DecisionRule.FIXED;
                }
                return new DecisionRule(DecisionRule.Kind.valueOf(rs.getString("kind")), rs.getDouble("coverage"),
                        rs.getDouble("guard_band_db"));
            }
        });
    }

    /** Sets the site's decision rule; audited like the site record. */
    public void setDecisionRule(DecisionRule rule) {
        session.write(() -> {
            Optional<RowImage> before = audit.capture(AuditedTable.DECISION_RULE, 1);
            try (PreparedStatement ps = session.connection().prepareStatement(before.isPresent()
                    ? "UPDATE decision_rule SET kind = ?, coverage = ?, guard_band_db = ? WHERE id = 1"
                    : "INSERT INTO decision_rule (kind, coverage, guard_band_db, id) VALUES (?, ?, ?, 1)")) {
                ps.setString(1, rule.kind().name());
                ps.setDouble(2, rule.coverage());
                ps.setDouble(3, rule.guardBandDb());
                ps.executeUpdate();
            }
            if (before.isPresent()) {
                audit.updated(AuditedTable.DECISION_RULE, 1, before.get());
            } else {
                audit.inserted(AuditedTable.DECISION_RULE, 1);
            }
            return null;
        });
    }

    void create(Site site) {
        session.write(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO site "
                    + "(name, plant_area, revision, default_tolerance_db, id) VALUES (?, ?, ?, ?, 1)")) {
                bindSite(ps, site);
                ps.executeUpdate();
            }
            audit.inserted(AuditedTable.SITE, 1);
            return null;
        });
    }

    private static void bindSite(PreparedStatement ps, Site site) throws SQLException {
        ps.setString(1, site.name());
        ps.setString(2, site.plantArea());
        ps.setString(3, site.revision());
        ps.setDouble(4, site.defaultToleranceDb());
    }

    /**
     * Adds an analyzer.
     *
     * @throws DuplicateEntryException when its tag is taken
     */
    public void addAnalyzer(Analyzer analyzer) {
        session.write(() -> {
            if (RowKeys.analyzer(session, analyzer.tag()).isPresent()) {
                throw new DuplicateEntryException("analyzer tag '" + analyzer.tag() + "' is already used in this workbook");
            }
            insertAnalyzer(analyzer);
            return null;
        });
    }

    /** Adds the analyzer, or replaces the one with its tag. */
    public void saveAnalyzer(Analyzer analyzer) {
        session.write(() -> {
            OptionalLong id = RowKeys.analyzer(session, analyzer.tag());
            if (id.isEmpty()) {
                insertAnalyzer(analyzer);
                return null;
            }
            RowImage before = audit.capture(AuditedTable.ANALYZER, id.getAsLong()).orElseThrow();
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE analyzer SET tag = ?, "
                    + "description = ?, min_nm = ?, max_nm = ?, channels = ?, allowed_loss_db = ?, detector = ? "
                    + "WHERE id = ?")) {
                bindAnalyzer(ps, analyzer);
                ps.setLong(8, id.getAsLong());
                ps.executeUpdate();
            }
            audit.updated(AuditedTable.ANALYZER, id.getAsLong(), before);
            return null;
        });
    }

    private void insertAnalyzer(Analyzer analyzer) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO analyzer (tag, description, "
                + "min_nm, max_nm, channels, allowed_loss_db, detector) VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
            bindAnalyzer(ps, analyzer);
            audit.inserted(AuditedTable.ANALYZER, Columns.insertReturningId(ps));
        }
    }

    private static void bindAnalyzer(PreparedStatement ps, Analyzer a) throws SQLException {
        ps.setString(1, a.tag());
        ps.setString(2, a.description());
        ps.setDouble(3, a.minNm());
        ps.setDouble(4, a.maxNm());
        ps.setInt(5, a.channels());
        ps.setDouble(6, a.allowedLossDb());
        ps.setString(7, a.detector().name());
    }

    /**
     * Removes an analyzer no point uses.
     *
     * @throws UnknownEntryException when no analyzer has the tag
     * @throws WorkbookException     when points still use it
     */
    public void deleteAnalyzer(String tag) {
        session.write(() -> {
            long id = RowKeys.analyzer(session, tag).orElseThrow(
                    () -> new UnknownEntryException("unknown analyzer '" + tag + "'"));
            List<String> users = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement(
                    "SELECT tag FROM point WHERE analyzer_id = ? ORDER BY tag")) {
                ps.setLong(1, id);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        users.add(rs.getString(1));
                    }
                }
            }
            if (!users.isEmpty()) {
                throw new WorkbookException("analyzer '" + tag + "' still serves point(s) " + String.join(", ", users));
            }
            audit.deleteRow(AuditedTable.ANALYZER, id);
            return null;
        });
    }

    /** All analyzers, by tag. */
    public List<Analyzer> analyzers() {
        return session.read(() -> {
            List<Analyzer> out = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_ANALYZER + " ORDER BY tag");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(analyzer(rs));
                }
            }
            return out;
        });
    }

    public Optional<Analyzer> analyzer(String tag) {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_ANALYZER + " WHERE tag = ?")) {
                ps.setString(1, tag == null ? "" : tag.strip());
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(analyzer(rs)) : Optional.empty();
                }
            }
        });
    }

    private static Analyzer analyzer(ResultSet rs) throws SQLException {
        return new Analyzer(rs.getString("tag"), rs.getString("description"), rs.getDouble("min_nm"),
                rs.getDouble("max_nm"), rs.getInt("channels"), rs.getDouble("allowed_loss_db"),
                DetectorType.valueOf(rs.getString("detector")));
    }
}
