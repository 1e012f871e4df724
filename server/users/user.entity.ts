import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm'
import type { Role } from '../../shared/schemas/auth'

@Entity('user')
export class UserEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'text', unique: true })
  email!: string

  @Column({ type: 'text' })
  name!: string

  @Column({ type: 'text' })
  role!: Role

  @Column({ type: 'text' })
  passwordHash!: string

  @CreateDateColumn()
  createdAt!: Date
}
