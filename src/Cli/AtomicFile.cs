using System;
using System.IO;
using System.Text;

namespace Phaseward.Cli;

/// <summary>Writes a file through a temporary file in the same folder, moved into place only once it is complete.</summary>
internal static class AtomicFile
{
    public static void WriteAllText(string path, string contents)
    {
        var full = Path.GetFullPath(path);
        var directory = Path.GetDirectoryName(full)!;
        if (!Directory.Exists(directory))
            throw new InputException($"cannot write '{path}': folder '{directory}' does not exist");
        var temp = Path.Combine(directory, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        try
        {
            File.WriteAllText(temp, contents, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false));
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"cannot write '{path}': {e.Message}");
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }
}
