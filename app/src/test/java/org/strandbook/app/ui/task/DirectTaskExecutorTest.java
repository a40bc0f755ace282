package org.strandbook.app.ui.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

class DirectTaskExecutorTest {

    private final DirectTaskExecutor tasks = new DirectTaskExecutor();
    private final List<String> heard = new ArrayList<>();

    @Test
    void resultReachesTheSuccessCallbackAndTheStatusSaysDone() {
        tasks.submit("Counting", p -> {
            p.update(0.5, "half way");
            return 42;
        }, r -> heard.add("ok " + r), e -> heard.add("failed"));

        assertEquals(List.of("ok 42"), heard);
        assertEquals("Counting: done", tasks.messageProperty().get());
        assertFalse(tasks.runningProperty().get());
    }

    @Test
    void failureReachesTheFailureCallbackWithItsMessage() {
        tasks.submit("Reading", p -> {
            throw new IllegalStateException("file is locked");
        }, r -> heard.add("ok"), e -> heard.add(e.getMessage()));

        assertEquals(List.of("file is locked"), heard);
        assertEquals("Reading failed: file is locked", tasks.messageProperty().get());
    }

    @Test
    void cancelledJobCallsNeitherCallbackAndSaysCancelled() {
        tasks.submit("Importing", p -> {
            tasks.cancel();
            p.stopIfCancelled();
            return 1;
        }, r -> heard.add("ok"), e -> heard.add("failed"));

        assertEquals(List.of(), heard);
        assertEquals("Importing: cancelled", tasks.messageProperty().get());
    }
}
