using System.Xml.Linq;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>An ItemGroup or ItemDefinitionGroup met in the property pass, evaluated once all properties are final.</summary>
internal sealed record PendingGroup(XElement Element, string File);
