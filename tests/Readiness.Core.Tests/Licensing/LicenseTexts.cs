namespace Readiness.Core.Tests.Licensing;

/// <summary>
/// License texts as test fixtures, written from memory after the texts of the SPDX license list
/// (https://spdx.org/licenses/). MIT, ISC, BSD-2-Clause, BSD-3-Clause, Unlicense and Apache-2.0 are complete;
/// GPL-3.0, LGPL-3.0 and MPL-2.0 are their opening parts only (the full texts run to hundreds of lines).
/// </summary>
internal static class LicenseTexts
{
    /// <summary>The MIT text the sample repositories ship (one copy, in Readiness.Testing).</summary>
    public const string Mit = Readiness.Testing.SampleLibrary.MitLicense;

    public const string Isc = """
        ISC License

        Copyright (c) 2026, Bramblecote Software

        Permission to use, copy, modify, and/or distribute this software for any
        purpose with or without fee is hereby granted, provided that the above
        copyright notice and this permission notice appear in all copies.

        THE SOFTWARE IS PROVIDED "AS IS" AND THE AUTHOR DISCLAIMS ALL WARRANTIES
        WITH REGARD TO THIS SOFTWARE INCLUDING ALL IMPLIED WARRANTIES OF
        MERCHANTABILITY AND FITNESS. IN NO EVENT SHALL THE AUTHOR BE LIABLE FOR
        ANY SPECIAL, DIRECT, INDIRECT, OR CONSEQUENTIAL DAMAGES OR ANY DAMAGES
        WHATSOEVER RESULTING FROM LOSS OF USE, DATA OR PROFITS, WHETHER IN AN
        ACTION OF CONTRACT, NEGLIGENCE OR OTHER TORTIOUS ACTION, ARISING OUT OF
        OR IN CONNECTION WITH THE USE OR PERFORMANCE OF THIS SOFTWARE.

        """;

    private const string BsdConditions = """
        Redistribution and use in source and binary forms, with or without
        modification, are permitted provided that the following conditions are met:

        1. Redistributions of source code must retain the above copyright notice, this
           list of conditions and the following disclaimer.

        2. Redistributions in binary form must reproduce the above copyright notice,
           this list of conditions and the following disclaimer in the documentation
           and/or other materials provided with the distribution.

        """;

    private const string BsdDisclaimer = """
        THIS SOFTWARE IS PROVIDED BY THE COPYRIGHT HOLDERS AND CONTRIBUTORS "AS IS"
        AND ANY EXPRESS OR IMPLIED WARRANTIES, INCLUDING, BUT NOT LIMITED TO, THE
        IMPLIED WARRANTIES OF MERCHANTABILITY AND FITNESS FOR A PARTICULAR PURPOSE ARE
        DISCLAIMED. IN NO EVENT SHALL THE COPYRIGHT HOLDER OR CONTRIBUTORS BE LIABLE
        FOR ANY DIRECT, INDIRECT, INCIDENTAL, SPECIAL, EXEMPLARY, OR CONSEQUENTIAL
        DAMAGES (INCLUDING, BUT NOT LIMITED TO, PROCUREMENT OF SUBSTITUTE GOODS OR
        SERVICES; LOSS OF USE, DATA, OR PROFITS; OR BUSINESS INTERRUPTION) HOWEVER
        CAUSED AND ON ANY THEORY OF LIABILITY, WHETHER IN CONTRACT, STRICT LIABILITY,
        OR TORT (INCLUDING NEGLIGENCE OR OTHERWISE) ARISING IN ANY WAY OUT OF THE USE
        OF THIS SOFTWARE, EVEN IF ADVISED OF THE POSSIBILITY OF SUCH DAMAGE.

        """;

    public const string Bsd2 = "BSD 2-Clause License\n\nCopyright (c) 2026, Bramblecote Software\n\n" + BsdConditions + "\n" + BsdDisclaimer;

    public const string Bsd3 = "BSD 3-Clause License\n\nCopyright (c) 2026, Bramblecote Software\n\n" + BsdConditions + """

        3. Neither the name of the copyright holder nor the names of its
           contributors may be used to endorse or promote products derived from
           this software without specific prior written permission.

        """ + "\n" + BsdDisclaimer;

    /// <summary>BSD-4-Clause's advertising clause added to BSD-3-Clause: neither BSD-2 nor BSD-3.</summary>
    public const string Bsd4 = "Copyright (c) 2026, Bramblecote Software\n\n" + BsdConditions + """

        3. All advertising materials mentioning features or use of this software
           must display the following acknowledgement: This product includes
           software developed by Bramblecote Software.

        4. Neither the name of the copyright holder nor the names of its
           contributors may be used to endorse or promote products derived from
           this software without specific prior written permission.

        """ + "\n" + BsdDisclaimer;

    public const string Unlicense = """
        This is free and unencumbered software released into the public domain.

        Anyone is free to copy, modify, publish, use, compile, sell, or
        distribute this software, either in source code form or as a compiled
        binary, for any purpose, commercial or non-commercial, and by any
        means.

        In jurisdictions that recognize copyright laws, the author or authors
        of this software dedicate any and all copyright interest in the
        software to the public domain. We make this dedication for the benefit
        of the public at large and to the detriment of our heirs and
        successors. We intend this dedication to be an overt act of
        relinquishment in perpetuity of all present and future rights to this
        software under copyright law.

        THE SOFTWARE IS PROVIDED "AS IS", WITHOUT WARRANTY OF ANY KIND,
        EXPRESS OR IMPLIED, INCLUDING BUT NOT LIMITED TO THE WARRANTIES OF
        MERCHANTABILITY, FITNESS FOR A PARTICULAR PURPOSE AND NONINFRINGEMENT.
        IN NO EVENT SHALL THE AUTHORS BE LIABLE FOR ANY CLAIM, DAMAGES OR
        OTHER LIABILITY, WHETHER IN AN ACTION OF CONTRACT, TORT OR OTHERWISE,
        ARISING FROM, OUT OF OR IN CONNECTION WITH THE SOFTWARE OR THE USE OR
        OTHER DEALINGS IN THE SOFTWARE.

        For more information, please refer to <http://unlicense.org/>

        """;

    public const string Gpl3Opening = """
                            GNU GENERAL PUBLIC LICENSE
                               Version 3, 29 June 2007

         Copyright (C) 2007 Free Software Foundation, Inc. <https://fsf.org/>
         Everyone is permitted to copy and distribute verbatim copies
         of this license document, but changing it is not allowed.

                                    Preamble

          The GNU General Public License is a free, copyleft license for
        software and other kinds of works.

          The licenses for most software and other practical works are designed
        to take away your freedom to share and change the works.  By contrast,
        the GNU General Public License is intended to guarantee your freedom to
        share and change all versions of a program--to make sure it remains free
        software for all its users.

                               TERMS AND CONDITIONS

          0. Definitions.

          "This License" refers to version 3 of the GNU General Public License.

          "Copyright" also means copyright-like laws that apply to other kinds of
        works, such as semiconductor masks.

        """;

    public const string Lgpl3Opening = """
                           GNU LESSER GENERAL PUBLIC LICENSE
                               Version 3, 29 June 2007

         Copyright (C) 2007 Free Software Foundation, Inc. <https://fsf.org/>
         Everyone is permitted to copy and distribute verbatim copies
         of this license document, but changing it is not allowed.


          This version of the GNU Lesser General Public License incorporates
        the terms and conditions of version 3 of the GNU General Public
        License, supplemented by the additional permissions listed below.

          0. Additional Definitions.

          As used herein, "this License" refers to version 3 of the GNU Lesser
        General Public License, and the "GNU GPL" refers to version 3 of the GNU
        General Public License.

        """;

    public const string Mpl2Opening = """
        Mozilla Public License Version 2.0
        ==================================

        1. Definitions
        --------------

        1.1. "Contributor"
            means each individual or legal entity that creates, contributes to
            the creation of, or owns Covered Software.

        1.4. "Covered Software"
            means Source Code Form to which the initial Contributor has attached
            the notice in Exhibit A, the Executable Form of such Source Code
            Form, and Modifications of such Source Code Form, in each case
            including portions thereof.

        Exhibit A - Source Code Form License Notice
        -------------------------------------------

          This Source Code Form is subject to the terms of the Mozilla Public
          License, v. 2.0. If a copy of the MPL was not distributed with this
          file, You can obtain one at http://mozilla.org/MPL/2.0/.

        """;
}
