param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
    $inventory = @(Import-Csv (Join-Path $root 'examples/marrowby-heath-inventory.csv'))
    $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
}

Describe 'The example site audit' {
    It 'has an inventory of at least 20 rings, bands and bracelets of several metals, each at a station of the site' {
        $inventory.Count | Should -BeGreaterOrEqual 20
        @($inventory.Material | Sort-Object -Unique).Count | Should -BeGreaterOrEqual 6
        foreach ($row in $inventory) { $row.Station | Should -BeIn $site.Stations.Name }
    }

    It 'has the real sources of the site: a busbar that faults, a pulsed coil on a capacitor bank, a quench, a ramp, an induction heater' {
        $forms = $site.Stations | ForEach-Object { $_.Source.Terms } | ForEach-Object { $_.Waveform.Form }
        foreach ($f in 'Fault', 'Discharge', 'Decay', 'Ramp', 'Sine') { $forms | Should -Contain $f }
        ($site.Stations | ForEach-Object { $_.Source.Kind }) | Should -Contain 'Busbar'
        ($site.Stations | ForEach-Object { $_.Source.Kind }) | Should -Contain 'CircularCoil'
    }

    It 'writes its report and its assessments, with every item at its station' {
        $out = Join-Path $TestDrive 'demo'
        $null = & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out 6>$null
        $report = Get-Content (Join-Path $out 'marrowby-heath-audit.md') -Raw
        $report | Should -Match 'engineering estimates'
        foreach ($s in $site.Stations) { $report | Should -Match ([regex]::Escape($s.Name)) }
        $rows = @(Import-Csv (Join-Path $out 'marrowby-heath-audit.csv'))
        $rows.Count | Should -Be $inventory.Count
        $rows.Station | Should -Be $inventory.Station
        $rows.AssetTag | Should -Be $inventory.AssetTag -Because 'the inventory''s own columns travel with each assessment'
        Test-Path (Join-Path $out 'marrowby-heath-audit.html') | Should -BeTrue
        @(Get-ChildItem $out -Force -Filter '*.tmp').Count | Should -Be 0
    }

    It 'shows every margin of the demo as a number between 0.001 and 1000, or as a bound' {
        $out = Join-Path $TestDrive 'margins'
        $null = & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out 6>$null
        $lines = Get-Content (Join-Path $out 'marrowby-heath-audit.md')
        $cells = foreach ($line in $lines | Where-Object { $_ -match '^\| (Shock|Arc|Burn|Overheat|Force|Torque|Attraction) \|' }) { ($line -split '(?<!\\)\|')[6].Trim() }
        $cells.Count | Should -BeGreaterThan 30
        foreach ($cell in $cells | Where-Object { $_ }) {
            if ($cell -notmatch '^(&lt;|&gt;) ') {
                [double] $cell | Should -BeGreaterOrEqual 0.001
                [double] $cell | Should -BeLessThan 1000
            }
        }

        $assessments = @($inventory | Test-InductionHazard -Site $site -WarningAction SilentlyContinue)
        foreach ($m in $assessments.Mechanisms | Where-Object { $_.Applies -and $_.Verdict -ne 'Indeterminate' }) {
            [double]::IsFinite($m.Margin) | Should -BeTrue
            $m.Margin | Should -BeGreaterThan 0
        }
    }

    It 'does not replace an earlier report unless told to' {
        $out = Join-Path $TestDrive 'again'
        $null = & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out 6>$null
        { & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out 6>$null } | Should -Throw -ErrorId 'ReportExists*'
        { & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out -Force 6>$null } | Should -Not -Throw
    }
}
