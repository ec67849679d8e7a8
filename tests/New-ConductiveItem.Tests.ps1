param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
}

Describe 'New-ConductiveItem' {
    It 'makes a band sized by its inner diameter, as jewellers size rings' {
        $band = New-ConductiveItem -Name 'Band' -Material Gold -InnerDiameter '18.5 mm' -Width '4 mm' -Thickness '1.6 mm'
        $band.MeanDiameterMeters | Should -BeGreaterThan 0.020099
        $band.MeanDiameterMeters | Should -BeLessThan 0.020101
        $band.IsSplit | Should -BeFalse
        $band.Contact | Should -Be 'Skin'
    }

    It 'reads unit strings as written, or refuses them saying why: <Text>' -ForEach @(
        @{ Text = '20 mm'; Metres = 0.02 }
        @{ Text = '20mm'; Metres = 0.02 }
        @{ Text = '3/4 in'; Metres = 0.01905 }
        @{ Text = '1 3/4 in'; Metres = 0.04445 }
        @{ Text = '2 cm'; Metres = 0.02 }
        @{ Text = '20 Mm'; Refusal = '*between 10 µm and 100 m*' }
        @{ Text = '20 MM'; Refusal = '*''MM'' is not a unit of length*' }
        @{ Text = '1,5 mm'; Refusal = '*decimal comma*decimal point*' }
        @{ Text = '١٨ mm'; Refusal = '*digits other than 0-9*' }
        @{ Text = '5 A'; Refusal = '*expected a length*current in amperes*' }
        @{ Text = '5 Å'; Refusal = '*between 10 µm and 100 m*' }
        @{ Text = '3 T'; Refusal = '*expected a length*' }
        @{ Text = '18'; Metres = 18; Bare = $true }
    ) {
        if ($Refusal) {
            { New-ConductiveItem -Material Copper -Diameter $Text -WireDiameter '2 mm' -Contact Fixed } | Should -Throw -ExpectedMessage $Refusal
        }
        elseif ($Bare) {
            # A number typed as a parameter is SI, as documented: 18 is 18 m (then refused as an unusual ring unless accepted).
            (New-ConductiveItem -Material Copper -Diameter $Text -WireDiameter '2 mm' -Contact Fixed).Loop.MeanDiameterMeters | Should -Be $Metres
        }
        else {
            (New-ConductiveItem -Material Copper -Diameter $Text -WireDiameter '1 mm' -Contact Fixed).Loop.MeanDiameterMeters | Should -BeGreaterThan ($Metres * (1 - 1e-12))
            (New-ConductiveItem -Material Copper -Diameter $Text -WireDiameter '1 mm' -Contact Fixed).Loop.MeanDiameterMeters | Should -BeLessThan ($Metres * (1 + 1e-12))
        }
    }

    It 'refuses a size outside those of things people wear, carry or install, naming the field and the fix, unless accepted' {
        { New-ConductiveItem -Material Copper -Diameter '50 m' -WireDiameter '2 mm' } | Should -Throw -ErrorId 'UnusualSize,*' -ExpectedMessage '*Diameter*did you mean 50 mm*AcceptUnusualSize*'
        (New-ConductiveItem -Material Copper -Diameter '50 m' -WireDiameter '2 mm' -Contact Fixed -AcceptUnusualSize).Loop.MeanDiameterMeters | Should -Be 50
        { New-ConductiveItem -Material Copper -Diameter '2 m' -WireDiameter '2 mm' -Contact Worn } | Should -Throw '*Contact*worn items are no larger than a belt*'
        { New-ConductiveItem -Material Copper -Diameter '20 mm' -WireDiameter '20 um' } | Should -Throw '*WireDiameter*outside*'
        $rows = @([pscustomobject]@{ Name = 'Site loop'; Material = 'Copper'; Diameter = '40 m'; WireDiameter = '10 mm'; Contact = 'Fixed'; AcceptUnusualSize = 'true' })
        ($rows | New-ConductiveItem).Loop.MeanDiameterMeters | Should -Be 40
    }

    It 'takes contact as people say it, in the parameter as in rows, and refuses a word it does not know' {
        (New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' -Contact Worn).Contact | Should -Be 'Skin'
        (New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' -Contact loose).Contact | Should -Be 'Free'
        (New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' -Contact Installed).Contact | Should -Be 'Fixed'
        { New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' -Contact Glued } | Should -Throw -ErrorId 'ParameterArgumentTransformationError,*'
    }

    It 'makes a split ring when a gap is given' {
        $ring = New-ConductiveItem -Material Titanium -Diameter '65 mm' -WireDiameter '4 mm' -Gap '25 mm' -Contact Held
        $ring.IsSplit | Should -BeTrue
        $ring.GapMeters | Should -Be 0.025
        $ring.Material.Name | Should -Be 'Titanium grade 2'
    }

    It 'takes a material defined by a hashtable' {
        $item = New-ConductiveItem -Material @{ Name = 'Alloy'; Resistivity = '1e-7 ohm m'; Density = '13 g/cm3'; SpecificHeat = 150; MeltingTemperature = '800 degC' } -Diameter '20 mm' -WireDiameter '2 mm'
        $item.Material.Name | Should -Be 'Alloy'
        $item.Material.IsBuiltIn | Should -BeFalse
    }

    It 'refuses an unknown material, naming it and the known ones' {
        { New-ConductiveItem -Material Unobtainium -Diameter '20 mm' -WireDiameter '2 mm' } | Should -Throw -ExpectedMessage "*Material*'Unobtainium'*Copper*"
    }

    It 'refuses a dimension in the wrong unit, naming the parameter' {
        { New-ConductiveItem -Material Gold -Diameter '3 T' -WireDiameter '2 mm' } | Should -Throw -ExpectedMessage "*Diameter*a length*"
    }

    It 'refuses a wire thicker than the loop with a reason' {
        { New-ConductiveItem -Material Gold -Diameter '2 mm' -WireDiameter '3 mm' } | Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.NewConductiveItemCommand' -ExpectedMessage '*no hole*'
    }

    It 'reads inventory rows from Import-Csv, one item per row in order' {
        $rows = @(Import-Csv (Join-Path $root 'examples/marrowby-heath-inventory.csv'))
        $items = @($rows | New-ConductiveItem)
        $items.Count | Should -Be $rows.Count
        $items.Name | Should -Be $rows.Name
    }

    It 'takes several rows given at once to -InputObject as it takes them piped: each in turn, numbered, a $null its own error' {
        $a = @{ Name = 'A'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
        $b = [pscustomobject]@{ Name = 'B'; Material = 'Gold'; Diameter = '25 mm'; WireDiameter = '2 mm' }
        (New-ConductiveItem -InputObject $a, $b).Name | Should -Be @('A', 'B')
        (New-ConductiveItem -InputObject $a).Name | Should -Be 'A' -Because 'a hashtable is one row, not a collection of its entries'
        $list = [System.Collections.Generic.List[object]]::new(); $list.Add($b); $list.Add($a)
        (New-ConductiveItem -InputObject $list).Name | Should -Be @('B', 'A')
        @(New-ConductiveItem -InputObject @()).Count | Should -Be 0
        $items = @(New-ConductiveItem -InputObject $a, $null, $b -ErrorVariable bad -ErrorAction SilentlyContinue)
        $items.Name | Should -Be @('A', 'B')
        @($bad).Count | Should -Be 1
        "$($bad[0])" | Should -Match '^row 2: InputObject: is \$null'
        $piped = @($a, $null, $b | New-ConductiveItem -ErrorVariable pipedBad -ErrorAction SilentlyContinue)
        $piped.Name | Should -Be @('A', 'B')
        "$($pipedBad[0])" | Should -Match '^row 2: InputObject: is \$null'
    }

    It 'writes an error naming the row and field for a bad row and goes on' {
        $items = @(Import-Csv (Join-Path $PSScriptRoot 'data/inventory-with-bad-rows.csv') | New-ConductiveItem -ErrorVariable bad -ErrorAction SilentlyContinue)
        $items.Count | Should -Be 3
        $bad.Count | Should -Be 4
        $bad[0].Exception.Message | Should -BeLike "row 2 ('Negative diameter'): Diameter: *"
    }

    It 'completes material names' {
        $line = 'New-ConductiveItem -Material Ti'
        $completion = TabExpansion2 -inputScript $line -cursorColumn $line.Length
        $completion.CompletionMatches.ListItemText | Should -Contain 'Titanium grade 2'
        $completion.CompletionMatches.ListItemText | Should -Contain 'Ti-6Al-4V'
    }

    It 'makes a rectangular loop of round wire with its area and perimeter' {
        $frame = New-ConductiveItem -Name 'Frame' -Shape RectangularLoop -Material Aluminium -Width '400 mm' -Height '300 mm' -WireDiameter '25 mm'
        [math]::Abs($frame.Loop.LoopAreaSquareMeters - 0.12) | Should -BeLessThan 1e-12
        [math]::Abs($frame.Loop.PathLengthMeters - 1.4) | Should -BeLessThan 1e-12
        $frame.Describe() | Should -Match 'rectangle 400 mm x 300 mm'
    }

    It 'refuses a rectangular loop without its height, naming the field' {
        { New-ConductiveItem -Shape RectangularLoop -Material Copper -Width '400 mm' -WireDiameter '4 mm' } | Should -Throw -ExpectedMessage '*Height*'
    }
}
