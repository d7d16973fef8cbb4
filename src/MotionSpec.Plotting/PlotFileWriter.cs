namespace MotionSpec.Plotting;

/// <summary>
/// Writes an output file so that a reader never sees half of it: the bytes go to a temporary file beside the
/// target, which is moved over the target only once it is complete.
/// </summary>
public static class PlotFileWriter
{
    /// <summary>Writes <paramref name="bytes"/> to <paramref name="path"/>; returns null on success, else why it failed.</summary>
    public static string? Write(string path, byte[] bytes)
    {
        ArgumentNullException.ThrowIfNull(path);
        string? temporary = null;
        try
        {
            var full = Path.GetFullPath(path);
            var folder = Path.GetDirectoryName(full) ?? ".";
            temporary = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N") + ".tmp");
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temporary, full, overwrite: true);
            temporary = null;
            return null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return $"cannot write '{path}': {e.Message}";
        }
        finally
        {
            if (temporary is not null)
            {
                try
                {
                    File.Delete(temporary);
                }
                catch (Exception e) when (e is IOException or UnauthorizedAccessException)
                {
                    // The temporary file is left behind only when it cannot be deleted either; nothing else to do.
                }
            }
        }
    }
}
