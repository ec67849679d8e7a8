param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    $module = Import-Module $ModulePath -Force -PassThru
    $root = Split-Path $PSScriptRoot -Parent
    $moduleDir = Split-Path $ModulePath -Parent
}

Describe 'The laid-out module' {
    It 'has a valid manifest whose version is the one in Directory.Build.props' {
        $manifest = Test-ModuleManifest $ModulePath
        [xml] $props = Get-Content (Join-Path $root 'Directory.Build.props') -Raw
        $manifest.Version.ToString() | Should -Be @($props.Project.PropertyGroup.Version | Where-Object { $_ })[0]
        $manifest.CompatiblePSEditions | Should -Be @('Desktop', 'Core')
        $manifest.PowerShellVersion.ToString() | Should -Be '5.1'
    }

    It 'exports exactly its cmdlets and nothing else' {
        $module.ExportedCmdlets.Keys | Sort-Object | Should -Be @(
            'Export-HazardReport', 'Find-SafeDistance', 'Get-ConductorMaterial', 'Get-FieldStrength', 'Get-HazardPolicy', 'Get-InductionResponse', 'Import-HazardSite', 'New-ConductiveItem', 'New-FieldSource', 'New-FieldWaveform', 'Test-FieldExposure', 'Test-InductionHazard')
        $module.ExportedFunctions.Count | Should -Be 0
        $module.ExportedAliases.Count | Should -Be 0
    }

    It 'does not carry a copy of System.Management.Automation' {
        Test-Path (Join-Path $moduleDir 'System.Management.Automation.dll') | Should -BeFalse
    }

    It 'has its help and about topic' {
        Test-Path (Join-Path $moduleDir 'en-US/InductionHazard.dll-Help.xml') | Should -BeTrue
        Get-Help about_InductionHazard | Out-String | Should -Match 'engineering estimates'
    }

    It 'shows readable text in the list view of every object it returns, never a type name' {
        $item = New-ConductiveItem -Name 'Band' -Material Gold -InnerDiameter '18 mm' -Width '4 mm' -Thickness '1.6 mm'
        $waveform = New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz'
        $source = $waveform | New-FieldSource -Uniform
        $response = Get-InductionResponse -Item $item -Source $source
        $site = Import-HazardSite (Join-Path (Split-Path $PSScriptRoot -Parent) 'examples/marrowby-heath-site.psd1')
        $objects = @($item, $item.Loop, $waveform, $source, $response, $response.Scenario, $response.Scenario.Placement, $site, $site.Stations[0],
            (Get-ConductorMaterial Copper), (Get-HazardPolicy), (Test-FieldExposure -Source $source), (Get-FieldStrength -Source $source -Position '0,0,0'),
            (Test-InductionHazard -Item $item -Source $source))
        foreach ($o in $objects) {
            ($o | Format-List | Out-String -Width 250) | Should -Not -Match 'InductionHazard\.[A-Z][A-Za-z]+\.[A-Z]' -Because "the list view of a $($o.GetType().Name) shows text"
        }
    }

    It 'shows every table view whole at 80, 100 and 120 columns: no line too long, no header squeezed one letter per line' {
        $item = New-ConductiveItem -Name 'Band' -Material Gold -InnerDiameter '18 mm' -Width '4 mm' -Thickness '1.6 mm'
        $waveform = New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz'
        $source = $waveform | New-FieldSource -Uniform
        $site = Import-HazardSite (Join-Path (Split-Path $PSScriptRoot -Parent) 'examples/marrowby-heath-site.psd1')
        $assessment = Test-InductionHazard -Item $item -Source $source
        $views = [ordered]@{
            assessments = @($assessment); mechanisms = $assessment.Mechanisms; responses = @(Get-InductionResponse -Item $item -Source $source); items = @($item)
            materials = @(Get-ConductorMaterial); waveforms = @($waveform); sources = @($source); strengths = @(Get-FieldStrength -Source $source -Position '0,0,0')
            sites = @($site); stations = $site.Stations; limits = (Get-HazardPolicy).Limits; exposures = @(Test-FieldExposure -Source $source)
            distances = @(Find-SafeDistance -Item $item -Source $source -Direction x -MaxDistance '10 cm' -WarningAction SilentlyContinue)
        }
        foreach ($name in $views.Keys) {
            foreach ($width in 80, 100, 120) {
                $lines = @(($views[$name] | Out-String -Width $width) -split "`r?`n" | Where-Object { $_.Trim() })
                foreach ($line in $lines) { $line.TrimEnd().Length | Should -BeLessOrEqual $width -Because "$name at $width columns" }
                if ($lines[0] -notmatch ' : ') { $lines[1] | Should -Match '^\s*-' -Because "the $name table's header at $width columns is one row, followed by its rule" }
            }
        }
    }

    It 'never cuts a figure so that its right end shows: at any console width a cut figure keeps its leading digits' {
        # PowerShell cuts the table column at the console's edge; a right-aligned figure cut that way kept its right
        # end ("…0 °C" for 33.0 °C), which reads as another figure. Figures are left-aligned, so a cut ends in the
        # ellipsis. Every width from 60 to 140 columns, for the tables of assessments, responses, materials,
        # waveforms, field strengths and safe distances.
        $item = New-ConductiveItem -Name 'Band' -Material Gold -InnerDiameter '18 mm' -Width '4 mm' -Thickness '1.6 mm'
        $source = New-FieldWaveform -Ramp -From '0 T' -To '1 T' -Duration '10 ms' | New-FieldSource -Uniform
        $tables = [ordered]@{
            assessments = @(Test-InductionHazard -Item $item -Source $source); responses = @(Get-InductionResponse -Item $item -Source $source)
            materials = @(Get-ConductorMaterial); waveforms = @(New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz')
            strengths = @(Get-FieldStrength -Source $source -Position '0,0,0')
            distances = @(Find-SafeDistance -Item $item -Source $source -Direction x -MaxDistance '10 cm' -WarningAction SilentlyContinue)
        }
        foreach ($name in $tables.Keys) {
            foreach ($width in 60..140) {
                $text = $tables[$name] | Format-Table | Out-String -Width $width
                $text | Should -Not -Match '(^|\s)\u2026\S' -Because "a cut in the $name table at $width columns keeps a figure's leading digits"
            }
        }
    }

    It 'has about topics for the site file and the policy file that name every key' {
        $site = Get-Help about_InductionHazard_SiteFile | Out-String
        foreach ($key in @('Site', 'Stations', 'Policy', 'Waveform') + [InductionHazard.Assessment.SiteReader]::StationKeys) { $site | Should -Match "\b$key\b" }
        $policy = Get-Help about_InductionHazard_PolicyFile | Out-String
        foreach ($key in [InductionHazard.Criteria.HazardPolicy]::Keys.Name) { $policy | Should -Match "\b$key\b" }
    }

    It 'targets netstandard2.0 so that Windows PowerShell 5.1 can load it' {
        foreach ($dll in 'InductionHazard.dll', 'InductionHazard.Core.dll') {
            $assembly = [System.Reflection.Assembly]::LoadFile((Join-Path $moduleDir $dll))
            $framework = $assembly.GetCustomAttributes([System.Runtime.Versioning.TargetFrameworkAttribute], $false)
            $framework.FrameworkName | Should -Be '.NETStandard,Version=v2.0'
        }
    }
}
