param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
    $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
    $inventory = @(Import-Csv (Join-Path $root 'examples/marrowby-heath-inventory.csv'))
    $assessments = @($inventory | Test-InductionHazard -Site $site -WarningAction SilentlyContinue)
    $heater = New-FieldWaveform -Sine -Amplitude '2 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Heater'

    function New-Assessment([string] $Name, [hashtable] $Extra = @{}) {
        $row = [ordered]@{ Name = $Name; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Contact = 'Worn' }
        foreach ($k in $Extra.Keys) { $row[$k] = $Extra[$k] }
        [pscustomobject] $row | Test-InductionHazard -Source $heater -WarningAction SilentlyContinue
    }
}

Describe 'Export-HazardReport' {
    It 'writes the demo audit as HTML that names every inventory item, with the cautions and the provenance' {
        $path = Join-Path $TestDrive 'audit.html'
        $assessments | Export-HazardReport -Path $path -Site $site
        $html = Get-Content $path -Raw
        foreach ($row in $inventory) { $html | Should -Match ([regex]::Escape([System.Net.WebUtility]::HtmlEncode($row.Name))) }
        ([regex]::Matches($html, '<section class="item"')).Count | Should -Be $inventory.Count
        $html | Should -Match 'engineering estimates'
        $html | Should -Match 'licensed professionals govern'
        $html | Should -Match ([regex]::Escape($assessments[0].PolicyHash))
        $html | Should -Match 'SHA-256'
        $html | Should -Match ([regex]::Escape($site.Name))
        $html | Should -Not -Match '<script'
    }

    It 'lists every policy the demo applied, the visitors'' walkway''s as judging the public''s exposure, in every format' {
        $walkway = $assessments | Where-Object StationName -EQ 'Switchroom B visitor walkway' | Select-Object -First 1
        $walkway.ExposureGroup | Should -Be 'Public'
        ($assessments | Where-Object StationName -NE 'Switchroom B visitor walkway' | ForEach-Object { [string]$_.ExposureGroup } | Sort-Object -Unique) | Should -Be 'Occupational'
        $assessments | Export-HazardReport -Path (Join-Path $TestDrive 'policies.md') -Site $site
        $assessments | Export-HazardReport -Path (Join-Path $TestDrive 'policies.html') -Site $site
        $assessments | Export-HazardReport -Path (Join-Path $TestDrive 'policies.json') -Site $site
        $md = Get-Content (Join-Path $TestDrive 'policies.md') -Raw
        $md | Should -Match ([regex]::Escape("- Policy: Marrowby Heath visitor rules, safety factor 2, for the general public's exposure, SHA-256 ``$($walkway.PolicyHash)``."))
        $md | Should -Match ([regex]::Escape("- Policy: default (published limits), safety factor 2, SHA-256"))
        (Get-Content (Join-Path $TestDrive 'policies.html') -Raw) | Should -Match ([regex]::Escape('Marrowby Heath visitor rules, safety factor 2, for the general public&#39;s exposure<br>'))
        $json = Get-Content (Join-Path $TestDrive 'policies.json') -Raw | ConvertFrom-Json
        ($json.report.policies | Where-Object name -EQ 'Marrowby Heath visitor rules').exposureGroup | Should -Be 'Public'
        ($json.report.policies | Where-Object name -EQ 'default (published limits)').exposureGroup | Should -Be 'Occupational'
    }

    It 'escapes a hostile item name in HTML and Markdown' {
        $a = New-Assessment '<script>alert(1)</script>'
        $a | Export-HazardReport -Path (Join-Path $TestDrive 'x.html')
        $a | Export-HazardReport -Path (Join-Path $TestDrive 'x.md')
        foreach ($file in 'x.html', 'x.md') {
            $text = Get-Content (Join-Path $TestDrive $file) -Raw
            $text | Should -Not -Match '<script>'
            $text | Should -Match ([regex]::Escape('&lt;script&gt;alert(1)&lt;/script&gt;'))
        }
    }

    It 'neutralises a cell that would start a spreadsheet formula in CSV' {
        $a = New-Assessment '=HYPERLINK("x")' @{ Owner = '@SUM(A1)' }
        $a | Export-HazardReport -Path (Join-Path $TestDrive 'x.csv')
        $row = Import-Csv (Join-Path $TestDrive 'x.csv')
        $row.Item | Should -BeExactly '''=HYPERLINK("x")'
        $row.Owner | Should -BeExactly '''@SUM(A1)'
        [double] $row.'PeakCurrent (A)' | Should -Be $a.PeakCurrentAmperes
    }

    It 'writes nothing under -WhatIf' {
        $path = Join-Path $TestDrive 'whatif.html'
        $assessments | Export-HazardReport -Path $path -WhatIf
        Test-Path $path | Should -BeFalse
        @(Get-ChildItem $TestDrive -Force -Filter '*.tmp').Count | Should -Be 0
    }

    It 'does not overwrite an existing file without -Force, and replaces it with -Force' {
        $path = Join-Path $TestDrive 'kept.md'
        Set-Content $path 'an earlier report'
        { $assessments | Export-HazardReport -Path $path } | Should -Throw -ErrorId 'ReportExists,*'
        Get-Content $path -Raw | Should -Match 'an earlier report'
        $assessments | Export-HazardReport -Path $path -Force
        Get-Content $path -Raw | Should -Match '^# Induction hazard assessment'
    }

    It 'leaves no file, partial or temporary, when the pipeline fails part-way' {
        $folder = Join-Path $TestDrive 'failing'
        $null = New-Item -ItemType Directory $folder
        { & { $assessments[0]; $assessments[1]; throw 'the inventory read failed' } | Export-HazardReport -Path (Join-Path $folder 'audit.html') } | Should -Throw '*inventory read failed*'
        @(Get-ChildItem $folder -Force).Count | Should -Be 0
    }

    It 'refuses an empty pipeline rather than write a report that reads as a clean audit' {
        { @() | Export-HazardReport -Path (Join-Path $TestDrive 'empty.html') } | Should -Throw -ErrorId 'ReportEmpty,*'
        Test-Path (Join-Path $TestDrive 'empty.html') | Should -BeFalse
    }

    It 'takes the format from the extension, or refuses an extension that names none' {
        { $assessments[0] | Export-HazardReport -Path (Join-Path $TestDrive 'audit.txt') } | Should -Throw -ErrorId 'ReportFormatUnknown,*'
        $assessments[0] | Export-HazardReport -Path (Join-Path $TestDrive 'audit.txt') -Format Markdown
        Get-Content (Join-Path $TestDrive 'audit.txt') -Raw | Should -Match '^# '
    }

    It 'writes JSON that round-trips through ConvertFrom-Json with the same verdicts, as words' {
        $path = Join-Path $TestDrive 'audit.json'
        $assessments | Export-HazardReport -Path $path
        $json = Get-Content $path -Raw | ConvertFrom-Json
        $json.assessments.Count | Should -Be $assessments.Count
        $json.assessments.verdict | Should -Be ($assessments.Verdict | ForEach-Object ToString)
        $json.assessments.governingMechanism | Where-Object { $_ } | Should -BeIn ([enum]::GetNames([InductionHazard.Criteria.HazardMechanism]))
        $json.assessments[0].inventory.AssetTag | Should -Be $inventory[0].AssetTag
        $json.report.inputsSha256 | Should -Match '^[0-9a-f]{64}$'
        $json.report.cautions -join ' ' | Should -Match 'engineering estimates'
    }

    It 'says in CSV and JSON where each item was, how it moved, how long it stayed and in what air, as its row gave them' {
        $carried = New-Assessment 'Carried ring' @{ Position = '0, 250 mm, 0'; Velocity = '0, 0, 1.5 m/s'; ExposureTime = '10 min'; AmbientTemperature = '35 degC' }
        $placed = New-Assessment 'Placed ring'
        @($carried, $placed) | Export-HazardReport -Path (Join-Path $TestDrive 'conditions.csv')
        $rows = @(Import-Csv (Join-Path $TestDrive 'conditions.csv'))
        $rows[0].Placement | Should -BeLike 'centred at (0 m, 250 mm, 0 m);*; moving at (0 m/s, 0 m/s, 1.5 m/s)'
        $rows[1].Placement | Should -Not -BeLike '*moving*'
        [double]$rows[0].'TimeInField (s)' | Should -Be 601 -Because 'ten minutes in place and the 1 s of carrying it out, as the Markdown report''s "Time in the field" says'
        [double]$rows[0].'AmbientTemperature (°C)' | Should -Be 35
        [double]$rows[1].'AmbientTemperature (°C)' | Should -Be 20
        @($carried, $placed) | Export-HazardReport -Path (Join-Path $TestDrive 'conditions.json')
        $json = Get-Content (Join-Path $TestDrive 'conditions.json') -Raw | ConvertFrom-Json
        $json.assessments[0].inputs.velocityMetersPerSecond | Should -Be '(0, 0, 1.5)'
        $json.assessments[1].inputs.velocityMetersPerSecond | Should -BeNullOrEmpty
        $json.assessments.inputs.ambientCelsius | Should -Be @(35, 20)
        # The row's own conditions are inputs, not the inventory's columns.
        $rows[0].PSObject.Properties.Name | Should -Not -Contain 'Velocity'
    }

    It 'lists the rows that could not be assessed, so none is lost from the report' {
        $rows = @($inventory[0], [pscustomobject]@{ Name = 'Broken row'; Material = 'Copper'; Station = $inventory[0].Station })
        $done = @($rows | Test-InductionHazard -Site $site -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable failed)
        $done | Export-HazardReport -Path (Join-Path $TestDrive 'partial.md') -NotAssessed $failed
        $md = Get-Content (Join-Path $TestDrive 'partial.md') -Raw
        $md | Should -Match '1 inventory rows could not be assessed'
        $md | Should -Match 'Broken row'
        $done | Export-HazardReport -Path (Join-Path $TestDrive 'partial.csv') -NotAssessed $failed
        (Import-Csv (Join-Path $TestDrive 'partial.csv')).Verdict | Should -Be @($done[0].Verdict.ToString(), 'NotAssessed')
    }
}

Describe 'Assessments with the shell''s own exporters' {
    It 'Export-Csv gives one row per item with no type names, times in ISO 8601 UTC and the inventory''s own columns' {
        $path = Join-Path $TestDrive 'plain.csv'
        $assessments | Export-Csv $path
        $text = Get-Content $path -Raw
        $text | Should -Not -Match 'InductionHazard\.[A-Z]'
        $text | Should -Not -Match 'System\.[A-Z]'
        $rows = @(Import-Csv $path)
        $rows.Count | Should -Be $assessments.Count
        $rows[0].AssessedUtc | Should -Match '^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ$'
        $rows.AssetTag | Should -Be $inventory.AssetTag
        $rows[0].Mechanisms | Should -Match '^\w+: (Clear|Caution|Hazard|Indeterminate) \(margin'
    }

    It 'ConvertTo-Json gives verdicts and mechanisms as words: one assessment whole at its default depth, a list of them at -Depth 3' {
        $one = $assessments[0] | ConvertTo-Json -WarningVariable warnedOne 3>$null
        $warnedOne | Should -BeNullOrEmpty
        ($one | ConvertFrom-Json).Mechanisms[0].Mechanism | Should -Be 'Shock'
        $json = $assessments | ConvertTo-Json -Depth 3 -WarningVariable warned 3>$null
        $warned | Should -BeNullOrEmpty
        $back = $json | ConvertFrom-Json
        $back.Verdict | Should -Be ($assessments.Verdict | ForEach-Object ToString)
        $back[0].Inventory.AssetTag | Should -Be $inventory[0].AssetTag
        $back.GoverningMechanism | Where-Object { $_ } | Should -BeIn ([enum]::GetNames([InductionHazard.Criteria.HazardMechanism]))
        $json.Length / $assessments.Count | Should -BeLessThan 20000 -Because 'time series and inputs stay out of it (Export-HazardReport -Format Json -IncludeSeries gives them)'
    }
}

Describe 'The HTML report in a real browser' {
    BeforeAll {
        if (-not (Get-Command chromium -ErrorAction SilentlyContinue) -or -not (Get-Command pdftotext -ErrorAction SilentlyContinue)) {
            # Debian's packages; the machine's package manager needs root.
            $env:DEBIAN_FRONTEND = 'noninteractive'
            & apt-get update -q *> $null
            & apt-get install -y -q chromium poppler-utils *> $null
            if ($LASTEXITCODE -ne 0) { throw "apt-get could not install chromium and poppler-utils (exit code $LASTEXITCODE)" }
        }

        $out = Join-Path $TestDrive 'demo'
        $null = & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out 6>$null
        $html = Join-Path $out 'marrowby-heath-audit.html'

        function Invoke-Chromium([string[]] $Arguments) {
            # Console messages come out on stderr as "INFO:CONSOLE" lines with logging on.
            $log = & chromium --headless --no-sandbox --disable-gpu --enable-logging=stderr --v=0 @Arguments 2>&1
            @($log | ForEach-Object ToString | Where-Object { $_ -match ':CONSOLE' })
        }

        function Get-InkFraction([string] $PngPath) {
            # The share of decompressed scanline bytes that are neither 0 nor 255: near 0 for a blank page, whatever its filter.
            $bytes = [IO.File]::ReadAllBytes($PngPath)
            $idat = [IO.MemoryStream]::new()
            $i = 8
            while ($i -lt $bytes.Length) {
                $length = [int] ([uint32] $bytes[$i] -shl 24 -bor [uint32] $bytes[$i + 1] -shl 16 -bor [uint32] $bytes[$i + 2] -shl 8 -bor [uint32] $bytes[$i + 3])
                $type = [Text.Encoding]::ASCII.GetString($bytes, $i + 4, 4)
                if ($type -eq 'IDAT') { $idat.Write($bytes, $i + 8, $length) }
                $i += 12 + $length
            }

            $idat.Position = 0
            $raw = [IO.MemoryStream]::new()
            ([IO.Compression.ZLibStream]::new($idat, [IO.Compression.CompressionMode]::Decompress)).CopyTo($raw)
            $data = $raw.ToArray()
            $ink = 0
            foreach ($b in $data) { if ($b -ne 0 -and $b -ne 255) { $ink++ } }
            $ink / $data.Length
        }
    }

    It 'renders the demo report to a PNG that is not blank, with no console errors' {
        $png = Join-Path $TestDrive 'report.png'
        $console = Invoke-Chromium @("--screenshot=$png", '--window-size=1200,1800', "file://$html")
        $console | Should -BeNullOrEmpty
        Get-InkFraction $png | Should -BeGreaterThan 0.01

        # The checks can fail: a blank page has no ink, and a page whose script the policy blocks logs to the console.
        $blank = Join-Path $TestDrive 'blank.html'
        Set-Content $blank '<!DOCTYPE html><html><head><meta http-equiv="Content-Security-Policy" content="default-src ''none''"></head><body><script>1</script></body></html>'
        $blankPng = Join-Path $TestDrive 'blank.png'
        $blankConsole = Invoke-Chromium @("--screenshot=$blankPng", '--window-size=1200,1800', "file://$blank")
        $blankConsole | Should -Not -BeNullOrEmpty
        Get-InkFraction $blankPng | Should -BeLessThan 0.001
    }

    It 'prints the demo report to a PDF with one section per item' {
        $pdf = Join-Path $TestDrive 'report.pdf'
        $console = Invoke-Chromium @('--no-pdf-header-footer', "--print-to-pdf=$pdf", "file://$html")
        $console | Should -BeNullOrEmpty
        $text = (& pdftotext -enc UTF-8 $pdf -) -join "`n"
        $headings = [regex]::Matches($text, '(?m)^\f?Row (\d+) · ')
        @($headings | ForEach-Object { [int] $_.Groups[1].Value }) | Should -Be (1..$inventory.Count)
        foreach ($row in $inventory) { $text | Should -Match ([regex]::Escape($row.Name)) }
        $text | Should -Match 'engineering estimates'
    }
}
