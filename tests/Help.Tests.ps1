param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeDiscovery {
    $commands = (Import-Module $ModulePath -Force -PassThru).ExportedCmdlets.Keys | ForEach-Object { @{ Name = $_ } }
}

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
    $common = [System.Management.Automation.Cmdlet]::CommonParameters + [System.Management.Automation.Cmdlet]::OptionalCommonParameters
}

Describe 'Default values in help' {
    It 'shows -<Parameter> of <Command> with the default value <Expected>' -TestCases @(
        @{ Command = 'Test-InductionHazard'; Parameter = 'AmbientTemperature'; Expected = '20 °C, or the row''s or station''s' }
        @{ Command = 'Test-InductionHazard'; Parameter = 'ThrottleLimit'; Expected = '1' }
        @{ Command = 'New-FieldWaveform'; Parameter = 'ClearingTime'; Expected = '1 s' }
        @{ Command = 'Test-InductionHazard'; Parameter = 'Site'; Expected = 'None' }
        @{ Command = 'New-ConductiveItem'; Parameter = 'ClosedEnds'; Expected = 'False' }
    ) {
        (Get-Help $Command -Parameter $Parameter).defaultValue | Should -Be $Expected
        (Get-Help $Command -Parameter $Parameter | Out-String) | Should -Match ('Default value\s+' + [regex]::Escape($Expected))
    }
}

Describe 'Help for <Name>' -ForEach $commands {
    BeforeAll {
        $help = Get-Help $Name -Full
        $command = Get-Command $Name
    }

    It 'has a synopsis and a description' {
        $help.Synopsis | Should -Not -BeNullOrEmpty
        $help.Synopsis | Should -Not -Match ('^' + [regex]::Escape($Name) + ' \[') -Because 'a synopsis that is only the syntax means the help file was not found'
        ($help.description.Text -join ' ') | Should -Not -BeNullOrEmpty
    }

    It 'describes every parameter' {
        foreach ($p in $command.Parameters.Keys | Where-Object { $_ -notin $common }) {
            $described = $help.parameters.parameter | Where-Object name -EQ $p
            ($described.description.Text -join ' ') | Should -Not -BeNullOrEmpty -Because "-$p needs a description"
        }
    }

    It 'gives every parameter a default value: the one its description speaks of, else None (False for a switch)' {
        foreach ($p in $command.Parameters.Keys | Where-Object { $_ -notin $common }) {
            $described = $help.parameters.parameter | Where-Object name -EQ $p
            $text = $described.description.Text -join ' '
            $described.defaultValue | Should -Not -BeNullOrEmpty -Because "-$p needs a default value"
            $described.defaultValue | Should -Not -Match '^Default value' -Because 'the line is the value, not its label'
            $text | Should -Not -Match 'Default value:' -Because "-$p's default value line belongs to the field, not the description"
            if ($text -match '\bdefaults?\b') {
                $described.defaultValue | Should -Not -BeIn @('None', 'False') -Because "-$p's description speaks of a default"
            }
        }
    }

    It 'has at least two examples' {
        @($help.examples.example).Count | Should -BeGreaterOrEqual 2
    }

    It 'has examples that run as written' {
        Push-Location $root
        try {
            foreach ($example in $help.examples.example) {
                $code = $example.code
                { $null = & ([scriptblock]::Create($code)) 3>$null } | Should -Not -Throw -Because $example.title
            }
        }
        finally { Pop-Location }
    }
}
