import { Module } from '@nestjs/common';
import { LinkGateway } from './link.gateway';

/** Monitor link: the WebSocket simulator on the API's server (CONTRACT.md "Monitor link"). */
@Module({ providers: [LinkGateway] })
export class LinkModule {}
