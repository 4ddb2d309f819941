package org.tautline.app.lot;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The register's rows: inserting a qualification with its figures, reading a lot, finding a run already in a lot. */
final class RegisterRows {
    private RegisterRows() {
    }

    /** Inserts one qualification and its figures, inside the caller's transaction, in a register of version 2. */
    static void insert(Connection c, LotEntry entry) throws SQLException {
        long id;
        try (PreparedStatement p = c.prepareStatement("INSERT INTO qualification (lot, specimen, recorded_at, outcome,"
                + " run_dir, frf_sha256) VALUES (?, ?, ?, ?, ?, ?)", new String[] {"id"})) {
            p.setString(1, entry.lot());
            p.setString(2, entry.specimenId());
            p.setString(3, entry.recordedAt().toString());
            p.setString(4, entry.outcome());
            p.setString(5, entry.runDirectory());
            if (entry.frfSha256().isEmpty()) {
                p.setNull(6, Types.VARCHAR);
            } else {
                p.setString(6, entry.frfSha256());
            }
            p.executeUpdate();
            try (ResultSet keys = p.getGeneratedKeys()) {
                if (!keys.next()) {
                    throw new SQLException("the database returned no id for the new qualification");
                }
                id = keys.getLong(1);
            }
        }
        try (PreparedStatement p = c.prepareStatement("INSERT INTO figure (qualification_id, position, figure_key,"
                + " value_si, standard_uncertainty, unit, lower_limit, upper_limit) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")) {
            int position = 0;
            for (LotFigure f : entry.figures()) {
                p.setLong(1, id);
                p.setInt(2, position++);
                p.setString(3, f.key());
                p.setDouble(4, f.value());
                p.setDouble(5, f.standardUncertainty());
                p.setString(6, f.unit());
                setBound(p, 7, f.lowerLimit());
                setBound(p, 8, f.upperLimit());
                p.addBatch();
            }
            p.executeBatch();
        }
    }

    private static void setBound(PreparedStatement p, int index, double bound) throws SQLException {
        if (Double.isNaN(bound)) {
            p.setNull(index, Types.DOUBLE);
        } else {
            p.setDouble(index, bound);
        }
    }

    /** @return every qualification of a lot with its figures, in the order they were appended */
    static List<LotEntry> entries(Connection c, int version, String lot) throws SQLException {
        String sql = "SELECT q.id, q.specimen, q.recorded_at, q.outcome, q.run_dir, " + sha(version) + ", f.figure_key,"
                + " f.value_si, f.standard_uncertainty, f.unit, f.lower_limit, f.upper_limit FROM qualification q"
                + " LEFT JOIN figure f ON f.qualification_id = q.id WHERE q.lot = ? ORDER BY q.id, f.position";
        Map<Long, LotEntry> heads = new LinkedHashMap<>();
        Map<Long, List<LotFigure>> figures = new LinkedHashMap<>();
        try (PreparedStatement p = c.prepareStatement(sql)) {
            p.setString(1, lot);
            try (ResultSet rs = p.executeQuery()) {
                while (rs.next()) {
                    long id = rs.getLong(1);
                    if (!heads.containsKey(id)) {
                        heads.put(id, head(rs, lot));
                    }
                    List<LotFigure> list = figures.computeIfAbsent(id, k -> new ArrayList<>());
                    String key = rs.getString(7);
                    if (key != null) {
                        list.add(new LotFigure(key, rs.getDouble(8), rs.getDouble(9), rs.getString(10), bound(rs, 11),
                                bound(rs, 12)));
                    }
                }
            }
        }
        List<LotEntry> out = new ArrayList<>();
        heads.forEach((id, h) -> out.add(new LotEntry(lot, h.specimenId(), h.recordedAt(), h.outcome(), h.runDirectory(),
                figures.get(id), h.frfSha256())));
        return out;
    }

    /**
     * @return the first qualification of the lot from the same run folder or with the same FRF fingerprint (without
     *         its figures); empty when there is none or when neither is given
     */
    static Optional<LotEntry> sameRun(Connection c, int version, String lot, String runDirectory, String frfSha256)
            throws SQLException {
        List<String> tests = new ArrayList<>();
        List<String> values = new ArrayList<>();
        if (!runDirectory.isEmpty()) {
            tests.add("q.run_dir = ?");
            values.add(runDirectory);
        }
        if (!frfSha256.isEmpty() && version >= 2) {
            tests.add("q.frf_sha256 = ?");
            values.add(frfSha256);
        }
        if (tests.isEmpty()) {
            return Optional.empty();
        }
        String sql = "SELECT q.id, q.specimen, q.recorded_at, q.outcome, q.run_dir, " + sha(version) + " FROM qualification q"
                + " WHERE q.lot = ? AND (" + String.join(" OR ", tests) + ") ORDER BY q.id";
        try (PreparedStatement p = c.prepareStatement(sql)) {
            p.setString(1, lot);
            for (int i = 0; i < values.size(); i++) {
                p.setString(2 + i, values.get(i));
            }
            try (ResultSet rs = p.executeQuery()) {
                return rs.next() ? Optional.of(head(rs, lot)) : Optional.empty();
            }
        }
    }

    private static String sha(int version) {
        return version >= 2 ? "q.frf_sha256" : "NULL";
    }

    /** The qualification of the current row (columns 2 to 6), without figures. */
    private static LotEntry head(ResultSet rs, String lot) throws SQLException {
        String recorded = rs.getString(3);
        Instant at;
        try {
            at = Instant.parse(recorded);
        } catch (java.time.format.DateTimeParseException e) {
            throw new SQLException("qualification " + rs.getLong(1) + " has recorded_at '" + recorded
                    + "'; expected an ISO 8601 UTC time", e);
        }
        String sha = rs.getString(6);
        try {
            return new LotEntry(lot, rs.getString(2), at, rs.getString(4), rs.getString(5), List.of(), sha == null ? "" : sha);
        } catch (IllegalArgumentException e) {
            throw new SQLException("qualification " + rs.getLong(1) + ": " + e.getMessage(), e);
        }
    }

    private static double bound(ResultSet rs, int column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? Double.NaN : v;
    }
}
