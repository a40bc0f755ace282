package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.EnumMap;
import java.util.Map;

import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;

/**
 * The spread columns of schema 8: one text column per input a row may state a spread of, in the
 * words a person writes it, and {@code spread_basis}. NULL means "not stated".
 */
final class SpreadColumns {

    static final String BASIS = "spread_basis";

    private SpreadColumns() {
    }

    /** The column that holds {@code input}'s spread. */
    static String column(SpreadInput input) {
        return switch (input) {
            case CONNECTOR_LOSS, JOINT_LOSS -> "loss_spread";
            case OH_CONTENT -> "oh_spread";
            case ATTENUATION -> "attenuation_spread";
            case PROBE_FIXED_LOSS -> "fixed_loss_spread";
            case LENGTH -> "length_spread";
            case BEND_RADIUS -> "bend_spread";
        };
    }

    /** ", loss_spread, spread_basis" for a column list. */
    static String list(SpreadInput... inputs) {
        StringBuilder sb = new StringBuilder();
        for (SpreadInput input : inputs) {
            sb.append(", ").append(column(input));
        }
        return sb.append(", ").append(BASIS).toString();
    }

    /** ", loss_spread = ?, spread_basis = ?" for an UPDATE. */
    static String assignments(SpreadInput... inputs) {
        StringBuilder sb = new StringBuilder();
        for (SpreadInput input : inputs) {
            sb.append(", ").append(column(input)).append(" = ?");
        }
        return sb.append(", ").append(BASIS).append(" = ?").toString();
    }

    /** Binds the spreads of {@code inputs} and the basis from parameter {@code first} on; returns the next index. */
    static int bind(PreparedStatement ps, int first, StatedSpreads spreads, SpreadInput... inputs)
            throws SQLException {
        int i = first;
        for (SpreadInput input : inputs) {
            StatedSpread s = spreads.of(input).orElse(null);
            if (s == null) {
                ps.setNull(i++, Types.VARCHAR);
            } else {
                ps.setString(i++, s.toString());
            }
        }
        if (spreads.basis().isEmpty()) {
            ps.setNull(i++, Types.VARCHAR);
        } else {
            ps.setString(i++, spreads.basis());
        }
        return i;
    }

    /** Binds NULL to every spread column of {@code inputs} and the basis; returns the next index. */
    static int bindNone(PreparedStatement ps, int first, SpreadInput... inputs) throws SQLException {
        return bind(ps, first, StatedSpreads.NONE, inputs);
    }

    static StatedSpreads read(ResultSet rs, SpreadInput... inputs) throws SQLException {
        Map<SpreadInput, StatedSpread> stated = new EnumMap<>(SpreadInput.class);
        for (SpreadInput input : inputs) {
            String text = rs.getString(column(input));
            if (text != null) {
                try {
                    stated.put(input, StatedSpread.parse(text, input));
                } catch (IllegalArgumentException e) {
                    throw new WorkbookException("the workbook holds a " + input.words() + " spread it cannot read ("
                            + e.getMessage() + "); changed by another program?", e);
                }
            }
        }
        String basis = rs.getString(BASIS);
        return new StatedSpreads(stated, basis);
    }
}
