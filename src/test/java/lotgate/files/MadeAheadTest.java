package lotgate.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

/** Items made on a thread of their own come to the reader as making them in line does, failures included. */
class MadeAheadTest {

    @Property(tries = 60)
    void itemsMadeAheadComeInOrderAsMadeInLine(@ForAll @IntRange(max = 3000) int count, @ForAll boolean ahead) {
        List<Integer> items = IntStream.range(0, count).boxed().toList();
        List<String> read = new ArrayList<>();
        try (MadeAhead<String> made = new MadeAhead<>(items.iterator(), i -> "#" + i, ahead)) {
            made.forEachRemaining(read::add);
            assertFalse(made.hasNext());
        }
        assertEquals(items.stream().map(i -> "#" + i).toList(), read);
    }

    /** A function with state carried from item to item, as a hash chain's. */
    private static Function<Integer, Long> runningHash() {
        return new Function<>() {
            private long sum;

            @Override
            public Long apply(Integer i) {
                sum = sum * 31 + i;
                return sum;
            }
        };
    }

    /** The state a maker carries from item to item (a hash chain) sees the items in their order. */
    @Property(tries = 30)
    void aMakerWithStateSeesTheItemsInOrder(@ForAll @IntRange(min = 1, max = 2000) int count) {
        Function<Integer, Long> running = runningHash();
        Function<Integer, Long> reference = runningHash();
        try (MadeAhead<Long> made = new MadeAhead<>(IntStream.range(0, count).iterator(), running, true)) {
            for (int i = 0; i < count; i++) {
                assertEquals(reference.apply(i), made.next());
            }
        }
    }

    @Property(tries = 40)
    void aFailureComesAfterTheItemsBeforeIt(@ForAll @IntRange(max = 1500) int failing, @ForAll boolean ahead) {
        IllegalArgumentException thrown = new IllegalArgumentException("item " + failing);
        List<Integer> read = new ArrayList<>();
        try (MadeAhead<Integer> made = new MadeAhead<>(IntStream.range(0, 2000).iterator(), i -> {
            if (i == failing) {
                throw thrown;
            }
            return i;
        }, ahead)) {
            IllegalArgumentException caught = assertThrows(IllegalArgumentException.class,
                    () -> made.forEachRemaining(read::add));
            assertSame(thrown, caught);
        }
        assertEquals(IntStream.range(0, failing).boxed().toList(), read);
    }

    @Test
    void whatTheIteratorThrowsComesToTheReaderAsWell() {
        Iterator<Integer> failing = Stream.iterate(0, i -> {
            if (i == 700) {
                throw new IllegalStateException("the source broke");
            }
            return i + 1;
        }).iterator();
        try (MadeAhead<Integer> made = new MadeAhead<>(failing, i -> i, true)) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> made.forEachRemaining(i -> { }));
            assertEquals("the source broke", e.getMessage());
        }
    }

    /** A reader that stops early, with the maker blocked on a full queue of an endless source, stops the thread. */
    @Test
    void closingEarlyStopsTheThread() {
        AtomicReference<Thread> maker = new AtomicReference<>();
        MadeAhead<Integer> made = new MadeAhead<>(Stream.iterate(0, i -> i + 1).iterator(), i -> {
            maker.set(Thread.currentThread());
            return i;
        }, true);
        assertEquals(0, made.next());
        assertEquals(1, made.next());
        made.close();
        assertFalse(maker.get().isAlive());
        assertEquals("lotgate-made-ahead", maker.get().getName());
    }

    /** Items a producer pushes come to the reader in order; what it throws comes after the items before it. */
    @Property(tries = 40)
    void pushedItemsComeInOrderAndAFailureAfterThem(@ForAll @IntRange(max = 3000) int count, @ForAll boolean fails) {
        IllegalStateException thrown = new IllegalStateException("row " + count + " is bad (invented)");
        List<Integer> read = new ArrayList<>();
        try (MadeAhead<Integer> pushed = MadeAhead.pushed(sink -> {
            for (int i = 0; i < count; i++) {
                sink.accept(i);
            }
            if (fails) {
                throw thrown;
            }
        }, "lotgate-test-producer")) {
            if (fails) {
                assertSame(thrown, assertThrows(IllegalStateException.class, () -> pushed.forEachRemaining(read::add)));
            } else {
                pushed.forEachRemaining(read::add);
                assertFalse(pushed.hasNext());
            }
        }
        assertEquals(IntStream.range(0, count).boxed().toList(), read);
    }

    /** A reader that stops early ends an endless producer, whatever the producer makes of the consumer's throw. */
    @Test
    void closingEarlyEndsAProducerThatWrapsWhatItsConsumerThrows() {
        AtomicReference<Thread> producer = new AtomicReference<>();
        MadeAhead<Integer> pushed = MadeAhead.pushed(sink -> {
            producer.set(Thread.currentThread());
            for (int i = 0; ; i++) {
                try {
                    sink.accept(i);
                } catch (RuntimeException e) {
                    throw new IllegalStateException("wrapped by the producer", e);
                }
            }
        }, "lotgate-test-producer");
        assertEquals(0, pushed.next());
        assertEquals(1, pushed.next());
        pushed.close();
        assertFalse(producer.get().isAlive());
        assertEquals("lotgate-test-producer", producer.get().getName());
    }
}
