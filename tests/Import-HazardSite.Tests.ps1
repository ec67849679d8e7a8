param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
}

Describe 'Import-HazardSite' {
    It 'offers the stations of a loaded site when -Station is completed' {
        $global:completionSite = Import-HazardSite (Join-Path (Split-Path $PSScriptRoot -Parent) 'examples/marrowby-heath-site.psd1')
        try {
            $line = 'Test-InductionHazard -Site $completionSite -Station Pu'
            (TabExpansion2 -inputScript $line -cursorColumn $line.Length).CompletionMatches.CompletionText | Should -Be @("'Pulse cell P2 coil'")
            $line = 'Get-InductionResponse -Site $completionSite -Station '
            @((TabExpansion2 -inputScript $line -cursorColumn $line.Length).CompletionMatches).Count | Should -Be $completionSite.Stations.Count
        }
        finally { Remove-Variable completionSite -Scope Global }
    }

    It 'reads the example site''s stations with their sources' {
        $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
        $site.Name | Should -Be 'Marrowby Heath Field Laboratory'
        $site.Stations.Count | Should -BeGreaterOrEqual 4
        ($site.Stations | Where-Object Name -EQ 'Switchroom B busbar').Source.Terms[0].Waveform.Form | Should -Be 'Fault'
    }

    It 'refuses a site file with code in it, naming the line' {
        $file = Join-Path $TestDrive 'bad-site.psd1'
        Set-Content $file -Value @'
@{
    Site = 'Bad'
    Stations = @(
        @{ Name = 'Bench'; Sources = @(@{ Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = (Get-Date).Second; Frequency = 50 } }) }
    )
}
'@
        { Import-HazardSite $file } | Should -Throw -ErrorId 'InvalidSiteFile,InductionHazard.PowerShell.Commands.ImportHazardSiteCommand' -ExpectedMessage '*line 4*holds code*'
    }

    It 'refuses a station with a misspelt value, naming the station, the source and the value' {
        $file = Join-Path $TestDrive 'typo-site.psd1'
        Set-Content $file -Value "@{ Site = 'T'; Stations = @(@{ Name = 'Bench'; Sources = @(@{ Form = 'Coil'; Radius = '50 mm'; Turnz = 3; Waveform = @{ Form = 'Sine'; Amplitude = '1 kA'; Frequency = '50 Hz' } }) }) }"
        { Import-HazardSite $file } | Should -Throw -ExpectedMessage "*station 'Bench' source 1*Turnz*"
    }

    It 'assesses each row at the station it names, and names a row whose station is unknown' {
        $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
        $rows = @(
            [pscustomobject]@{ Name = 'Ring A'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Station = 'Magnet M1 ramp' }
            [pscustomobject]@{ Name = 'Ring B'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Station = 'Nowhere' }
            [pscustomobject]@{ Name = 'Ring C'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Station = 'Switchroom B busbar' }
        )
        $out = @($rows | Test-InductionHazard -Site $site -ErrorVariable bad -ErrorAction SilentlyContinue -WarningAction SilentlyContinue)
        $out.ItemName | Should -Be @('Ring A', 'Ring C')
        $out[0].SourceName | Should -Be 'M1 ramp'
        $out[1].SourceName | Should -Be 'Busbar B1 fault'
        $bad.Count | Should -Be 1
        $bad[0].Exception.Message | Should -BeLike "*'Nowhere' is not a station*Switchroom B busbar*"
    }

    It 'shows the site and its stations in words, not type names' {
        $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
        ($site | Out-String -Width 100) | Should -Not -Match 'InductionHazard\.'
        ($site.Stations | Out-String -Width 100) | Should -Not -Match 'InductionHazard\.'
        ($site.Stations | Out-String -Width 100) | Should -Match 'Busbar B1|bar 120 mm'
    }
}
