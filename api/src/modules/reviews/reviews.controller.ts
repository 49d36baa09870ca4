import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type ReviewInput,
  reviewInputSchema,
  type ReviewQueueQuery,
  reviewQueueQuerySchema,
} from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { ReviewsService } from './reviews.service';

const uuid = new ParseUUIDPipe({ version: undefined });

/** Review queue: quality writes; admins and leads may read it for their sites. */
@ApiTags('reviews')
@ApiBearerAuth()
@Controller('reviews')
export class ReviewsController {
  constructor(private readonly reviews: ReviewsService) {}

  @Roles('quality', 'admin', 'lead')
  @Get()
  queue(
    @CurrentUser() user: AuthUser,
    @Query(new ZodPipe(reviewQueueQuerySchema)) q: ReviewQueueQuery,
  ) {
    return this.reviews.queue(user, q);
  }

  @Roles('quality', 'admin', 'lead')
  @Get(':resuscitationId')
  history(@CurrentUser() user: AuthUser, @Param('resuscitationId', uuid) id: string) {
    return this.reviews.history(user, id);
  }

  @Roles('quality')
  @Post(':resuscitationId')
  @HttpCode(201)
  review(
    @CurrentUser() user: AuthUser,
    @Param('resuscitationId', uuid) id: string,
    @Body(new ZodPipe(reviewInputSchema)) body: ReviewInput,
  ) {
    return this.reviews.review(user, id, body);
  }
}
