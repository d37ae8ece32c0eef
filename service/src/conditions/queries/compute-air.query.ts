import { Query } from '@nestjs/cqrs';
import type { AirRequest, AirResponse } from '@fuelwright/shared';

export class ComputeAirQuery extends Query<AirResponse> {
  constructor(public readonly request: AirRequest) {
    super();
  }
}
