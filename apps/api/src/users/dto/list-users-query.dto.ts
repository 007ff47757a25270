import {
  sortOrders,
  userSortFields,
  type SortOrder,
  type UserSortField,
} from '@skyledger/contracts';
import { IsIn, IsOptional } from 'class-validator';

export class ListUsersQueryDto {
  @IsOptional()
  @IsIn(userSortFields, { message: `sort must be one of: ${userSortFields.join(', ')}` })
  sort?: UserSortField;

  @IsOptional()
  @IsIn(sortOrders, { message: 'order must be asc or desc' })
  order?: SortOrder;
}
