namespace MotionSpec.Cli;

/// <summary>
/// Writes an output file so that it is either the complete new content or untouched: the bytes go to a
/// temporary file beside the target (same folder, so the final move is a rename on one volume) and are moved
/// over the target only after they are all written and flushed. A failed or interrupted command therefore
/// never leaves a half-written C# file or plot behind.
/// </summary>
internal static class AtomicFileWriter
{
    /// <summary>
    /// Opens the temporary file; tests replace it to make a run fail while it writes (a full disk, a folder
    /// without write permission). Flow-local, so a failure injected by one test never reaches a command that
    /// another test runs at the same time.
    /// </summary>
    internal static readonly AsyncLocal<Func<string, Stream>?> OpenTemporary = new();

    /// <summary>
    /// Writes what <paramref name="write"/> produces to <paramref name="path"/>. Returns null on success, or a
    /// message naming the path as given when the file could not be written (nothing is left behind then).
    /// </summary>
    public static string? TryWrite(string path, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        string? temporary = null;
        try
        {
            var full = Path.GetFullPath(path);
            if (Directory.Exists(full))
            {
                return $"cannot write '{path}': it is a directory";
            }

            var folder = Path.GetDirectoryName(full) ?? ".";
            temporary = Path.Combine(folder, $".{Path.GetFileName(full)}.{Guid.NewGuid():N}.tmp");
            using (var stream = (OpenTemporary.Value ?? Create)(temporary))
            {
                write(stream);
                if (stream is FileStream file)
                {
                    file.Flush(flushToDisk: true);
                }
                else
                {
                    stream.Flush();
                }
            }

            File.Move(temporary, full, overwrite: true);
            temporary = null;
            return null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return $"cannot write '{path}': {Describe(e)}";
        }
        finally
        {
            if (temporary is not null)
            {
                TryDelete(temporary);
            }
        }
    }

    /// <summary>Writes text as UTF-8 without a byte-order mark, with the same guarantee.</summary>
    public static string? TryWriteText(string path, string text) =>
        TryWrite(path, stream =>
        {
            using var writer = new StreamWriter(stream, new System.Text.UTF8Encoding(false), leaveOpen: true);
            writer.Write(text);
        });

    private static FileStream Create(string temporary) => new(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None);

    private static string Describe(Exception e) => e switch
    {
        DirectoryNotFoundException => "the folder does not exist",
        UnauthorizedAccessException => "permission denied",
        PathTooLongException => "the path is too long",
        ArgumentException or NotSupportedException => "the path is not valid",
        _ => e.Message,
    };

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (IOException)
        {
            // Best effort: the target is intact either way, a stray temporary file is the lesser harm.
        }
        catch (UnauthorizedAccessException)
        {
            // As above.
        }
    }
}
