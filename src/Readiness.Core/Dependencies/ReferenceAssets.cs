using System.Globalization;

namespace Readiness.Core.Dependencies;

/// <summary>
/// What a reference passes on to the package's consumers, computed from its <c>IncludeAssets</c>,
/// <c>ExcludeAssets</c> and <c>PrivateAssets</c> metadata the way <c>dotnet pack</c> writes the nuspec (standards.md
/// §5, and confirmed form by form against dotnet pack in the tests): the assets used are IncludeAssets minus
/// ExcludeAssets; when nothing used is left once PrivateAssets is taken away, the dependency is left out of the
/// nuspec; otherwise it is written with <c>exclude</c> holding every asset not used, so consumers get no runtime
/// asset exactly when <c>runtime</c> is not used. PrivateAssets short of everything does not keep runtime assets
/// from consumers (PrivateAssets="runtime" packs a dependency with no exclude at all).
/// </summary>
/// <param name="Used">Assets the project itself consumes (IncludeAssets minus ExcludeAssets).</param>
/// <param name="Private">PrivateAssets (default contentfiles;analyzers;build).</param>
/// <param name="Unevaluated">Why the metadata could not be read with certainty (an unknown word, an unexpanded
/// property), or null.</param>
public sealed record ReferenceAssets(AssetFlags Used, AssetFlags Private, string? Unevaluated)
{
    /// <summary>PrivateAssets when none is written: contentfiles;analyzers;build (NuGet documentation, as above).</summary>
    public const AssetFlags DefaultPrivate = AssetFlags.ContentFiles | AssetFlags.Analyzers | AssetFlags.Build;

    /// <summary>The dependency is left out of the package's dependencies altogether.</summary>
    public bool IsOmitted => (Used & ~Private) == AssetFlags.None;

    /// <summary>Consumers get no runtime asset from this reference: omitted, or present with <c>exclude</c> holding Runtime.</summary>
    public bool IsCompileOnly => IsOmitted || (Used & AssetFlags.Runtime) == 0;

    /// <summary>Reads the three metadata values; lookups are case-insensitive, values are <c>;</c> lists.</summary>
    public static ReferenceAssets From(IReadOnlyDictionary<string, string> metadata)
    {
        ArgumentNullException.ThrowIfNull(metadata);
        var problems = new List<string>();
        var include = Parse(Find(metadata, "IncludeAssets"), AssetFlags.All, "IncludeAssets", problems);
        var exclude = Parse(Find(metadata, "ExcludeAssets"), AssetFlags.None, "ExcludeAssets", problems);
        var privateAssets = Parse(Find(metadata, "PrivateAssets"), DefaultPrivate, "PrivateAssets", problems);
        return new ReferenceAssets(include & ~exclude, privateAssets, problems.Count == 0 ? null : string.Join("; ", problems));
    }

    /// <summary>Case-insensitive metadata lookup (MSBuild metadata names are case-insensitive).</summary>
    public static string? Find(IReadOnlyDictionary<string, string> metadata, string name)
    {
        ArgumentNullException.ThrowIfNull(metadata);
        if (metadata.TryGetValue(name, out var exact))
        {
            return exact;
        }

        foreach (var (key, value) in metadata)
        {
            if (string.Equals(key, name, StringComparison.OrdinalIgnoreCase))
            {
                return value;
            }
        }

        return null;
    }

    /// <summary>Parses one <c>;</c> list of asset names; a missing or blank value gives <paramref name="fallback"/>.</summary>
    public static AssetFlags Parse(string? text, AssetFlags fallback, string what, ICollection<string> problems)
    {
        ArgumentNullException.ThrowIfNull(problems);
        if (string.IsNullOrWhiteSpace(text))
        {
            return fallback;
        }

        var flags = AssetFlags.None;
        foreach (var word in text.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var flag = word.ToLowerInvariant() switch
            {
                "none" => AssetFlags.None,
                "all" => AssetFlags.All,
                "compile" => AssetFlags.Compile,
                "runtime" => AssetFlags.Runtime,
                "contentfiles" => AssetFlags.ContentFiles,
                "build" => AssetFlags.Build,
                "buildmultitargeting" => AssetFlags.BuildMultitargeting,
                "buildtransitive" => AssetFlags.BuildTransitive,
                "analyzers" => AssetFlags.Analyzers,
                "native" => AssetFlags.Native,
                _ => (AssetFlags?)null,
            };
            if (flag is null)
            {
                problems.Add(string.Create(CultureInfo.InvariantCulture, $"{what} holds '{word}', which is not an asset name"));
                continue;
            }

            flags |= flag.Value;
        }

        return flags;
    }
}
