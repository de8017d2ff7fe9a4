namespace Readiness.Registries;

/// <summary>One version as a registration page describes it.</summary>
internal sealed record RegistrationLeaf(string? Id, string Version, bool Listed, bool Deprecated);
