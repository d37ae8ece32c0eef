import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { computeAirOrBadRequest } from '../air-input.js';
import { ComputeAirQuery } from './compute-air.query.js';

/** Today's air figures from what the user read: pure computation, nothing stored. */
@QueryHandler(ComputeAirQuery)
export class ComputeAirHandler implements IQueryHandler<ComputeAirQuery> {
  execute({ request }: ComputeAirQuery) {
    return Promise.resolve(computeAirOrBadRequest(request));
  }
}
