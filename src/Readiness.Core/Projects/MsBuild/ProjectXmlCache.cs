using System.Xml;
using System.Xml.Linq;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Parses project XML safely (no DTD, no resolver, bounded size) keeping line numbers, once per path per read.
/// </summary>
internal sealed class ProjectXmlCache(IFileTree files)
{
    private readonly Dictionary<string, XmlLoad> loaded = new(StringComparer.Ordinal);

    public XmlLoad Load(string path)
    {
        if (!loaded.TryGetValue(path, out var result))
        {
            result = Read(path);
            loaded[path] = result;
        }

        return result;
    }

    private XmlLoad Read(string path)
    {
        byte[]? bytes;
        try
        {
            bytes = files.ReadBytes(path, FileLimits.DefaultMaxBytes);
        }
        catch (FileTooLargeException e)
        {
            return new XmlLoad(null, new ProjectProblem(path, null, e.Message));
        }

        if (bytes is null)
        {
            return new XmlLoad(null, null, Missing: true);
        }

        var settings = new XmlReaderSettings
        {
            DtdProcessing = DtdProcessing.Prohibit,
            XmlResolver = null,
            MaxCharactersInDocument = MsBuildLimits.MaxCharactersInDocument,
            MaxCharactersFromEntities = MsBuildLimits.MaxCharactersInDocument,
            IgnoreComments = true,
            IgnoreProcessingInstructions = true,
        };
        try
        {
            if (TooDeep(bytes, settings) is { } deep)
            {
                return new XmlLoad(null, new ProjectProblem(path, deep, $"Elements are nested deeper than {MsBuildLimits.MaxXmlDepth} levels; not read."));
            }

            using var stream = new MemoryStream(bytes, writable: false);
            using var reader = XmlReader.Create(stream, settings);
            var document = XDocument.Load(reader, LoadOptions.SetLineInfo | LoadOptions.PreserveWhitespace);
            if (document.Root is not { } root)
            {
                return new XmlLoad(null, new ProjectProblem(path, null, "The file has no root element."));
            }

            return root.Name.LocalName == "Project"
                ? new XmlLoad(root, null)
                : new XmlLoad(null, new ProjectProblem(path, Line(root), $"The root element is <{root.Name.LocalName}>, not <Project>; not read as MSBuild."));
        }
        catch (XmlException e)
        {
            var doctype = bytes.AsSpan().IndexOf("<!DOCTYPE"u8);
            if (doctype >= 0)
            {
                var line = bytes.AsSpan(0, doctype).Count((byte)'\n') + 1;
                return new XmlLoad(null, new ProjectProblem(
                    path,
                    line,
                    "The file declares a DTD (<!DOCTYPE>); refused: project files never need one, and a DTD can expand entities without bound."));
            }

            return new XmlLoad(null, new ProjectProblem(path, e.LineNumber > 0 ? e.LineNumber : null, $"Malformed XML: {e.Message}"));
        }
        catch (ArgumentException e)
        {
            // An encoding named in the XML declaration that this runtime does not have.
            return new XmlLoad(null, new ProjectProblem(path, null, $"Unreadable XML: {e.Message}"));
        }
    }

    /// <summary>
    /// The line where nesting first passes <see cref="MsBuildLimits.MaxXmlDepth"/>, read with a forward-only reader
    /// before any tree is built (building and walking a tree that deep is what must not happen); null when it never does.
    /// </summary>
    private static int? TooDeep(byte[] bytes, XmlReaderSettings settings)
    {
        using var stream = new MemoryStream(bytes, writable: false);
        using var reader = XmlReader.Create(stream, settings);
        while (reader.Read())
        {
            if (reader.Depth > MsBuildLimits.MaxXmlDepth)
            {
                return reader is IXmlLineInfo info && info.HasLineInfo() ? info.LineNumber : null;
            }
        }

        return null;
    }

    public static int Line(XObject node) => node is IXmlLineInfo info && info.HasLineInfo() ? info.LineNumber : 0;
}
