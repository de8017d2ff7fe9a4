using System.Globalization;

namespace Readiness.Core.Dependencies;

/// <summary>
/// What a reference passes on to the package's consumers, computed from its <c>IncludeAssets</c>,
/// <c>ExcludeAssets</c> and <c>PrivateAssets</c> metadata the way <c>dotnet pack</c> does (standards.md §5):
/// the assets used are IncludeAssets minus ExcludeAssets; those that flow to consumers are the used ones minus
/// PrivateAssets. Nothing flows: the dependency is left out of the nuspec. Runtime does not flow: the nuspec
/// dependency excludes <c>Runtime</c>. Either way the reference is compile-only for consumers.
/// </summary>
/// <param name="Used">Assets the project itself consumes.</param>
/// <param name="Flowing">Assets that reach the package's consumers.</param>
/// <param name="Unevaluated">Why the metadata could not be read with certainty (an unknown word, an unexpanded
/// property), or null.</param>
public sealed record ReferenceAssets(AssetFlags Used, AssetFlags Flowing, string? Unevaluated)
{
    /// <summary>PrivateAssets when none is written: contentfiles;analyzers;build (NuGet documentation, as above).</summary>
    public const AssetFlags DefaultPrivate = AssetFlags.ContentFiles | AssetFlags.Analyzers | AssetFlags.Build;

    /// <summary>The dependency is left out of the package's dependencies altogether.</summary>
    public bool IsOmitted => Flowing == AssetFlags.None;

    /// <summary>Consumers get no runtime asset from this reference: omitted, or present with <c>exclude</c> holding Runtime.</summary>
    public bool IsCompileOnly => (Flowing & AssetFlags.Runtime) == 0;

    /// <summary>Reads the three metadata values; lookups are case-insensitive, values are <c>;</c> lists.</summary>
    public static ReferenceAssets From(IReadOnlyDictionary<string, string> metadata)
    {
        ArgumentNullException.ThrowIfNull(metadata);
        var problems = new List<string>();
        var include = Parse(Find(metadata, "IncludeAssets"), AssetFlags.All, "IncludeAssets", problems);
        var exclude = Parse(Find(metadata, "ExcludeAssets"), AssetFlags.None, "ExcludeAssets", problems);
        var privateAssets = Parse(Find(metadata, "PrivateAssets"), DefaultPrivate, "PrivateAssets", problems);
        var used = include & ~exclude;
        return new ReferenceAssets(used, used & ~privateAssets, problems.Count == 0 ? null : string.Join("; ", problems));
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
