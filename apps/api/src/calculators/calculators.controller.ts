import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { calculators, libraryVersion, type CalculatorInfo } from '@skyledger/calc';
import { type CalculatorRunView } from '@skyledger/contracts';
import { Public } from '../common/decorators/public.decorator';
import { runCalculation } from '../workings/run-calculation';
import { RunCalculatorDto } from './dto/run-calculator.dto';

/**
 * The calculator library, open to anyone: its descriptions, and runs that nothing keeps
 * (for reader pages and outside checks). Datasets are the desk's and cannot be read here.
 */
@ApiTags('calculators')
@Public()
@Controller('calculators')
export class CalculatorsController {
  @Get()
  list(): { libraryVersion: string; calculators: readonly CalculatorInfo[] } {
    return { libraryVersion, calculators };
  }

  @Post(':calculatorId/run')
  @HttpCode(HttpStatus.OK)
  async run(
    @Param('calculatorId') calculatorId: string,
    @Body() dto: RunCalculatorDto,
  ): Promise<CalculatorRunView> {
    const { result } = await runCalculation(null, calculatorId, dto.inputs);
    return {
      calculatorId: result.calculatorId,
      libraryVersion: result.libraryVersion,
      inputs: result.inputs as Record<string, unknown>,
      outputs: result.outputs as CalculatorRunView['outputs'],
      steps: [...result.steps],
      cautions: [...result.cautions],
      monteCarlo: (result.monteCarlo as CalculatorRunView['monteCarlo']) ?? null,
    };
  }
}
