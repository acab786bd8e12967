package dev.penduline.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The save lock inside one program: one writer at a time, re-entrant, bounded waiting. */
class SaveLockTest {

    @TempDir
    Path dir;

    @Test
    void aSecondWriterWaitsAndGivesUpWithAClearMessage() throws Exception {
        Path file = dir.resolve("hatch.penduline");
        CountDownLatch held = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        CompletableFuture<Void> holder = CompletableFuture.runAsync(() -> {
            try (SaveLock lock = SaveLock.acquire(file)) {
                held.countDown();
                release.await(60, TimeUnit.SECONDS);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        assertTrue(held.await(60, TimeUnit.SECONDS));
        SaveLock.SaveLockException e = assertThrows(SaveLock.SaveLockException.class,
                () -> SaveLock.acquire(file, Duration.ofMillis(200)));
        assertTrue(e.getMessage().contains("another writer") && e.getMessage().contains("nothing was written"), e.getMessage());
        release.countDown();
        holder.get(60, TimeUnit.SECONDS);
        try (SaveLock again = SaveLock.acquire(file, Duration.ofSeconds(30))) {
            assertEquals(dir.toRealPath().resolve("hatch.penduline"), again.file());
        }
        assertTrue(Files.exists(dir.resolve(".hatch.penduline.lock")));
    }

    @Test
    void theThreadHoldingTheLockMayTakeItAgain() throws Exception {
        Path file = dir.resolve("hatch.penduline");
        try (SaveLock outer = SaveLock.acquire(file); SaveLock inner = SaveLock.acquire(file, Duration.ZERO)) {
            assertEquals(outer.file(), inner.file());
        }
        // released completely: another thread gets it at once
        CompletableFuture<Path> other = CompletableFuture.supplyAsync(() -> {
            try (SaveLock lock = SaveLock.acquire(file, Duration.ofSeconds(30))) {
                return lock.file();
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        try {
            assertEquals(dir.toRealPath().resolve("hatch.penduline"), other.get(60, TimeUnit.SECONDS));
        } catch (ExecutionException e) {
            throw new AssertionError(e.getCause());
        }
    }

    @Test
    void aLinkAndItsTargetShareOneLock() throws Exception {
        Path real = dir.resolve("real.penduline");
        Path link = Files.createSymbolicLink(dir.resolve("link.penduline"), real);
        try (SaveLock lock = SaveLock.acquire(link)) {
            assertEquals(dir.toRealPath().resolve("real.penduline"), lock.file());
            CompletableFuture<Void> viaTarget = CompletableFuture.runAsync(() -> {
                try {
                    SaveLock.acquire(real, Duration.ofMillis(100)).close();
                } catch (Exception e) {
                    throw new IllegalStateException(e);
                }
            });
            ExecutionException e = assertThrows(ExecutionException.class, () -> viaTarget.get(60, TimeUnit.SECONDS));
            assertTrue(e.getCause().getCause() instanceof SaveLock.SaveLockException, String.valueOf(e.getCause()));
        }
    }
}
