param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    $root = Split-Path $PSScriptRoot -Parent
    $inventory = @(Import-Csv (Join-Path $root 'examples/marrowby-heath-inventory.csv'))
    $stations = (Import-PowerShellDataFile (Join-Path $root 'examples/marrowby-heath-stations.psd1')).Stations
}

Describe 'The example site audit' {
    It 'has an inventory of at least 20 rings, bands and bracelets of several metals' {
        $inventory.Count | Should -BeGreaterOrEqual 20
        @($inventory.Material | Sort-Object -Unique).Count | Should -BeGreaterOrEqual 6
    }

    It 'writes its report and its assessments, with every item at every station' {
        $out = Join-Path $TestDrive 'demo'
        $null = & (Join-Path $root 'examples/Invoke-SiteAudit.ps1') -ModulePath $ModulePath -OutputDirectory $out 6>$null
        $report = Get-Content (Join-Path $out 'marrowby-heath-audit.md') -Raw
        $report | Should -Match 'engineering estimates'
        foreach ($s in $stations) { $report | Should -Match ([regex]::Escape($s.Name)) }
        @(Import-Csv (Join-Path $out 'marrowby-heath-audit.csv')).Count | Should -Be ($inventory.Count * $stations.Count)
        Test-Path (Join-Path $out 'marrowby-heath-audit.md.tmp') | Should -BeFalse
    }
}
