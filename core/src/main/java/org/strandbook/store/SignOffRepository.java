package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.ArrayList;
import java.util.List;

import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;

/** Signatures on the site record or on one point. Every addition is audited. */
public final class SignOffRepository {

    private final Session session;
    private final AuditLog audit;

    SignOffRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /**
     * Records a sign-off.
     *
     * @return its id
     * @throws UnknownEntryException when it names a point the workbook does not hold
     */
    public long add(SignOff signOff) {
        return session.write(() -> {
            if (signOff.signedAt() == null) {
                throw new IllegalArgumentException("sign-off by " + signOff.name() + ": time missing");
            }
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO sign_off (role, name, "
                    + "signed_at, point_id, remark) VALUES (?, ?, ?, ?, ?) RETURNING id")) {
                ps.setString(1, signOff.role().name());
                ps.setString(2, signOff.name());
                ps.setString(3, StoredTime.format(signOff.signedAt()));
                if (signOff.pointTag().isEmpty()) {
                    ps.setNull(4, Types.INTEGER);
                } else {
                    ps.setLong(4, RowKeys.requirePoint(session, signOff.pointTag()));
                }
                ps.setString(5, signOff.remark());
                long id = Columns.insertReturningId(ps);
                audit.inserted(AuditedTable.SIGN_OFF, id);
                return id;
            }
        });
    }

    /** Every sign-off in time order; site-wide ones have an empty point tag. */
    public List<SignOff> list() {
        return session.read(() -> {
            List<SignOff> out = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement("SELECT s.role, s.name, s.signed_at, "
                    + "p.tag, s.remark FROM sign_off s LEFT JOIN point p ON p.id = s.point_id ORDER BY s.signed_at, s.id");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new SignOff(SignOffRole.valueOf(rs.getString(1)), rs.getString(2),
                            StoredTime.parse(rs.getString(3)), rs.getString(4), rs.getString(5)));
                }
            }
            return out;
        });
    }
}
