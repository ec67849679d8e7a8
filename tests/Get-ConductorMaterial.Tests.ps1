param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll { Import-Module $ModulePath -Force }

Describe 'Get-ConductorMaterial' {
    It 'lists the ten built-in materials, each value with its source' {
        $all = @(Get-ConductorMaterial)
        $all.Count | Should -Be 10
        foreach ($m in $all) {
            $m.Sources.Keys | Should -Contain 'ResistivityOhmMeters'
            $m.Sources.Keys | Should -Contain 'MeltingCelsius'
        }
    }

    It 'finds <Name> by a common spelling' -TestCases @(
        @{ Name = 'aluminum'; Expected = 'Aluminium' }
        @{ Name = 'SS304'; Expected = 'Stainless 304' }
        @{ Name = 'Stainless304'; Expected = 'Stainless 304' }
        @{ Name = 'titanium'; Expected = 'Titanium grade 2' }
    ) {
        (Get-ConductorMaterial $Name).Name | Should -Be $Expected
    }

    It 'selects with wildcards' {
        (Get-ConductorMaterial 'Ti*').Name | Should -Be @('Titanium grade 2', 'Ti-6Al-4V')
    }

    It 'writes an error for an unknown name and goes on' {
        $found = @(Get-ConductorMaterial Copper, Unobtainium, Gold -ErrorVariable e -ErrorAction SilentlyContinue)
        $found.Name | Should -Be @('Copper', 'Gold')
        $e[0].FullyQualifiedErrorId | Should -BeLike 'UnknownMaterial,*'
    }

    It 'defines a material from a hashtable with units' {
        $m = Get-ConductorMaterial -Definition @{ Name = 'Alloy'; Resistivity = '2.5e-7 ohm m'; Density = '15.5 g/cm3'; SpecificHeat = 150; MeltingTemperature = '900 degC'; Source = 'assay 17' }
        $m.ResistivityOhmMeters | Should -Be 2.5e-7
        $m.DensityKilogramsPerCubicMeter | Should -Be 15500
        $m.Sources['ResistivityOhmMeters'] | Should -Be 'assay 17'
        $m.TemperatureCoefficientKnown | Should -BeFalse
        [double]::IsNaN($m.LatentHeatJoulesPerKilogram) | Should -BeTrue
        (Get-ConductorMaterial -Definition @{ Name = 'Alloy'; Resistivity = '2.5e-7 ohm m'; Density = '15.5 g/cm3'; SpecificHeat = 150; MeltingTemperature = '900 degC'; LatentHeat = '95 kJ/kg' }).LatentHeatJoulesPerKilogram |
            Should -Be 95000
    }

    It 'gives each built-in material its latent heat of fusion with a source, and tells how long a melting ring takes to melt through' {
        foreach ($m in Get-ConductorMaterial) {
            $m.LatentHeatJoulesPerKilogram | Should -BeGreaterThan 5e4
            $m.Sources['LatentHeatJoulesPerKilogram'] | Should -Not -BeNullOrEmpty
        }
        $mains = New-FieldWaveform -Sine -Amplitude '1 T' -Frequency '50 Hz' | New-FieldSource -Uniform
        $ring = New-ConductiveItem -Material Copper -Diameter '60 mm' -WireDiameter '2 mm' -Contact Fixed
        $a = Test-InductionHazard -Item $ring -Source $mains -ExposureTime '1 h'
        $a.Response.MeltThroughSeconds | Should -BeGreaterThan 0
        ($a.Mechanisms | Where-Object Mechanism -EQ 'Overheat').Detail | Should -Match 'latent heat'
    }

    It 'names every field a definition gets wrong' {
        Get-ConductorMaterial -Definition @{ Name = 'Bad'; Resistivity = '3 T'; Density = 1000 } -ErrorVariable e -ErrorAction SilentlyContinue
        $e[0].Exception.Message | Should -Match 'Resistivity:'
        $e[0].Exception.Message | Should -Match 'SpecificHeat: is missing'
        $e[0].Exception.Message | Should -Match 'MeltingTemperature: is missing'
    }
}
