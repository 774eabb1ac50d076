using System.Threading.Channels;

namespace TripTestLog.Application.Streams;

/// <summary>
/// Runs a lazy sequence on another thread a bounded number of items ahead of its consumer, so on two cores the reading
/// (a file, a database query) and the work on each item overlap. Order is kept; memory holds at most the queue.
/// </summary>
public static class ReadAhead
{
    /// <summary>
    /// The items of <paramref name="source"/>, produced on another thread at most <paramref name="capacity"/> ahead. A
    /// failure in the source surfaces in the consumer; a consumer that stops early stops the source and waits for it,
    /// so whatever the source reads from is not closed under it.
    /// </summary>
    public static IEnumerable<T> Of<T>(IEnumerable<T> source, int capacity, CancellationToken cancel = default)
    {
        ArgumentNullException.ThrowIfNull(source);
        var queue = Channel.CreateBounded<T>(new BoundedChannelOptions(capacity) { SingleReader = true, SingleWriter = true });
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(cancel);
        var producer = Task.Run(async () =>
        {
            try
            {
                foreach (var item in source)
                {
                    await queue.Writer.WriteAsync(item, stop.Token).ConfigureAwait(false);
                }

                queue.Writer.Complete();
            }
            catch (Exception e)
            {
                queue.Writer.Complete(e);
            }
        }, CancellationToken.None);

        try
        {
            while (queue.Reader.WaitToReadAsync(cancel).AsTask().GetAwaiter().GetResult())
            {
                while (queue.Reader.TryRead(out var item))
                {
                    yield return item;
                }
            }
        }
        finally
        {
            stop.Cancel();
            producer.GetAwaiter().GetResult();
        }
    }
}
