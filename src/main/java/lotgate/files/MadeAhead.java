package lotgate.files;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * The items of an iterator, each made into another by a function, in order; with {@code ahead}, the iterating and
 * making run on a thread of their own, a few batches ahead of the reader: a bulk load makes its records (canonical
 * JSON, chain hashes, lot keys) while the driver writes the ones before, and a long CSV file is parsed while its rows
 * are checked. Whatever the iterator or the function throws is thrown to the reader in its place, after the items
 * before it. Closing stops the thread and waits for it, so that nothing it touched is touched by it after (a reader
 * that stops early may leave a few batches made for nothing).
 */
public final class MadeAhead<R> implements Iterator<R>, AutoCloseable {
    private static final int BATCH = 256;
    private static final int BATCHES = 8;
    private static final Object END = new Object();

    private record Failure(Throwable thrown) {
    }

    private final Iterator<R> inline;
    private final BlockingQueue<Object> batches;
    private final Thread thread;
    private volatile boolean closed;
    private List<R> batch = List.of();
    private int next;
    private boolean ended;

    public <T> MadeAhead(Iterator<T> items, Function<T, R> make, boolean ahead) {
        if (!ahead) {
            inline = new Iterator<>() {
                @Override
                public boolean hasNext() {
                    return items.hasNext();
                }

                @Override
                public R next() {
                    return make.apply(items.next());
                }
            };
            batches = null;
            thread = null;
            return;
        }
        inline = null;
        batches = new ArrayBlockingQueue<>(BATCHES);
        thread = start(sink -> {
            while (!closed && items.hasNext()) {
                sink.accept(make.apply(items.next()));
            }
        }, "lotgate-made-ahead");
    }

    private MadeAhead(Consumer<Consumer<R>> producer, String name) {
        inline = null;
        batches = new ArrayBlockingQueue<>(BATCHES);
        thread = start(producer, name);
    }

    /**
     * The items a producer hands to the consumer it is given, run on a thread of its own (named {@code name}) a few
     * batches ahead of the reader: the rows of a list of past lots are checked while the lots before are recorded.
     * Once the reader has closed, the consumer throws, which ends the producer.
     */
    public static <R> MadeAhead<R> pushed(Consumer<Consumer<R>> producer, String name) {
        return new MadeAhead<>(producer, name);
    }

    /** Thrown by a closed reader's consumer, to end its producer. */
    private static final class Stopped extends RuntimeException {
        Stopped() {
            super(null, null, false, false);
        }
    }

    /** The producer's consumer: gathers the items in batches and queues each full one for the reader. */
    private final class Batching implements Consumer<R> {
        private List<R> batch = new ArrayList<>(BATCH);

        @Override
        public void accept(R item) {
            if (closed) {
                throw new Stopped();
            }
            batch.add(item);
            if (batch.size() == BATCH) {
                try {
                    batches.put(batch);
                } catch (InterruptedException e) {
                    throw new Stopped();
                }
                batch = new ArrayList<>(BATCH);
            }
        }
    }

    private Thread start(Consumer<Consumer<R>> producer, String name) {
        Thread started = new Thread(() -> {
            Batching sink = new Batching();
            try {
                producer.accept(sink);
                batches.put(sink.batch);
                batches.put(END);
            } catch (InterruptedException e) {
                // Closed by the reader: nothing more is wanted.
            } catch (Throwable thrown) {
                if (closed) {
                    // Closed by the reader (the producer may have wrapped what the consumer threw).
                    return;
                }
                try {
                    // The items made before the failure come first, in their batch.
                    batches.put(sink.batch);
                    batches.put(new Failure(thrown));
                } catch (InterruptedException e) {
                    // Closed by the reader, which no longer reads the failure.
                }
            }
        }, name);
        started.setDaemon(true);
        started.start();
        return started;
    }

    @Override
    public boolean hasNext() {
        if (inline != null) {
            return inline.hasNext();
        }
        while (next == batch.size()) {
            if (ended) {
                return false;
            }
            Object taken;
            try {
                taken = batches.take();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while waiting for the items made ahead", e);
            }
            if (taken == END) {
                ended = true;
            } else if (taken instanceof Failure failure) {
                ended = true;
                if (failure.thrown() instanceof RuntimeException e) {
                    throw e;
                }
                if (failure.thrown() instanceof Error e) {
                    throw e;
                }
                throw new IllegalStateException(failure.thrown());
            } else {
                @SuppressWarnings("unchecked")
                List<R> made = (List<R>) taken;
                batch = made;
                next = 0;
            }
        }
        return true;
    }

    @Override
    public R next() {
        if (!hasNext()) {
            throw new NoSuchElementException();
        }
        return inline != null ? inline.next() : batch.get(next++);
    }

    @Override
    public void close() {
        if (thread == null) {
            return;
        }
        closed = true;
        thread.interrupt();
        batches.clear();
        boolean interrupted = false;
        while (thread.isAlive()) {
            try {
                thread.join();
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
