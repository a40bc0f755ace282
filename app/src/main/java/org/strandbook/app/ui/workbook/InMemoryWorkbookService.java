package org.strandbook.app.ui.workbook;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.site.Analyzer;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;

/**
 * A workbook held in memory: what the window uses until the SQLite store is wired in, and what
 * view-model tests use. "Save As" keeps a snapshot under the path for this session only, and
 * "Open" can reopen such a snapshot; imported scan files are registered (name, SHA-256) but not
 * parsed.
 */
public final class InMemoryWorkbookService implements WorkbookService {

    /** Everything a workbook holds, as this service keeps it. */
    public record Content(Site site, List<Analyzer> analyzers, List<MeasurementPoint> points, Catalog catalog,
                          Map<String, List<LegSegment>> segments, Map<String, List<LegJoint>> joints,
                          List<ScanRecord> scans) {

        public Content {
            analyzers = List.copyOf(analyzers);
            points = List.copyOf(points);
            segments = Map.copyOf(segments);
            joints = Map.copyOf(joints);
            scans = List.copyOf(scans);
        }
    }

    private Content content;
    private Path file;
    private final Map<Path, Content> savedThisSession = new HashMap<>();

    public InMemoryWorkbookService(Content content) {
        this.content = content;
    }

    @Override
    public synchronized SiteOutline loadOutline() {
        return new SiteOutline(content.site(), content.analyzers(), content.points());
    }

    @Override
    public synchronized Catalog loadCatalog() {
        return content.catalog();
    }

    @Override
    public synchronized PointRecords loadPoint(String pointTag) {
        MeasurementPoint point = point(pointTag);
        return new PointRecords(point, content.segments().getOrDefault(point.tag(), List.of()),
                content.joints().getOrDefault(point.tag(), List.of()),
                content.scans().stream().filter(s -> s.pointTag().equals(point.tag())).toList());
    }

    @Override
    public synchronized void savePoints(List<MeasurementPoint> points) {
        for (MeasurementPoint p : points) {
            if (content.points().stream().noneMatch(q -> q.tag().equals(p.tag()))) {
                throw new WorkbookProblem("point " + p.tag() + " is not in the workbook");
            }
        }
        content = new Content(content.site(), content.analyzers(), points, content.catalog(), content.segments(),
                content.joints(), content.scans());
    }

    @Override
    public synchronized void saveLegs(String pointTag, List<LegSegment> segments, List<LegJoint> joints) {
        MeasurementPoint point = point(pointTag);
        Map<String, List<LegSegment>> s = new LinkedHashMap<>(content.segments());
        Map<String, List<LegJoint>> j = new LinkedHashMap<>(content.joints());
        s.put(point.tag(), List.copyOf(segments));
        j.put(point.tag(), List.copyOf(joints));
        content = new Content(content.site(), content.analyzers(), content.points(), content.catalog(), s, j, content.scans());
    }

    @Override
    public synchronized void saveFiberTypes(List<FiberType> fibers) {
        content = new Content(content.site(), content.analyzers(), content.points(), content.catalog().withFibers(fibers),
                content.segments(), content.joints(), content.scans());
    }

    @Override
    public synchronized PointBudget evaluate(String pointTag, JobProgress progress) {
        MeasurementPoint point = point(pointTag);
        Analyzer analyzer = content.analyzers().stream().filter(a -> a.tag().equals(point.analyzerTag())).findFirst()
                .orElseThrow(() -> new WorkbookProblem("point " + pointTag + ": analyzer " + point.analyzerTag() + " is not in the workbook"));
        try {
            return new DatasheetLossBudget(content.catalog()).evaluate(point, analyzer,
                    content.segments().getOrDefault(point.tag(), List.of()), content.joints().getOrDefault(point.tag(), List.of()));
        } catch (IllegalArgumentException e) {
            throw new WorkbookProblem("point " + pointTag + ": " + e.getMessage(), e);
        }
    }

    @Override
    public synchronized Map<String, PointBudget> evaluateSite(JobProgress progress) {
        Map<String, PointBudget> out = new LinkedHashMap<>();
        List<MeasurementPoint> points = content.points();
        for (int i = 0; i < points.size(); i++) {
            progress.stopIfCancelled();
            progress.update((double) i / points.size(), points.get(i).tag());
            try {
                out.put(points.get(i).tag(), evaluate(points.get(i).tag(), progress));
            } catch (WorkbookProblem e) {
                // a point that cannot be evaluated shows blank figures; the others still do
            }
        }
        return out;
    }

    @Override
    public List<ScanRecord> importScans(String pointTag, List<Path> files, JobProgress progress) {
        List<ScanRecord> added = new ArrayList<>();
        long nextId;
        synchronized (this) {
            point(pointTag);
            nextId = content.scans().stream().mapToLong(ScanRecord::id).max().orElse(0) + 1;
        }
        for (int i = 0; i < files.size(); i++) {
            progress.stopIfCancelled();
            Path f = files.get(i);
            progress.update((double) i / files.size(), f.getFileName().toString());
            added.add(new ScanRecord(nextId++, pointTag, ScanKind.LOOP, Instant.now(), ScanConditions.unknown(""), 0,
                    Double.NaN, Double.NaN, f.getFileName().toString(), sha256(f, progress)));
        }
        synchronized (this) {
            List<ScanRecord> scans = new ArrayList<>(content.scans());
            scans.addAll(added);
            content = new Content(content.site(), content.analyzers(), content.points(), content.catalog(),
                    content.segments(), content.joints(), scans);
            return scans.stream().filter(s -> s.pointTag().equals(pointTag)).toList();
        }
    }

    @Override
    public synchronized void newWorkbook() {
        content = new Content(new Site("New site"), List.of(), List.of(), content.catalog(), Map.of(), Map.of(), List.of());
        file = null;
    }

    @Override
    public synchronized void open(Path path) {
        Content saved = savedThisSession.get(path.toAbsolutePath().normalize());
        if (saved == null) {
            throw new WorkbookProblem("Cannot open " + path.getFileName() + ": this build keeps workbooks in memory "
                    + "and can reopen only what was saved in this session");
        }
        content = saved;
        file = path;
    }

    @Override
    public synchronized void saveAs(Path path) {
        savedThisSession.put(path.toAbsolutePath().normalize(), content);
        file = path;
    }

    @Override
    public synchronized Optional<Path> file() {
        return Optional.ofNullable(file);
    }

    private MeasurementPoint point(String tag) {
        return content.points().stream().filter(p -> p.tag().equalsIgnoreCase(tag)).findFirst()
                .orElseThrow(() -> new WorkbookProblem("point " + tag + " is not in the workbook"));
    }

    private static String sha256(Path file, JobProgress progress) {
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            byte[] buffer = new byte[64 * 1024];
            int n;
            while ((n = in.read(buffer)) > 0) {
                progress.stopIfCancelled();
                digest.update(buffer, 0, n);
            }
            return HexFormat.of().formatHex(digest.digest());
        } catch (IOException e) {
            throw new WorkbookProblem(file.getFileName() + ": cannot be read (" + e.getMessage() + ")", e);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }
}
