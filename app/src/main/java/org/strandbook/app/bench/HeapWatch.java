package org.strandbook.app.bench;

import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.MemoryUsage;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import javax.management.ListenerNotFoundException;
import javax.management.Notification;
import javax.management.NotificationEmitter;
import javax.management.NotificationListener;
import javax.management.openmbean.CompositeData;

import com.sun.management.GarbageCollectionNotificationInfo;

/**
 * Heap use during one run of a benchmark, after a full collection beforehand: the peak of every
 * heap pool (live data and not yet collected garbage alike) and the peak of the heap in use right
 * after a collection, which is close to the live data at its largest.
 */
final class HeapWatch implements NotificationListener {

    /** What one run used, in bytes. */
    record Use(long baselineBytes, long poolPeakBytes, long afterGcPeakBytes) {
    }

    private final List<NotificationEmitter> emitters = new ArrayList<>();
    private long baseline;
    private volatile long afterGcPeak;

    /** Collects, resets the pools' peaks and starts listening to collections. */
    static HeapWatch start() {
        HeapWatch w = new HeapWatch();
        System.gc();
        for (MemoryPoolMXBean pool : heapPools()) {
            pool.resetPeakUsage();
        }
        w.baseline = used();
        w.afterGcPeak = w.baseline;
        for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
            if (gc instanceof NotificationEmitter e) {
                e.addNotificationListener(w, null, null);
                w.emitters.add(e);
            }
        }
        return w;
    }

    /** Stops listening and tells the peaks. */
    Use stop() {
        for (NotificationEmitter e : emitters) {
            try {
                e.removeNotificationListener(this);
            } catch (ListenerNotFoundException ignored) {
                // already gone: nothing to undo
            }
        }
        long pools = 0;
        for (MemoryPoolMXBean pool : heapPools()) {
            pools += pool.getPeakUsage().getUsed();
        }
        return new Use(baseline, pools, afterGcPeak);
    }

    @Override
    public void handleNotification(Notification notification, Object handback) {
        if (!GarbageCollectionNotificationInfo.GARBAGE_COLLECTION_NOTIFICATION.equals(notification.getType())) {
            return;
        }
        GarbageCollectionNotificationInfo info = GarbageCollectionNotificationInfo.from(
                (CompositeData) notification.getUserData());
        long used = 0;
        List<String> heapNames = heapPools().stream().map(MemoryPoolMXBean::getName).toList();
        for (Map.Entry<String, MemoryUsage> e : info.getGcInfo().getMemoryUsageAfterGc().entrySet()) {
            if (heapNames.contains(e.getKey())) {
                used += e.getValue().getUsed();
            }
        }
        afterGcPeak = Math.max(afterGcPeak, used);
    }

    private static List<MemoryPoolMXBean> heapPools() {
        return ManagementFactory.getMemoryPoolMXBeans().stream().filter(p -> p.getType() == MemoryType.HEAP).toList();
    }

    private static long used() {
        return heapPools().stream().mapToLong(p -> p.getUsage().getUsed()).sum();
    }
}
