namespace Readiness.Core.Matrix;

/// <summary>One row of the framework lifecycle table.</summary>
/// <param name="Framework">The NuGet framework identifier (<c>.NETCoreApp</c>, <c>.NETFramework</c>, <c>.NETStandard</c>).</param>
/// <param name="Version">The framework version the row covers (major.minor, or major.minor.build for .NET Framework).</param>
/// <param name="Name">The product name, e.g. <c>.NET 8</c>.</param>
/// <param name="EndOfSupport">The last day of support, or null when no end date is known or published.</param>
/// <param name="Source">Where the date comes from, with "from memory" where no copy of the source was at hand.</param>
public sealed record FrameworkSupport(string Framework, Version Version, string Name, DateOnly? EndOfSupport, string Source);
