using System.Text;
using Readiness.Core.Licensing;

namespace Readiness.Core.Tests.Licensing;

public sealed class LicenseTextRecognizerTests
{
    public static TheoryData<string, string> Texts => new()
    {
        { nameof(LicenseTexts.Mit), "MIT" },
        { nameof(LicenseTexts.Isc), "ISC" },
        { nameof(LicenseTexts.Bsd2), "BSD-2-Clause" },
        { nameof(LicenseTexts.Bsd3), "BSD-3-Clause" },
        { nameof(LicenseTexts.Unlicense), "Unlicense" },
        { nameof(ApacheLicenseText), "Apache-2.0" },
        { nameof(LicenseTexts.Gpl3Opening), "GPL-3.0" },
        { nameof(LicenseTexts.Lgpl3Opening), "LGPL-3.0" },
        { nameof(LicenseTexts.Mpl2Opening), "MPL-2.0" },
    };

    [Theory]
    [MemberData(nameof(Texts))]
    public void PublishedText_RecognisedAsExactlyItsLicense(string fixture, string expected)
    {
        var recognition = LicenseTextRecognizer.Recognize(Text(fixture));

        Assert.Equal([expected], recognition.Recognised.Select(s => s.Name));
    }

    [Theory]
    [MemberData(nameof(Texts))]
    public void ReformattedText_StillRecognised(string fixture, string expected)
    {
        // SPDX matching guidelines: whitespace and line breaks, case, quote and dash styles, bullets and numbering,
        // copyright notices and http/https do not change the license.
        var text = Text(fixture);
        var variants = new[]
        {
            Rewrap(text, 37),
            text.ToUpperInvariant(),
            CurlyQuotesAndDashes(text),
            OtherCopyright(text),
            AsMarkdown(text),
            text.Replace("http://", "https://", StringComparison.Ordinal).Replace("\n", "\r\n", StringComparison.Ordinal),
        };

        Assert.All(variants, variant => Assert.Equal([expected], LicenseTextRecognizer.Recognize(variant).Recognised.Select(s => s.Name)));
    }

    [Fact]
    public void Bsd3WithoutNonEndorsementClause_IsBsd2()
    {
        // The non-endorsement clause (clause 3) is what separates BSD-3-Clause from BSD-2-Clause on the SPDX list.
        Assert.True(LicenseTextRecognizer.Recognize(LicenseTexts.Bsd3).Is(LicenseSignatures.For("BSD-3-Clause")!));
        Assert.False(LicenseTextRecognizer.Recognize(LicenseTexts.Bsd3).Is(LicenseSignatures.For("BSD-2-Clause")!));
        Assert.False(LicenseTextRecognizer.Recognize(LicenseTexts.Bsd2).Is(LicenseSignatures.For("BSD-3-Clause")!));
    }

    [Fact]
    public void Bsd4_IsNeitherBsd2NorBsd3()
    {
        // BSD-4-Clause adds the advertising clause (SPDX list, BSD-4-Clause).
        Assert.Empty(LicenseTextRecognizer.Recognize(LicenseTexts.Bsd4).Recognised);
    }

    [Fact]
    public void MitAndIsc_AreNotConfused()
    {
        Assert.Equal(["MIT"], LicenseTextRecognizer.Recognize(LicenseTexts.Mit).Recognised.Select(s => s.Name));
        Assert.Equal(["ISC"], LicenseTextRecognizer.Recognize(LicenseTexts.Isc).Recognised.Select(s => s.Name));
    }

    [Fact]
    public void MitWithoutItsNoticeCondition_IsNotMit()
    {
        // MIT-0 (SPDX list, from memory) grants the same rights without requiring the notice to be kept: another license.
        const string mitNoAttribution = """
            Permission is hereby granted, free of charge, to any person obtaining a copy of this
            software and associated documentation files (the "Software"), to deal in the Software
            without restriction, including without limitation the rights to use, copy, modify,
            merge, publish, distribute, sublicense, and/or sell copies of the Software, and to
            permit persons to whom the Software is furnished to do so.

            THE SOFTWARE IS PROVIDED "AS IS", WITHOUT WARRANTY OF ANY KIND, EXPRESS OR IMPLIED,
            INCLUDING BUT NOT LIMITED TO THE WARRANTIES OF MERCHANTABILITY, FITNESS FOR A
            PARTICULAR PURPOSE AND NONINFRINGEMENT.
            """;

        var recognition = LicenseTextRecognizer.Recognize(mitNoAttribution);

        Assert.Empty(recognition.Recognised);
        Assert.Equal("MIT", recognition.Closest!.Name);
        Assert.Equal((2, 3), (recognition.ClosestFound, recognition.ClosestTotal));
    }

    [Fact]
    public void TwoTextsInOneFile_BothRecognised()
    {
        var recognition = LicenseTextRecognizer.Recognize(LicenseTexts.Mit + "\n---\n\n" + ApacheLicenseText.Full);

        Assert.Equal(["MIT", "Apache-2.0"], recognition.Recognised.Select(s => s.Name));
    }

    [Theory]
    [InlineData("")]
    [InlineData("Copyright (c) 2026 Bramblecote Software. All rights reserved.\n\nNo part of this software may be copied.\n")]
    [InlineData("Licensed under the Apache License, Version 2.0 (the \"License\"); you may not use this file except in compliance with the License.")]
    public void OtherTexts_NotRecognised(string text)
    {
        Assert.Empty(LicenseTextRecognizer.Recognize(text).Recognised);
    }

    private static string Text(string fixture) => fixture switch
    {
        nameof(ApacheLicenseText) => ApacheLicenseText.Full,
        _ => (string)typeof(LicenseTexts).GetField(fixture)!.GetValue(null)!,
    };

    private static string Rewrap(string text, int width)
    {
        var output = new StringBuilder();
        foreach (var paragraph in text.Split("\n\n"))
        {
            var line = new StringBuilder();
            foreach (var word in paragraph.Split([' ', '\n'], StringSplitOptions.RemoveEmptyEntries))
            {
                if (line.Length + word.Length + 1 > width && line.Length > 0)
                {
                    output.Append(line).Append('\n');
                    line.Clear();
                }

                line.Append(line.Length > 0 ? " " : string.Empty).Append(word);
            }

            output.Append(line).Append("\n\n");
        }

        return output.ToString();
    }

    private static string CurlyQuotesAndDashes(string text)
    {
        var output = new StringBuilder();
        var open = true;
        foreach (var c in text)
        {
            output.Append(c switch
            {
                '"' => (open = !open) ? '\u201D' : '\u201C',
                '-' => '\u2013',
                _ => c,
            });
        }

        return output.ToString();
    }

    private static string OtherCopyright(string text) =>
        string.Join('\n', text.Split('\n').Select(l => l.TrimStart().StartsWith("Copyright (", StringComparison.OrdinalIgnoreCase)
            ? "Copyright © 2019-2026 The Bramble.Sketches authors <dev@bramblecote.example>\nAll rights reserved."
            : l));

    private static string AsMarkdown(string text)
    {
        var lines = text.Split('\n');
        var first = Array.FindIndex(lines, l => l.Trim().Length > 0);
        lines[first] = "# " + lines[first].Trim();
        return "<!-- SPDX text -->\n" + string.Join('\n', lines.Select(l => l.StartsWith("THE SOFTWARE", StringComparison.Ordinal) ? "**" + l : l));
    }
}
