package dev.positioner.asset;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The valve registry in the database; the {@link AssetDirectory} the diagnosis reads design data
 * from. Callers validate before writing (see {@link AssetValidator}).
 */
@ApplicationScoped
public class AssetRegistry implements AssetDirectory {

    private static final String COLUMNS = "tag, description, area, site, oil_grade, cleanliness_target, design,"
            + " valve_action, fail_position, return_spring";

    private final Storage storage;
    private final ObjectMapper json;

    public AssetRegistry(Storage storage, ObjectMapper json) {
        this.storage = storage;
        this.json = json;
    }

    @Override
    public Optional<AssetRecord> find(String tag) {
        return storage.read(c -> find(c, tag));
    }

    public Optional<AssetRecord> find(Connection c, String tag) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM asset WHERE tag = ?")) {
            ps.setString(1, tag);
            List<AssetRecord> found = list(ps);
            return found.stream().findFirst();
        }
    }

    @Override
    public Collection<AssetRecord> all() {
        return search(null, null, null, Integer.MAX_VALUE, 0);
    }

    /** Case-insensitive substring match on tag, area and site; null matches everything. */
    public List<AssetRecord> search(String tag, String area, String site, int limit, int offset) {
        return storage.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM asset"
                    + " WHERE (? IS NULL OR LOWER(tag) LIKE ?) AND (? IS NULL OR LOWER(area) LIKE ?)"
                    + " AND (? IS NULL OR LOWER(site) LIKE ?) ORDER BY tag LIMIT ? OFFSET ?")) {
                like(ps, 1, tag);
                like(ps, 3, area);
                like(ps, 5, site);
                ps.setInt(7, limit);
                ps.setInt(8, offset);
                return list(ps);
            }
        });
    }

    /** Inserts a new valve; false if the tag is already registered. */
    public boolean create(Connection c, AssetRecord a) throws SQLException {
        if (find(c, a.tag()).isPresent()) {
            return false;
        }
        Timestamp now = Timestamp.from(Instant.now());
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO asset (" + COLUMNS
                + ", created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            bind(ps, a);
            ps.setTimestamp(11, now);
            ps.setTimestamp(12, now);
            ps.executeUpdate();
            return true;
        }
    }

    /** Replaces a valve's data; false if the tag is not registered. */
    public boolean update(Connection c, AssetRecord a) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE asset SET tag = ?, description = ?, area = ?, site = ?,"
                + " oil_grade = ?, cleanliness_target = ?, design = ?, valve_action = ?, fail_position = ?,"
                + " return_spring = ?, updated_at = ? WHERE tag = ?")) {
            bind(ps, a);
            ps.setTimestamp(11, Timestamp.from(Instant.now()));
            ps.setString(12, a.tag());
            return ps.executeUpdate() == 1;
        }
    }

    private void bind(PreparedStatement ps, AssetRecord a) throws SQLException {
        ps.setString(1, a.tag());
        ps.setString(2, a.description());
        ps.setString(3, a.area());
        ps.setString(4, a.site());
        ps.setString(5, a.oilGrade());
        ps.setString(6, a.cleanlinessTarget());
        try {
            ps.setString(7, json.writeValueAsString(a.design()));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("design data cannot be written as JSON", e);
        }
        ps.setString(8, a.action());
        ps.setString(9, a.failPosition());
        if (a.returnSpring() == null) {
            ps.setNull(10, java.sql.Types.BOOLEAN);
        } else {
            ps.setBoolean(10, a.returnSpring());
        }
    }

    private List<AssetRecord> list(PreparedStatement ps) throws SQLException {
        List<AssetRecord> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                boolean spring = rs.getBoolean(10);
                out.add(new AssetRecord(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                        rs.getString(5), rs.getString(6), design(rs.getString(7)), rs.getString(8), rs.getString(9),
                        rs.wasNull() ? null : spring));
            }
        }
        return out;
    }

    private List<MeasurementInput> design(String text) {
        try {
            return json.readValue(text, new TypeReference<>() { });
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored design data is not JSON: " + text, e);
        }
    }

    private static void like(PreparedStatement ps, int index, String text) throws SQLException {
        String t = text == null || text.isBlank() ? null : "%" + text.strip().toLowerCase(Locale.ROOT) + "%";
        ps.setString(index, t);
        ps.setString(index + 1, t);
    }
}
