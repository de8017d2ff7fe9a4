namespace Readiness.Core.Licensing;

/// <summary>
/// Key passages of the license texts the tool recognises. Each passage is a short distinctive phrase of the text as
/// published on the SPDX license list (https://spdx.org/licenses/ID.html, https://github.com/spdx/license-list-data);
/// they are written here from memory and must match those texts after <see cref="LicenseTextNormalizer"/>.
/// Passages avoid the parts SPDX templates mark as replaceable (names of holders, titles).
/// </summary>
public static class LicenseSignatures
{
    private const string FromMemory = "SPDX license list text, passages from memory";

    /// <summary>The BSD non-endorsement clause: its presence separates BSD-3-Clause from BSD-2-Clause.</summary>
    private const string NonEndorsement = "may be used to endorse or promote products derived from this software without specific prior written permission";

    /// <summary>The BSD-4-Clause advertising clause, which neither BSD-2-Clause nor BSD-3-Clause has.</summary>
    private const string Advertising = "all advertising materials mentioning features or use of this software must display the following acknowledgement";

    private const string BsdRedistribution = "redistribution and use in source and binary forms, with or without modification, are permitted provided that the following conditions are met";
    private const string BsdSource = "redistributions of source code must retain the above copyright notice, this list of conditions and the following disclaimer";
    private const string BsdBinary = "redistributions in binary form must reproduce the above copyright notice, this list of conditions and the following disclaimer in the documentation and/or other materials provided with the distribution";

    public static IReadOnlyList<LicenseSignature> All { get; } =
    [
        new("MIT", ["MIT"],
            [
                "permission is hereby granted, free of charge, to any person obtaining a copy of this software and associated documentation files",
                "the above copyright notice and this permission notice shall be included in all copies or substantial portions of the software",
                "the software is provided \"as is\", without warranty of any kind, express or implied",
            ],
            [],
            FromMemory),
        new("ISC", ["ISC"],
            [
                "for any purpose with or without fee is hereby granted, provided that the above copyright notice and this permission notice appear in all copies",
                "disclaims all warranties with regard to this software including all implied warranties of merchantability and fitness",
            ],
            [],
            FromMemory),
        new("BSD-2-Clause", ["BSD-2-Clause"], [BsdRedistribution, BsdSource, BsdBinary], [NonEndorsement, Advertising], FromMemory),
        new("BSD-3-Clause", ["BSD-3-Clause"], [BsdRedistribution, BsdSource, BsdBinary, NonEndorsement], [Advertising], FromMemory),
        new("Apache-2.0", ["Apache-2.0"],
            [
                "each contributor hereby grants to you a perpetual, worldwide, non-exclusive, no-charge, royalty-free, irrevocable copyright license to reproduce, prepare derivative works of, publicly display, publicly perform, sublicense, and distribute the work and such derivative works in source or object form",
                "you must give any other recipients of the work or derivative works a copy of this license",
            ],
            [],
            FromMemory),
        new("MPL-2.0", ["MPL-2.0", "MPL-2.0-no-copyleft-exception"],
            [
                "\"covered software\" means source code form to which the initial contributor has attached the notice in exhibit a",
                "this source code form is subject to the terms of the mozilla public license, v. 2.0",
            ],
            [],
            FromMemory),
        new("GPL-3.0", ["GPL-3.0-only", "GPL-3.0-or-later", "GPL-3.0", "GPL-3.0+"],
            [
                "the gnu general public license is a free, copyleft license for software and other kinds of works",
                "\"this license\" refers to version 3 of the gnu general public license",
            ],
            [],
            FromMemory),
        new("LGPL-3.0", ["LGPL-3.0-only", "LGPL-3.0-or-later", "LGPL-3.0", "LGPL-3.0+"],
            [
                "this version of the gnu lesser general public license incorporates the terms and conditions of version 3 of the gnu general public license, supplemented by the additional permissions listed below",
                "\"this license\" refers to version 3 of the gnu lesser general public license",
            ],
            [],
            FromMemory),
        new("Unlicense", ["Unlicense"],
            [
                "this is free and unencumbered software released into the public domain",
                "anyone is free to copy, modify, publish, use, compile, sell, or distribute this software, either in source code form or as a compiled binary, for any purpose, commercial or non-commercial, and by any means",
            ],
            [],
            FromMemory),
    ];

    /// <summary>The signature whose text <paramref name="spdxId"/> names (case-insensitive; a trailing <c>+</c> ignored), or null.</summary>
    public static LicenseSignature? For(string spdxId)
    {
        ArgumentNullException.ThrowIfNull(spdxId);
        return All.FirstOrDefault(s => s.Ids.Contains(spdxId, StringComparer.OrdinalIgnoreCase))
            ?? (spdxId.EndsWith('+') ? All.FirstOrDefault(s => s.Ids.Contains(spdxId[..^1], StringComparer.OrdinalIgnoreCase)) : null);
    }
}
