namespace FilterQA.Core.Formats;

/// <summary>Reads a sweep file's bytes, turning every I/O failure into a <see cref="SweepReadException"/> naming the file.</summary>
internal static class SweepFileBytes
{
    /// <summary>The bytes of <paramref name="path"/>; the exception names the file without its folder.</summary>
    public static byte[] Read(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        string fileName = Path.GetFileName(path);
        try
        {
            return File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException or System.Security.SecurityException)
        {
            string why = e switch
            {
                FileNotFoundException => "the file does not exist",
                DirectoryNotFoundException => "the folder of the file does not exist",
                UnauthorizedAccessException => "access to the file is denied",
                _ => $"the file cannot be read ({e.Message})",
            };
            throw new SweepReadException(fileName, 0, 0, why, e);
        }
    }
}
