namespace MotionSpec.Cli;

/// <summary>
/// Reads spec files as raw bytes (decoding is the compiler's job, so that a bad byte becomes a located
/// diagnostic). A file that cannot be read is a command-line problem: the message goes to standard error
/// and the caller exits with <see cref="ExitCodes.Usage"/>.
/// </summary>
internal static class SpecFileLoader
{
    /// <summary>
    /// Files above this size are not read at all; the front end has its own, smaller limit and reports a
    /// spec beyond it as a located error. This cap only keeps a wrong argument (a disk image, a log)
    /// from being pulled into memory.
    /// </summary>
    public const long ReadCapBytes = 256L * 1024 * 1024;

    /// <summary>Reads one file; on failure writes one line naming the path as given and returns null.</summary>
    public static byte[]? TryRead(string path, TextWriter stderr)
    {
        var problem = Read(path, out var bytes);
        if (problem is not null)
        {
            stderr.WriteLine($"motionspec: cannot read '{path}': {problem}");
        }

        return bytes;
    }

    /// <summary>
    /// Reads every file before anything is checked. When one or more cannot be read, each is named and the
    /// result is null: nothing is checked, so the exit is a clean command-line failure and a JSON consumer
    /// never sees half a run.
    /// </summary>
    public static IReadOnlyList<byte[]>? TryReadAll(IReadOnlyList<string> paths, TextWriter stderr)
    {
        var contents = new List<byte[]>(paths.Count);
        var failed = false;
        foreach (var path in paths)
        {
            var bytes = TryRead(path, stderr);
            if (bytes is null)
            {
                failed = true;
            }
            else
            {
                contents.Add(bytes);
            }
        }

        return failed ? null : contents;
    }

    private static string? Read(string path, out byte[]? bytes)
    {
        bytes = null;
        if (string.IsNullOrWhiteSpace(path))
        {
            return "the file name is empty";
        }

        try
        {
            if (Directory.Exists(path))
            {
                return "it is a directory, not a spec file";
            }

            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read);
            if (stream.CanSeek && stream.Length > ReadCapBytes)
            {
                return FormattableString.Invariant($"the file is larger than {ReadCapBytes / (1024 * 1024)} MiB; a spec is plain text and far smaller");
            }

            bytes = ReadToEnd(stream);
            return bytes is null
                ? FormattableString.Invariant($"the file is larger than {ReadCapBytes / (1024 * 1024)} MiB; a spec is plain text and far smaller")
                : null;
        }
        catch (FileNotFoundException)
        {
            return "no such file";
        }
        catch (DirectoryNotFoundException)
        {
            return "no such file (a folder on the path does not exist)";
        }
        catch (UnauthorizedAccessException)
        {
            return "permission denied";
        }
        catch (PathTooLongException)
        {
            return "the path is too long";
        }
        catch (IOException e)
        {
            return e.Message;
        }
        catch (ArgumentException)
        {
            // Characters the file system does not accept in a path.
            return "the path is not valid";
        }
        catch (NotSupportedException)
        {
            return "the path is not valid";
        }
    }

    // Reads without trusting Length, which pipes and special files do not report.
    private static byte[]? ReadToEnd(Stream stream)
    {
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = stream.Read(chunk, 0, chunk.Length)) > 0)
        {
            if (buffer.Length + read > ReadCapBytes)
            {
                return null;
            }

            buffer.Write(chunk, 0, read);
        }

        return buffer.ToArray();
    }
}
