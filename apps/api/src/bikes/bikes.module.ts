import { Module } from '@nestjs/common';
import { CustomersModule } from '../customers';
import { BikesController, CustomerBikesController } from './bikes.controller';
import { BikesRepository } from './bikes.repository';
import { BikesService } from './bikes.service';

@Module({
  imports: [CustomersModule],
  controllers: [BikesController, CustomerBikesController],
  providers: [BikesRepository, BikesService],
  exports: [BikesService],
})
export class BikesModule {}
