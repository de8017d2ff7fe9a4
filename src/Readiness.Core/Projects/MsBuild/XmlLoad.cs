using System.Xml.Linq;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>A project file or import as parsed: its root element, or why it could not be read.</summary>
internal sealed record XmlLoad(XElement? Root, ProjectProblem? Problem, bool Missing = false);
